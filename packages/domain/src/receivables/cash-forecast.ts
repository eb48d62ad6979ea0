import Decimal from 'decimal.js';
import { type IsoDate, fromDayNumber, isoWeekLabel, mondayOf, toDayNumber } from '../calendar/local-date';
import { requireInteger, toNonNegativeMoney } from '../errors/input-checks';
import { roundToCurrency } from '../money/money';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';

export interface ExpectedReceipt {
  id: string;
  date: IsoDate;
  amount: MoneyInput;
  /** chance it arrives in that week, 0–1 (default 1) */
  probability?: Ratio;
}

export interface CashForecastInput {
  asOf: IsoDate;
  weeks: number;
  currency: string;
  /** open balances by due date; overdue ones are expected in the first week */
  openInvoices: readonly ExpectedReceipt[];
  /** scheduled milestone billings by expected date */
  milestones: readonly ExpectedReceipt[];
  /** pipeline deposits: deposit × win probability, by expected signing date */
  pipelineDeposits: readonly ExpectedReceipt[];
}

export interface ForecastWeek {
  /** Monday of the ISO week */
  weekStart: IsoDate;
  isoWeek: string;
  invoices: Decimal;
  milestones: Decimal;
  pipeline: Decimal;
  total: Decimal;
}

export type ForecastStream = 'invoices' | 'milestones' | 'pipeline';
type Stream = ForecastStream;

/**
 * Cash expected per ISO week (Monday start) from the as-of week on: open invoices at their due
 * dates, milestones at their dates, pipeline deposits weighted by probability. Amounts past the
 * horizon are totalled apart; weekly figures are rounded to the currency's minor unit.
 */
export function cashForecast(input: CashForecastInput): {
  weeks: ForecastWeek[];
  /** Σ beyond, by stream, each rounded to the currency */
  beyond: Record<Stream, Decimal>;
  beyondHorizon: Decimal;
} {
  const count = requireInteger(input.weeks, 'weeks', 1, 'number of weeks');
  const firstMonday = mondayOf(toDayNumber(input.asOf, 'asOf'));
  const sums: Record<Stream, Decimal[]> = {
    invoices: Array.from({ length: count }, () => new Decimal(0)),
    milestones: Array.from({ length: count }, () => new Decimal(0)),
    pipeline: Array.from({ length: count }, () => new Decimal(0)),
  };
  const beyondSums: Record<Stream, Decimal> = { invoices: new Decimal(0), milestones: new Decimal(0), pipeline: new Decimal(0) };
  // Most receipts share a handful of probabilities: parse each once. Only values that passed
  // are kept, so a bad one still fails at its first receipt, naming that receipt's field.
  const ratios = new Map<Ratio, Decimal>();
  const ratioOf = (value: Ratio, field: string): Decimal => {
    // A map sees 0 and −0 as one key, but −0 is refused; zero is cheap to parse anyway.
    if (value === 0) return toRatio(value, field, 'probability');
    let r = ratios.get(value);
    if (r === undefined) {
      r = toRatio(value, field, 'probability');
      ratios.set(value, r);
    }
    return r;
  };
  const add = (stream: Stream, list: readonly ExpectedReceipt[], field: string): void => {
    list.forEach((r, i) => {
      const at = `${field}[${i}]`;
      const amount = toNonNegativeMoney(r.amount, `${at}.amount`);
      const expected = r.probability === undefined ? amount : amount.times(ratioOf(r.probability, `${at}.probability`));
      const week = Math.max(0, Math.floor((toDayNumber(r.date, `${at}.date`) - firstMonday) / 7));
      if (week >= count) beyondSums[stream] = beyondSums[stream].plus(expected);
      else sums[stream][week] = sums[stream][week].plus(expected);
    });
  };
  add('invoices', input.openInvoices, 'openInvoices');
  add('milestones', input.milestones, 'milestones');
  add('pipeline', input.pipelineDeposits, 'pipelineDeposits');
  const weeks: ForecastWeek[] = [];
  for (let w = 0; w < count; w++) {
    const monday = firstMonday + 7 * w;
    const invoices = roundToCurrency(sums.invoices[w], input.currency);
    const milestones = roundToCurrency(sums.milestones[w], input.currency);
    const pipeline = roundToCurrency(sums.pipeline[w], input.currency);
    weeks.push({
      weekStart: fromDayNumber(monday),
      isoWeek: isoWeekLabel(monday),
      invoices,
      milestones,
      pipeline,
      total: invoices.plus(milestones).plus(pipeline),
    });
  }
  const beyond = {
    invoices: roundToCurrency(beyondSums.invoices, input.currency),
    milestones: roundToCurrency(beyondSums.milestones, input.currency),
    pipeline: roundToCurrency(beyondSums.pipeline, input.currency),
  };
  return { weeks, beyond, beyondHorizon: beyond.invoices.plus(beyond.milestones).plus(beyond.pipeline) };
}
