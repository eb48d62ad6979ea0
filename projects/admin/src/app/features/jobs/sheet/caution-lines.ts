import type { SheetCaution, SheetProduct } from '@layerbook/contracts/types';

/** One sentence to show: its key in the shared `cautions` words (null: none) and the English as sent. */
export interface CautionText {
  readonly key: string | null;
  readonly params: Readonly<Record<string, string>>;
  readonly english: string;
  /** list entries with words of their own (keys in `cautions`), joined with ", " into the `products` param */
  readonly items?: ReadonlyArray<{ readonly key: string; readonly params: Readonly<Record<string, string>> }>;
}

export interface CautionView {
  readonly id: string;
  readonly title: CautionText;
  readonly rule: CautionText;
  readonly bullets: readonly CautionText[];
  /** "A US federal rule." and, for a firm outside the US, the line to check its own rules */
  readonly jurisdiction: readonly CautionText[];
  readonly standing: CautionText;
}

const words = (key: string | null | undefined, english: string, params: Readonly<Record<string, string>> = {}): CautionText => ({
  key: key ? `cautions.${key}` : null,
  params,
  english,
});

/** The English jurisdiction is its keys' sentences joined by a space: paired back up, or kept whole. */
function sentencesOf(english: string, keys: readonly string[]): CautionText[] {
  const sentences = english.split(/(?<=\.)\s+/);
  if (keys.length === 0 || sentences.length !== keys.length) return [words(undefined, english)];
  return keys.map((key, i) => words(key, sentences[i]));
}

/**
 * A caution as the sheet shows it: every sentence by its key when the engine gave one, with the
 * English as sent to fall back on. Nothing is dropped: a bullet without a key shows as written.
 */
export function cautionView(caution: SheetCaution): CautionView {
  const lines = caution.lines.length === caution.bullets.length ? caution.lines : null;
  return {
    id: caution.id,
    title: words(caution.titleKey, caution.title),
    rule: words(caution.ruleKey, caution.rule),
    bullets: caution.bullets.map((bullet, i) => {
      const line = lines?.[i];
      const text = words(line?.key, bullet, line?.params);
      return line?.items ? { ...text, items: line.items.map((item) => ({ key: `cautions.${item.key}`, params: item.params })) } : text;
    }),
    jurisdiction: sentencesOf(caution.jurisdiction, caution.jurisdictionKeys),
    standing: words(caution.standingKey, caution.standing),
  };
}

/** The hazard flags a product's data sheet gave, in the order the crew should read them. */
export type HazardFlag =
  | { readonly kind: 'flammable'; readonly flashPointC: number; readonly flashPointF: number }
  | { readonly kind: 'flashPoint'; readonly flashPointC: number; readonly flashPointF: number }
  | { readonly kind: 'lime' }
  | { readonly kind: 'silica' }
  | { readonly kind: 'dryingOil' };

/** 29 CFR 1910.106(a)(19): a flammable liquid has a flash point at or below 93 °C (199.4 °F). */
const FLAMMABLE_MAX_C = 93;

export function hazardFlags(product: SheetProduct): HazardFlag[] {
  const h = product.hazards;
  const flags: HazardFlag[] = [];
  if (h.flashPointC !== undefined) {
    // °F = °C × 9/5 + 32 (NIST SP 811 §B.8)
    const flashPointF = Math.round(((h.flashPointC * 9) / 5 + 32) * 10) / 10;
    flags.push({ kind: h.flashPointC <= FLAMMABLE_MAX_C ? 'flammable' : 'flashPoint', flashPointC: h.flashPointC, flashPointF });
  }
  if (h.isLime) flags.push({ kind: 'lime' });
  if (h.containsSilica) flags.push({ kind: 'silica' });
  if (h.containsDryingOil) flags.push({ kind: 'dryingOil' });
  return flags;
}
