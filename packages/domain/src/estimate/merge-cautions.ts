import { OFFICE_ONLY_LINES } from '../safety/safety-cautions';

/** A caution as each option's result carries it (the engine's `Caution`, ids as plain strings). */
export interface OptionCaution {
  readonly id: string;
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  /** whose rule it is; absent from results computed before the engine said so */
  readonly jurisdiction?: string;
  readonly standing: string;
}

/** "Lime products: A, B." → its label and its names; null for a bullet that is not such a list. */
function listBullet(bullet: string): { label: string; names: string[] } | null {
  const m = /^([^:]{1,60}): (.+)\.$/.exec(bullet);
  return m ? { label: m[1], names: m[2].split(', ') } : null;
}

/**
 * The cautions of every option of an estimate, once each, for one document. Bullets are merged in
 * order without repeats, and a list bullet ("Lime products: …") appears once with the names of
 * every option, so two options with different lime products do not print "Lime products" twice.
 * For the client, lines meant for the office alone (pricing reminders) are left out.
 */
export function mergeCautions(
  perOption: ReadonlyArray<readonly OptionCaution[]>,
  audience: 'office' | 'client' = 'office',
): OptionCaution[] {
  const byId = new Map<string, OptionCaution & { bullets: string[] }>();
  for (const cautions of perOption) {
    for (const c of cautions) {
      let into = byId.get(c.id);
      // Only the document's fields: the engine's keyed lines would no longer be parallel to the merged bullets
      // (readers find a bullet's key with cautionLineOf).
      if (!into) {
        const { id, title, rule, standing, jurisdiction } = c;
        byId.set(id, (into = { id, title, rule, standing, ...(jurisdiction !== undefined ? { jurisdiction } : {}), bullets: [] }));
      }
      for (const b of c.bullets) if (audience === 'office' || !OFFICE_ONLY_LINES.has(b)) addBullet(into.bullets, b);
    }
  }
  return [...byId.values()];
}

function addBullet(bullets: string[], bullet: string): void {
  if (bullets.includes(bullet)) return;
  const list = listBullet(bullet);
  const at = list ? bullets.findIndex((b) => listBullet(b)?.label === list.label) : -1;
  if (!list || at < 0) {
    bullets.push(bullet);
    return;
  }
  const names = listBullet(bullets[at])!.names;
  for (const n of list.names) if (!names.includes(n)) names.push(n);
  bullets[at] = `${list.label}: ${names.join(', ')}.`;
}
