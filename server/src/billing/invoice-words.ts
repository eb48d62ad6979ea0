import {
  type BillingTerms,
  DEPOSIT_CAP_PRESETS,
  type DepositCapPresetId,
  type InvoiceDocument,
  type InvoiceLine,
  type InvoiceWords,
  type InvoiceWordsParam,
  type Language,
  type PaymentTermsSetting,
  type ProgressTable,
} from '@layerbook/contracts';
import { formatMoney, paymentLabelWords, type PaymentTrigger, type SystemWords, termsWords } from '@layerbook/domain';
import { translator } from '../i18n/catalog';
import { formatsFor } from '../proposals/pdf/format';

/**
 * The words the system itself writes into an invoice — a schedule line's label, the retainage
 * release, the payment terms, a ready-made deposit rule's name — kept by key beside their English
 * text, and read back in each reader's language. English readers (the office included) read the
 * stored text, so an issued invoice never changes what it says; text a person typed has no key.
 */

const AREA = 'invoiceWords';
const inArea = (w: SystemWords): InvoiceWords => ({ key: `${AREA}.${w.key}`, ...(w.params ? { params: w.params } : {}) });

/** The release line of a progress-billed job's retainage. */
export const RETAINAGE_RELEASED_LINE = { label: 'Retainage released', words: { key: `${AREA}.line.retainageReleased` } } as const;

/** The one value line of a job whose estimate has no rooms (work-items' default). */
export const ALL_THE_WORK = { label: 'All the work', words: { key: `${AREA}.line.allTheWork` } } as const;

/** A schedule line's label by key, when paymentLabel wrote it for this role and trigger (a typed label has none). */
export function scheduleLineWords(
  label: string,
  role: 'deposit' | 'milestone' | 'final',
  trigger: PaymentTrigger,
): InvoiceWords | undefined {
  const words = paymentLabelWords(label, role, trigger);
  return words ? inArea(words) : undefined;
}

/** The ready-made deposit rule a job's rule is, by its name (and whether it limits at all); undefined for a rule the firm named. */
export function depositPresetOf(name: string, hasCap: boolean): DepositCapPresetId | undefined {
  return DEPOSIT_CAP_PRESETS.find((p) => p.name === name && (p.rule.kind !== 'none') === hasCap)?.id;
}

/** What the document keeps beside termsText and depositCapName to say them again in another language. */
export function documentWords(terms: BillingTerms): { terms: PaymentTermsSetting; depositRule?: DepositCapPresetId } {
  const depositRule = depositPresetOf(terms.depositCapName, terms.depositCap !== null);
  return { terms: terms.terms, ...(depositRule ? { depositRule } : {}) };
}

/**
 * The lines of an invoice with the key of every label the system wrote: a schedule line's (given
 * its role and trigger) and the retainage release. Lines that have words already keep them.
 */
export function linesWithWords(
  lines: readonly InvoiceLine[],
  scheduleLine: { role: 'deposit' | 'milestone' | 'final'; trigger: PaymentTrigger } | null,
): InvoiceLine[] {
  return lines.map((l) => {
    if (l.words) return l;
    const words =
      l.label === RETAINAGE_RELEASED_LINE.label
        ? RETAINAGE_RELEASED_LINE.words
        : scheduleLine
          ? scheduleLineWords(l.label, scheduleLine.role, scheduleLine.trigger)
          : undefined;
    return words ? { ...l, words } : l;
  });
}

/** A progress table with the key of the default value line's label. */
export function progressWithWords(progress: ProgressTable | null): ProgressTable | null {
  if (!progress) return null;
  return {
    ...progress,
    lines: progress.lines.map((l) => (!l.words && l.label === ALL_THE_WORK.label ? { ...l, words: ALL_THE_WORK.words } : l)),
  };
}

/** Who reads: their language and the locale their numbers, dates and money are formatted in ("es-US"). */
export interface WordsReader {
  readonly language: Language;
  readonly locale: string;
}

function paramText(p: InvoiceWordsParam, locale: string): string | number {
  if (typeof p === 'string' || typeof p === 'number') return p;
  if ('date' in p) return formatsFor(locale, 'USD').date(p.date);
  return formatMoney(p.money, p.currency, locale);
}

/**
 * Words the system wrote, for one reader: the stored English text for an English reader, for text
 * without a key, or for a key the catalog no longer has; else the key in the reader's language.
 */
export function systemText(reader: WordsReader, english: string, words: InvoiceWords | undefined): string {
  if (!words || reader.language === 'en') return english;
  const params: Record<string, string | number> = {};
  for (const [name, p] of Object.entries(words.params ?? {})) params[name] = paramText(p, reader.locale);
  try {
    return translator(reader.language)(words.key, params);
  } catch {
    return english;
  }
}

/** A ready-made rule's name with its figures (the California rule is in US dollars). */
function depositRuleWords(id: DepositCapPresetId): InvoiceWords {
  const rule = DEPOSIT_CAP_PRESETS.find((p) => p.id === id)?.rule;
  return rule?.kind === 'lesserOf'
    ? { key: `${AREA}.depositRule.${id}`, params: { amount: { money: rule.amount, currency: 'USD' }, percent: rule.percent } }
    : { key: `${AREA}.depositRule.${id}` };
}

/** A deposit rule's name for one reader: a ready-made rule (by its id) in their words, a named one as named. */
export function depositRuleText(reader: WordsReader, english: string, id: DepositCapPresetId | undefined): string {
  return systemText(reader, english, id ? depositRuleWords(id) : undefined);
}

/** The document's terms and deposit rule in the reader's words. */
export function documentForReader(reader: WordsReader, d: InvoiceDocument): InvoiceDocument {
  if (reader.language === 'en') return d;
  let terms: InvoiceWords | undefined;
  try {
    terms = d.terms ? inArea(termsWords(d.terms)) : undefined;
  } catch {
    terms = undefined;
  }
  return {
    ...d,
    termsText: systemText(reader, d.termsText, terms),
    depositCapName: systemText(reader, d.depositCapName, d.depositRule ? depositRuleWords(d.depositRule) : undefined),
  };
}

/** The invoice's lines in the reader's words. */
export function linesForReader(reader: WordsReader, lines: readonly InvoiceLine[]): InvoiceLine[] {
  return lines.map((l) => ({ ...l, label: systemText(reader, l.label, l.words) }));
}

/** A progress table in the reader's words. */
export function progressForReader(reader: WordsReader, p: ProgressTable | null): ProgressTable | null {
  return p && { ...p, lines: p.lines.map((l) => ({ ...l, label: systemText(reader, l.label, l.words) })) };
}
