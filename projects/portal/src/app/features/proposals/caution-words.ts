import { CAUTION_WORDS, cautionLineOf, cautionText, leadNotice } from '@layerbook/domain';
import type { SnapshotCaution } from '@layerbook/contracts/types';

/**
 * The small print under a caution or the lead-safe notice: the rule it points to, then whose rule
 * it is ("A US federal rule.", and outside the US a line to check the firm's own rules). A snapshot
 * made before cautions said whose rule it is has only the rule; empty lines are left out.
 */
export function cautionFootnotes(caution: Pick<SnapshotCaution, 'rule' | 'jurisdiction'>): string[] {
  return [caution.rule, caution.jurisdiction ?? ''].map((line) => line.trim()).filter((line) => line !== '');
}

/** Words of the `cautions` area by key (without the area), or null when the reader's words lack it. */
export type CautionSay = (key: string, params?: Readonly<Record<string, string>>) => string | null;

/** A caution as the reader sees it: title, bullets and footnotes in their language. */
export interface CautionView {
  readonly title: string;
  readonly bullets: readonly string[];
  readonly footnotes: readonly string[];
}

const JURISDICTION_KEYS = ['jurisdiction.usFederal', 'jurisdiction.guidance', 'jurisdiction.outsideUs'] as const;

/**
 * A caution (or the lead-safe notice, id 'lead-safe-work') in the reader's language by its stable
 * keys: title and rule by id, each English bullet read back to its key and params, the jurisdiction
 * sentences one by one. Whatever has no key or no words shows in the English the snapshot holds —
 * never dropped, never softened.
 */
export function cautionView(
  id: string,
  caution: Pick<SnapshotCaution, 'title' | 'bullets' | 'rule' | 'jurisdiction'>,
  say: CautionSay,
): CautionView {
  const known = (key: string, english: string) =>
    key in CAUTION_WORDS && CAUTION_WORDS[key as keyof typeof CAUTION_WORDS] === english ? say(key) : null;
  const title = known(`${id}.title`, caution.title) ?? caution.title;
  const bullets = caution.bullets.map((bullet) => {
    const line = cautionLineOf(bullet);
    if (!line) return bullet;
    // A list whose entries have words of their own (flammable products) is said entry by entry, joined as the English does.
    const products = line.items?.map((item) => say(item.key, item.params) ?? cautionText(item)).join(', ');
    return say(line.key, products === undefined ? line.params : { ...line.params, products }) ?? bullet;
  });
  const rule = known(`${id}.rule`, caution.rule.trim()) ?? caution.rule;
  let jurisdiction = (caution.jurisdiction ?? '').trim();
  const said: string[] = [];
  for (const key of JURISDICTION_KEYS) {
    const english = CAUTION_WORDS[key];
    if (jurisdiction.includes(english)) {
      said.push(say(key) ?? english);
      jurisdiction = jurisdiction.replace(english, '').trim();
    }
  }
  if (jurisdiction) said.push(jurisdiction);
  return { title, bullets, footnotes: cautionFootnotes({ rule, jurisdiction: said.join(' ') }) };
}

/** The standing line under the cautions in the reader's language when it is the engine's own. */
export function standingView(standing: string, say: CautionSay): string {
  return (standing.trim() === CAUTION_WORDS.standing && say('standing')) || standing;
}

/** The lead-safe notice's English lines (both wordings of its first line) and their keys under `proposals.leadNotice`. */
const LEAD_NOTICE_KEYS: ReadonlyMap<string, string> = (() => {
  const known = leadNotice('target-housing');
  const assumed = leadNotice('assumed-target-housing');
  if (!known || !assumed) return new Map<string, string>();
  return new Map([
    [known.title, 'title'],
    [known.bullets[0], 'targetHousing'],
    [assumed.bullets[0], 'unknownYear'],
    [known.bullets[1], 'certifiedFirm'],
    [known.bullets[2], 'pamphlet'],
    [known.bullets[3], 'stricter'],
    [known.rule, 'rule'],
  ]);
})();

/**
 * The lead-safe notice in the reader's language: each line the engine wrote is said by its key under
 * `proposals.leadNotice` (`sayLead`), the jurisdiction sentences as for a caution; a line without
 * words stays in the English the snapshot holds.
 */
export function leadNoticeView(
  notice: Pick<SnapshotCaution, 'title' | 'bullets' | 'rule' | 'jurisdiction'>,
  say: CautionSay,
  sayLead: (key: string) => string | null,
): CautionView {
  const lead = (english: string) => {
    const key = LEAD_NOTICE_KEYS.get(english.trim());
    return (key && sayLead(key)) || english;
  };
  const asCaution = cautionView('lead-safe-work', notice, say);
  return {
    title: lead(notice.title),
    bullets: notice.bullets.map(lead),
    footnotes: [lead(notice.rule), ...asCaution.footnotes.slice(notice.rule.trim() === '' ? 0 : 1)].filter((line) => line.trim() !== ''),
  };
}
