import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toDecimal } from '../errors/input-checks';
import { type IsoDate, fromDayNumber, toDayNumber } from '../calendar/local-date';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { toCurrencyAmount } from './currency-amount';

/** One layer on one surface: done on a day, or not yet. */
export interface LayerItem {
  layerId: string;
  doneOn: IsoDate | null;
}

export interface LayerCompletion {
  /** surfaces that take the layer */
  total: number;
  done: number;
  /** the layer is done on every surface it covers (a layer on no surface is never complete) */
  isComplete: boolean;
  /** the day the last surface was done, when complete */
  completedOn: IsoDate | null;
}

/** Whether a layer is finished on every surface it covers: the trigger of a "when a layer is done" payment. */
export function layerCompletion(items: readonly LayerItem[], layerId: string, field = 'items'): LayerCompletion {
  let total = 0;
  let done = 0;
  let latest = Number.NEGATIVE_INFINITY;
  items.forEach((item, i) => {
    if (item.layerId !== layerId) return;
    total += 1;
    if (item.doneOn === null) return;
    done += 1;
    latest = Math.max(latest, toDayNumber(item.doneOn, `${field}[${i}].doneOn`));
  });
  const isComplete = total > 0 && done === total;
  return { total, done, isComplete, completedOn: isComplete ? fromDayNumber(latest) : null };
}

export interface ValueLineWorkInput {
  scheduledValue: MoneyInput;
  /** percent complete to date, 0–100 ("62.5"); give this or `amountToDate` */
  percentToDate?: number | string;
  /** work completed to date as an amount; give this or `percentToDate` */
  amountToDate?: MoneyInput;
  /** work billed on earlier invoices for this line */
  previousWork: MoneyInput;
  currency: string;
}

/**
 * Work completed this period on a schedule-of-values line: work to date − previous work, with work
 * to date given as an amount or as a percent of the scheduled value (rounded half up to the
 * currency). Billed work never shrinks and never passes the scheduled value (DOMAIN.md §2.10:
 * D = previous D + previous E, G ≤ C; a decrease is a change order or a credit, not a negative period).
 */
export function valueLineWork(input: ValueLineWorkInput): Decimal {
  const digits = minorUnitDigits(input.currency, 'currency');
  const scheduled = toCurrencyAmount(input.scheduledValue, digits, 'scheduledValue', 'scheduled value');
  const previous = toCurrencyAmount(input.previousWork, digits, 'previousWork', 'previous work');
  if (previous.greaterThan(scheduled))
    throw new DomainInputError('previousWork', 'The work billed before is more than the scheduled value.');
  const hasPercent = input.percentToDate !== undefined && input.percentToDate !== null;
  const hasAmount = input.amountToDate !== undefined && input.amountToDate !== null;
  if (hasPercent === hasAmount) {
    throw new DomainInputError(
      hasPercent ? 'amountToDate' : 'percentToDate',
      'Give the work to date as a percent or as an amount, one of them.',
    );
  }
  let toDate: Decimal;
  let field: string;
  if (hasPercent) {
    field = 'percentToDate';
    if (typeof input.percentToDate !== 'number' && typeof input.percentToDate !== 'string') {
      throw new DomainInputError(field, 'The percent complete is not a number.');
    }
    const percent = toDecimal(input.percentToDate, field, 'percent complete');
    if (percent.isNegative() || percent.greaterThan(100)) throw new DomainInputError(field, 'The percent complete is between 0 and 100.');
    toDate = scheduled.times(percent).div(100).toDecimalPlaces(digits, Decimal.ROUND_HALF_UP);
  } else {
    field = 'amountToDate';
    toDate = toCurrencyAmount(input.amountToDate as MoneyInput, digits, field, 'work to date');
  }
  const fixed = (d: Decimal): string => d.toFixed(digits);
  if (toDate.lessThan(previous)) {
    throw new DomainInputError(
      field,
      `Work to date ${fixed(toDate)} is less than the ${fixed(previous)} already billed; billed work never goes down.`,
    );
  }
  if (toDate.greaterThan(scheduled)) {
    throw new DomainInputError(field, `Work to date ${fixed(toDate)} is more than the scheduled value ${fixed(scheduled)}.`);
  }
  return toDate.minus(previous);
}
