import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, toNonNegativeMoney } from '../errors/input-checks';
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
  /** retainage rates on work completed and on stored materials, e.g. 0.10 */
  retainage: { work: Ratio; stored: Ratio };
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
  currentDue: Decimal;
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
      retainage: roundToCurrency(d.plus(e).times(rWork).plus(f.times(rStored)), currency),
    };
    totals.scheduledValue = totals.scheduledValue.plus(c);
    totals.previousWork = totals.previousWork.plus(d);
    totals.thisPeriodWork = totals.thisPeriodWork.plus(e);
    totals.storedMaterials = totals.storedMaterials.plus(f);
    totals.completedAndStored = totals.completedAndStored.plus(g);
    totals.balanceToFinish = totals.balanceToFinish.plus(c.minus(g));
    totals.retainage = totals.retainage.plus(line.retainage);
    return line;
  });
  if (!totals.scheduledValue.equals(toDate)) {
    throw new DomainInputError(
      'lines',
      `The scheduled values add up to ${totals.scheduledValue.toString()}, not the contract sum to date ${toDate.toString()}.`,
    );
  }
  totals.shareComplete = toDate.isZero() ? zero : totals.completedAndStored.div(toDate);
  const retainageOnWork = roundToCurrency(totals.previousWork.plus(totals.thisPeriodWork).times(rWork), currency);
  const retainageOnStored = roundToCurrency(totals.storedMaterials.times(rStored), currency);
  const retainage = retainageOnWork.plus(retainageOnStored);
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
