import type { Language } from '@layerbook/contracts';
import { CAUTION_WORDS, cautionLineOf, cautionText, type CautionWordKey } from '@layerbook/domain';
import { translator } from './catalog';

/** A caution as stored in a snapshot or result: the English text, with its keys when the engine gave them. */
export interface KeyedCaution {
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  readonly jurisdiction: string;
  readonly standing: string;
  readonly titleKey?: string;
  readonly ruleKey?: string;
  readonly lines?: ReadonlyArray<{ readonly key: string; readonly params: Readonly<Record<string, string>> }>;
  readonly jurisdictionKeys?: readonly string[];
  readonly standingKey?: string;
}

/** The words of a caution as a reader sees them. */
export interface CautionWordsOut {
  readonly title: string;
  readonly bullets: string[];
  readonly rule: string;
  readonly jurisdiction: string;
  readonly standing: string;
}

/**
 * A caution in the reader's language, by its keys. Stored cautions made before the keys existed are
 * read back to their keys from the English bullets; a line that is none of the engine's (or a caution
 * with no keys at all) stays as written, in English — never dropped.
 */
export function cautionIn(language: Language, c: KeyedCaution): CautionWordsOut {
  const t = translator(language);
  const cautionKey = (key: string) => `cautions.${key}`;
  const bullets = c.bullets.map((bullet, i) => {
    const line = keyedLine(c.lines?.[i], bullet) ?? cautionLineOf(bullet);
    return line ? t(cautionKey(line.key), line.params) : bullet;
  });
  return {
    title: c.titleKey ? t(cautionKey(c.titleKey)) : c.title,
    bullets,
    rule: c.ruleKey ? t(cautionKey(c.ruleKey)) : c.rule,
    jurisdiction: c.jurisdictionKeys?.length ? c.jurisdictionKeys.map((k) => t(cautionKey(k))).join(' ') : c.jurisdiction,
    standing: c.standingKey ? t(cautionKey(c.standingKey)) : c.standing,
  };
}

const isWordKey = (key: string): key is CautionWordKey => Object.hasOwn(CAUTION_WORDS, key);

/**
 * The keyed line beside a bullet, only when it says exactly that bullet in English: a copy that left
 * out office lines or merged options' bullets no longer lines up with its keys, and then each bullet
 * is read back on its own.
 */
function keyedLine(
  line: { readonly key: string; readonly params: Readonly<Record<string, string>> } | undefined,
  bullet: string,
): { key: string; params: Readonly<Record<string, string>> } | null {
  if (!line || !isWordKey(line.key)) return null;
  return cautionText({ key: line.key, params: line.params }) === bullet ? line : null;
}
