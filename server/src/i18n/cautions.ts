import type { Language } from '@layerbook/contracts';
import { CAUTION_WORDS, cautionLineOf, cautionText, type CautionWordKey } from '@layerbook/domain';
import { CATALOG, lookup, translator } from './catalog';

/** A caution as stored in a snapshot or result: the English text, with its keys when the engine gave them. */
export interface KeyedCaution {
  /** the caution's id ("lime-alkali"), which names its title and rule keys */
  readonly id?: string;
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  readonly jurisdiction?: string;
  readonly standing?: string;
  readonly titleKey?: string;
  readonly ruleKey?: string;
  readonly lines?: ReadonlyArray<KeyedLine>;
  readonly jurisdictionKeys?: readonly string[];
  readonly standingKey?: string;
}

/** One line by key; a list inside it whose entries have words of their own (flammable products) also gives `items`. */
interface KeyedLine {
  readonly key: string;
  readonly params: Readonly<Record<string, string>>;
  readonly items?: ReadonlyArray<{ readonly key: string; readonly params: Readonly<Record<string, string>> }>;
}

/** The words of a caution as a reader sees them. */
export interface CautionWordsOut {
  readonly title: string;
  readonly bullets: string[];
  readonly rule: string;
  /** '' when the stored caution had none */
  readonly jurisdiction: string;
  /** '' when the stored caution had none */
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
    const line: KeyedLine | null = keyedLine(c.lines?.[i], bullet) ?? cautionLineOf(bullet);
    if (!line) return bullet;
    // Each list entry in the reader's words, joined as the English list is (", ").
    const products = line.items?.map((item) => t(cautionKey(item.key), item.params)).join(', ');
    return t(cautionKey(line.key), products === undefined ? line.params : { ...line.params, products });
  });
  const own = (key: string | undefined, english: string): string => {
    const found = key ?? keyOfText(english);
    return found ? t(cautionKey(found)) : english;
  };
  const jurisdictionKeys = c.jurisdictionKeys?.length ? c.jurisdictionKeys : jurisdictionKeysOf(c.jurisdiction ?? '');
  return {
    title: own(c.titleKey ?? idKey(c.id, 'title', c.title), c.title),
    bullets,
    rule: own(c.ruleKey ?? idKey(c.id, 'rule', c.rule), c.rule),
    // A copy made before cautions said whose rule it is has no such line: none is added.
    jurisdiction: !c.jurisdiction ? '' : jurisdictionKeys ? jurisdictionKeys.map((k) => t(cautionKey(k))).join(' ') : c.jurisdiction,
    standing: c.standing === undefined && !c.standingKey ? '' : own(c.standingKey, c.standing ?? ''),
  };
}

/** `<id>.title` or `<id>.rule` when its English is exactly the stored text (copies made before the keys). */
function idKey(id: string | undefined, part: 'title' | 'rule', english: string): string | undefined {
  const key = `${id}.${part}`;
  return id && isWordKey(key) && CAUTION_WORDS[key] === english ? key : undefined;
}

/** The fixed sentence (no params) whose English is exactly this text: the standing line, a jurisdiction sentence. */
function keyOfText(english: string): string | undefined {
  if (english === CAUTION_WORDS.standing) return 'standing';
  return undefined;
}

const JURISDICTION_KEYS = ['jurisdiction.usFederal', 'jurisdiction.guidance', 'jurisdiction.outsideUs'] as const;

/** The jurisdiction sentences a stored English line is made of, in order; undefined when it is anything else. */
function jurisdictionKeysOf(english: string): string[] | undefined {
  if (!english) return undefined;
  const found = JURISDICTION_KEYS.filter((k) => english.includes(CAUTION_WORDS[k])).sort(
    (a, b) => english.indexOf(CAUTION_WORDS[a]) - english.indexOf(CAUTION_WORDS[b]),
  );
  return found.map((k) => CAUTION_WORDS[k]).join(' ') === english ? found : undefined;
}

const isWordKey = (key: string): key is CautionWordKey => Object.hasOwn(CAUTION_WORDS, key);

/**
 * The keyed line beside a bullet, only when it says exactly that bullet in English: a copy that left
 * out office lines or merged options' bullets no longer lines up with its keys, and then each bullet
 * is read back on its own.
 */
function keyedLine(line: KeyedLine | undefined, bullet: string): KeyedLine | null {
  if (!line || !isWordKey(line.key)) return null;
  return cautionText({ key: line.key, params: line.params }) === bullet ? line : null;
}

/** The lead-safe notice's fixed English sentences (the domain's leadNotice), by their keys under pdf.leadNotice. */
const LEAD_NOTICE_KEYS = ['title', 'targetHousing', 'unknownYear', 'certifiedFirm', 'pamphlet', 'stricter', 'rule'] as const;

/**
 * The lead-safe notice of a proposal in the reader's language: each sentence that is the domain's own
 * English is translated; anything else (and the jurisdiction, by its sentences) as the caution lines are.
 */
export function leadNoticeIn(
  language: Language,
  n: { readonly title: string; readonly bullets: readonly string[]; readonly rule: string; readonly jurisdiction?: string },
): CautionWordsOut {
  const t = translator(language);
  const byEnglish = new Map(LEAD_NOTICE_KEYS.map((k) => [lookup(CATALOG.en, `pdf.leadNotice.${k}`), `pdf.leadNotice.${k}`]));
  const say = (english: string) => {
    const key = byEnglish.get(english);
    return key ? t(key) : english;
  };
  const jurisdiction = cautionIn(language, { title: '', bullets: [], rule: '', jurisdiction: n.jurisdiction }).jurisdiction;
  return { title: say(n.title), bullets: n.bullets.map(say), rule: say(n.rule), jurisdiction, standing: '' };
}
