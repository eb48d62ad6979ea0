import { DomainInputError, minorUnitDigits, roundToCurrency, roundsToZero, sumMoney, valueLineWork } from '@layerbook/contracts/engine';
import { MONEY_AMOUNT_PATTERN, type InvoiceDraftUpdate, type ProgressTableLine } from '@layerbook/contracts/types';
import { AMOUNT_WORDS, toAmount } from '../../shared/forms/money-input';

/** How the office gives a line's work done to date: a percent of its scheduled value, or an amount. */
export type WorkMode = 'percent' | 'amount';

/** One line of the progress form, as typed. */
export interface ProgressLineValue {
  readonly valueLineId: string;
  readonly mode: WorkMode;
  readonly workToDate: string;
  readonly storedMaterials: string;
}

type Line = Pick<ProgressTableLine, 'scheduledValue' | 'previousWork' | 'thisPeriodWork' | 'storedMaterials' | 'percentComplete'>;

const PERCENT_TYPED = /^\d{1,3}(\.\d{1,4})?$/; // the API takes four decimals

export const PERCENT_WORDS = 'Enter a percent from 0 to 100, like 62.5.';

/** "62.5 %" → "62.5"; blank → null. */
export function toPercent(typed: string): string | null {
  const plain = typed.trim().replace(/\s*%$/, '');
  return plain === '' ? null : plain;
}

/** The work billed to date on the draft as it stands: previous work + this period (added by the domain, exactly). */
export function workToDateAmount(line: Line, currency: string): string {
  const total = sumMoney([roundToCurrency(line.previousWork, currency), roundToCurrency(line.thisPeriodWork, currency)]);
  return total.toFixed(minorUnitDigits(currency));
}

/**
 * What a line's field starts with in each mode. The table's percent complete counts stored
 * materials too, so it is the work's own percent only when nothing is stored; otherwise the
 * percent field starts empty rather than with a figure that means something else.
 */
export function startingWork(line: Line, mode: WorkMode, currency: string): string {
  if (mode === 'amount') return workToDateAmount(line, currency);
  return roundsToZero(line.storedMaterials, currency) ? line.percentComplete : '';
}

/** The work to date as PATCH /api/invoices/:id takes it; null while blank or not a number. */
export function toWorkToDate(mode: WorkMode, typed: string): { readonly percent: number } | { readonly amount: string } | null {
  if (mode === 'percent') {
    const percent = toPercent(typed);
    return percent !== null && PERCENT_TYPED.test(percent) ? { percent: Number(percent) } : null;
  }
  const amount = toAmount(typed);
  return amount !== null && MONEY_AMOUNT_PATTERN.test(amount) ? { amount } : null;
}

export type LinePreview =
  { readonly isValid: true; readonly thisPeriod: string; readonly toDate: string } | { readonly isValid: false; readonly message: string };

/**
 * What the line would bill this period, by the domain's own rule (valueLineWork: billed work never
 * shrinks nor passes the scheduled value); null while nothing is typed. The server computes again on save.
 */
export function previewLine(line: Line, mode: WorkMode, typed: string, currency: string): LinePreview | null {
  const plain = mode === 'percent' ? toPercent(typed) : toAmount(typed);
  if (plain === null) return null;
  const work = toWorkToDate(mode, typed);
  if (work === null) {
    return { isValid: false, message: mode === 'percent' ? PERCENT_WORDS : AMOUNT_WORDS.amount };
  }
  try {
    const thisPeriod = valueLineWork({
      scheduledValue: line.scheduledValue,
      previousWork: line.previousWork,
      currency,
      ...('percent' in work ? { percentToDate: plain } : { amountToDate: work.amount }),
    });
    const digits = minorUnitDigits(currency);
    const toDate = sumMoney([roundToCurrency(line.previousWork, currency), thisPeriod]);
    return { isValid: true, thisPeriod: thisPeriod.toFixed(digits), toDate: toDate.toFixed(digits) };
  } catch (error) {
    if (error instanceof DomainInputError) return { isValid: false, message: error.message };
    throw error;
  }
}

/** The form's lines as the API takes them; blank stored materials count as none. */
export function progressLinesUpdate(values: readonly ProgressLineValue[]): NonNullable<InvoiceDraftUpdate['progressLines']> {
  return values.map((value) => {
    const workToDate = toWorkToDate(value.mode, value.workToDate);
    if (workToDate === null) throw new Error(`Line ${value.valueLineId} has no work to date; validate the form first.`);
    return { valueLineId: value.valueLineId, workToDate, storedMaterials: toAmount(value.storedMaterials) ?? '0' };
  });
}

/**
 * The server names a line's field by its path in the body, as its schema does
 * ("progressLines.2.workToDate.amount") or as its checks do ("progressLines[2].storedMaterials");
 * the form's path uses dots, and has one field for either kind of work, so the last part goes.
 */
export function formFieldOf(field: string): string {
  return field.replace(/^progressLines\[(\d+)\]/, 'progressLines.$1').replace(/^(progressLines\.\d+\.workToDate)\.(amount|percent)$/, '$1');
}
