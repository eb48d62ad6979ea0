import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, toNonNegativeMoney } from '../errors/input-checks';
import { allocateByWeights } from '../money/allocate';
import { minorUnitDigits } from '../money/currency';
import { roundToCurrency } from '../money/money';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';
import { type ChangeOrder, contractSumToDate } from './change-orders';

/** One line of the schedule of values for this period. */
export interface ValueLineInput {
  id: string;
  label: string;
  scheduledValue: MoneyInput;
  /** work completed on earlier applications (their previous + this period), never stored material */
  previousWork: MoneyInput;
  thisPeriodWork: MoneyInput;
  /** materials stored on or off site and not yet installed */
  storedMaterials: MoneyInput;
}

export interface PayApplicationInput {
  currency: string;
  originalContractSum: MoneyInput;
  changeOrders: readonly ChangeOrder[];
  lines: readonly ValueLineInput[];
  /**
   * Retainage rates on work completed and on stored materials, e.g. 0.10. `stopAtShareComplete`
   * (optional, e.g. 0.5): no retainage on completed and stored value beyond that share of the
   * contract sum to date; what was held up to it stays held (a common contract term).
   */
  retainage: { work: Ratio; stored: Ratio; stopAtShareComplete?: Ratio };
  /** earned less retainage on the previous application (0 on the first) */
  previousCertified: MoneyInput;
}

export interface ValueLine {
  id: string;
  label: string;
  scheduledValue: Decimal;
  previousWork: Decimal;
  thisPeriodWork: Decimal;
  storedMaterials: Decimal;
  completedAndStored: Decimal;
  /** completed and stored ÷ scheduled value, 0–1 */
  shareComplete: Decimal;
  balanceToFinish: Decimal;
  retainage: Decimal;
}

export interface PayApplicationSummary {
  originalContractSum: Decimal;
  netChangeOrders: Decimal;
  contractSumToDate: Decimal;
  completedAndStoredToDate: Decimal;
  retainageOnWork: Decimal;
  retainageOnStored: Decimal;
  retainage: Decimal;
  earnedLessRetainage: Decimal;
  previousCertified: Decimal;
  /** negative when more was certified before than is earned now (see `isOverCertified`) */
  currentDue: Decimal;
  /** true when the current amount due is negative: earlier certificates paid more than is earned */
  isOverCertified: boolean;
  /** true when retainage has stopped growing because the job reached `stopAtShareComplete` */
  isRetainageStopped: boolean;
  balanceToFinishWithRetainage: Decimal;
}

export interface PayApplication {
  lines: ValueLine[];
  totals: Omit<ValueLine, 'id' | 'label'>;
  summary: PayApplicationSummary;
}

/**
 * The standard construction payment-application arithmetic, in our own words: per line
 * completed & stored = previous + this period + stored, balance = scheduled − that; retainage
 * = work rate × Σ(previous + this period) + stored rate × Σ stored; current due = earned less
 * retainage − previously certified. Σ scheduled values must equal the contract sum to date.
 * Line retainage is the summary retainage split over the lines by largest remainder, so the
 * lines always add up to it exactly. A negative amount due is kept and flagged, never clamped.
 */
export function computePayApplication(input: PayApplicationInput): PayApplication {
  const { currency } = input;
  requireNonEmpty(input.lines, 'lines', 'schedule of values');
  const original = toNonNegativeMoney(input.originalContractSum, 'originalContractSum', 'original contract sum');
  const toDate = contractSumToDate(original, input.changeOrders);
  const rWork = toRatio(input.retainage.work, 'retainage.work', 'retainage rate');
  const rStored = toRatio(input.retainage.stored, 'retainage.stored', 'retainage rate');
  const zero = new Decimal(0);
  const totals = {
    scheduledValue: zero,
    previousWork: zero,
    thisPeriodWork: zero,
    storedMaterials: zero,
    completedAndStored: zero,
    shareComplete: zero,
    balanceToFinish: zero,
    retainage: zero,
  };
  const lines: ValueLine[] = input.lines.map((l, i) => {
    const at = `lines[${i}]`;
    const c = toNonNegativeMoney(l.scheduledValue, `${at}.scheduledValue`, 'scheduled value');
    const d = toNonNegativeMoney(l.previousWork, `${at}.previousWork`, 'previous work');
    const e = toNonNegativeMoney(l.thisPeriodWork, `${at}.thisPeriodWork`, 'work this period');
    const f = toNonNegativeMoney(l.storedMaterials, `${at}.storedMaterials`, 'stored materials');
    const g = d.plus(e).plus(f);
    if (g.greaterThan(c)) {
      throw new DomainInputError(
        `${at}.thisPeriodWork`,
        'Completed and stored to date is more than the scheduled value; approve a change order first.',
      );
    }
    const line: ValueLine = {
      id: l.id,
      label: l.label,
      scheduledValue: c,
      previousWork: d,
      thisPeriodWork: e,
      storedMaterials: f,
      completedAndStored: g,
      shareComplete: c.isZero() ? zero : g.div(c),
      balanceToFinish: c.minus(g),
      // unrounded share of the retainage; replaced below by its exact allocation
      retainage: d.plus(e).times(rWork).plus(f.times(rStored)),
    };
    totals.scheduledValue = totals.scheduledValue.plus(c);
    totals.previousWork = totals.previousWork.plus(d);
    totals.thisPeriodWork = totals.thisPeriodWork.plus(e);
    totals.storedMaterials = totals.storedMaterials.plus(f);
    totals.completedAndStored = totals.completedAndStored.plus(g);
    totals.balanceToFinish = totals.balanceToFinish.plus(c.minus(g));
    return line;
  });
  if (!totals.scheduledValue.equals(toDate)) {
    throw new DomainInputError(
      'lines',
      `The scheduled values add up to ${totals.scheduledValue.toString()}, not the contract sum to date ${toDate.toString()}.`,
    );
  }
  totals.shareComplete = toDate.isZero() ? zero : totals.completedAndStored.div(toDate);
  const workToDate = totals.previousWork.plus(totals.thisPeriodWork);
  let workBase = workToDate;
  let storedBase = totals.storedMaterials;
  let isRetainageStopped = false;
  if (input.retainage.stopAtShareComplete !== undefined) {
    const stop = toRatio(input.retainage.stopAtShareComplete, 'retainage.stopAtShareComplete', 'share complete');
    // Only the first `stop` share of the contract carries retainage, installed work counted first:
    // as completed and stored value only grows, the amount held never drops when the stop is reached.
    const cap = toDate.times(stop);
    workBase = Decimal.min(workToDate, cap);
    storedBase = Decimal.min(totals.storedMaterials, Decimal.max(cap.minus(workBase), 0));
    isRetainageStopped = totals.completedAndStored.greaterThanOrEqualTo(cap);
  }
  const retainageOnWork = roundToCurrency(workBase.times(rWork), currency);
  const retainageOnStored = roundToCurrency(storedBase.times(rStored), currency);
  const retainage = retainageOnWork.plus(retainageOnStored);
  const weights = lines.map((l) => l.retainage);
  const shares = weights.some((w) => w.greaterThan(0))
    ? allocateByWeights(retainage, weights, minorUnitDigits(currency), 'lines')
    : weights.map(() => zero);
  lines.forEach((l, i) => (l.retainage = shares[i]));
  totals.retainage = retainage;
  const earned = totals.completedAndStored.minus(retainage);
  const previousCertified = toNonNegativeMoney(input.previousCertified, 'previousCertified', 'previously certified amount');
  return {
    lines,
    totals,
    summary: {
      originalContractSum: original,
      netChangeOrders: toDate.minus(original),
      contractSumToDate: toDate,
      completedAndStoredToDate: totals.completedAndStored,
      retainageOnWork,
      retainageOnStored,
      retainage,
      earnedLessRetainage: earned,
      previousCertified,
      currentDue: earned.minus(previousCertified),
      isOverCertified: earned.lessThan(previousCertified),
      isRetainageStopped,
      balanceToFinishWithRetainage: toDate.minus(earned),
    },
  };
}

/** Next period's starting lines: previous work = previous + this period; stored stays until installed. */
export function carryForward(app: PayApplication): ValueLineInput[] {
  return app.lines.map((l) => ({
    id: l.id,
    label: l.label,
    scheduledValue: l.scheduledValue,
    previousWork: l.previousWork.plus(l.thisPeriodWork),
    thisPeriodWork: new Decimal(0),
    storedMaterials: l.storedMaterials,
  }));
}

/** Retainage that steps down as the job progresses, e.g. 10 % until 50 % complete, then 5 %. */
export function retainageRateFor(shareComplete: Ratio, steps: ReadonlyArray<{ fromShareComplete: Ratio; rate: Ratio }>): Decimal {
  const done = toRatio(shareComplete, 'shareComplete', 'share complete');
  requireNonEmpty(steps, 'steps', 'list of retainage steps');
  let rate: Decimal | null = null;
  let from = new Decimal(-1);
  steps.forEach((s, i) => {
    const threshold = toRatio(s.fromShareComplete, `steps[${i}].fromShareComplete`, 'threshold');
    if (threshold.lessThanOrEqualTo(done) && threshold.greaterThan(from)) {
      from = threshold;
      rate = toRatio(s.rate, `steps[${i}].rate`, 'retainage rate');
    }
  });
  if (rate === null) throw new DomainInputError('steps', 'No retainage step starts at 0 % complete.');
  return rate;
}
