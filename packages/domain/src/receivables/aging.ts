import Decimal from 'decimal.js';
import { fromDayNumber, type IsoDate, toDayNumber } from '../calendar/local-date';
import { DomainInputError } from '../errors/domain-input-error';
import { toNonNegativeMoney } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';

export type AgingBucket = 'current' | '1-30' | '31-60' | '61-90' | '90+';
export const AGING_BUCKETS: readonly AgingBucket[] = ['current', '1-30', '31-60', '61-90', '90+'];

export interface ReceivableInput {
  id: string;
  dueDate: IsoDate;
  /** amount invoiced, including any retainage held back */
  amount: MoneyInput;
  payments?: readonly MoneyInput[];
  /** part of `amount` not due until retainage is released */
  retainageHeld?: MoneyInput;
  /**
   * How many invoices this line stands for (default 1): invoices due the same day can be summed
   * first, since the age depends on the due date alone and each sum adds up the same.
   */
  invoiceCount?: number;
}

export interface AgedReceivable {
  id: string;
  daysPastDue: number;
  bucket: AgingBucket;
  /** due now: amount − retainage − payments (payments go to the due part first) */
  open: Decimal;
  retainage: Decimal;
  invoiceCount: number;
}

export interface AgingReport {
  asOf: IsoDate;
  basis: 'daysPastDue';
  buckets: Record<AgingBucket, Decimal>;
  retainage: Decimal;
  /** Σ buckets, retainage excluded */
  total: Decimal;
  invoices: AgedReceivable[];
}

export function bucketFor(daysPastDue: number): AgingBucket {
  if (daysPastDue <= 0) return 'current';
  if (daysPastDue <= 30) return '1-30';
  if (daysPastDue <= 60) return '31-60';
  if (daysPastDue <= 90) return '61-90';
  return '90+';
}

/** The days past due that make up each age, first and last (null: open-ended). */
const BUCKET_DAYS: Readonly<Record<AgingBucket, readonly [number | null, number | null]>> = {
  current: [null, 0],
  '1-30': [1, 30],
  '31-60': [31, 60],
  '61-90': [61, 90],
  '90+': [91, null],
};

/**
 * The due dates whose invoices fall in an age as of a day, both ends included (null: no bound), so
 * a drill-down can ask for one age's invoices and still age them here.
 */
export function bucketDueDates(bucket: AgingBucket, asOf: IsoDate): { from: IsoDate | null; to: IsoDate | null } {
  const today = toDayNumber(asOf, 'asOf');
  const [fewest, most] = BUCKET_DAYS[bucket];
  return {
    from: most === null ? null : fromDayNumber(today - most),
    to: fewest === null ? null : fromDayNumber(today - fewest),
  };
}

const ZERO = new Decimal(0);

/** What is due now and what retainage stays held: payments go to the due part first. */
function splitDue(inv: ReceivableInput, amount: Decimal, at: string): { open: Decimal; retainageOpen: Decimal } {
  const retainage = inv.retainageHeld === undefined ? ZERO : toNonNegativeMoney(inv.retainageHeld, `${at}.retainageHeld`);
  let paid = ZERO;
  (inv.payments ?? []).forEach((p, k) => {
    paid = paid.plus(toNonNegativeMoney(p, `${at}.payments[${k}]`, 'payment'));
  });
  const duePart = Decimal.max(amount.minus(retainage), 0);
  const overpaid = Decimal.max(paid.minus(duePart), 0);
  return { open: Decimal.max(duePart.minus(paid), 0), retainageOpen: Decimal.max(retainage.minus(overpaid), 0) };
}

/** Ages open receivables by days past due as of a date (accounting glossaries; common practice). */
export function ageReceivables(invoices: readonly ReceivableInput[], asOf: IsoDate): AgingReport {
  const today = toDayNumber(asOf, 'asOf');
  const buckets = Object.fromEntries(AGING_BUCKETS.map((b) => [b, new Decimal(0)])) as Record<AgingBucket, Decimal>;
  let retainageTotal = new Decimal(0);
  const dueDays = new Map<IsoDate, number>();
  const aged = invoices.map((inv, i) => {
    const at = `invoices[${i}]`;
    const amount = toNonNegativeMoney(inv.amount, `${at}.amount`);
    const { open, retainageOpen } =
      inv.retainageHeld === undefined && (inv.payments ?? []).length === 0
        ? { open: amount, retainageOpen: ZERO } // nothing held back, nothing paid: the whole amount is due (most rows)
        : splitDue(inv, amount, at);
    // Many invoices share a due date: read each date once (a bad one still fails at its first invoice).
    let due = dueDays.get(inv.dueDate);
    if (due === undefined) {
      due = toDayNumber(inv.dueDate, `${at}.dueDate`);
      dueDays.set(inv.dueDate, due);
    }
    const daysPastDue = today - due;
    const bucket = bucketFor(daysPastDue);
    buckets[bucket] = buckets[bucket].plus(open);
    if (!retainageOpen.isZero()) retainageTotal = retainageTotal.plus(retainageOpen);
    const invoiceCount = inv.invoiceCount ?? 1;
    if (!Number.isInteger(invoiceCount) || invoiceCount < 1)
      throw new DomainInputError(`${at}.invoiceCount`, 'The invoice count must be a whole number of 1 or more.');
    return { id: inv.id, daysPastDue, bucket, open, retainage: retainageOpen, invoiceCount };
  });
  const total = AGING_BUCKETS.reduce((a, b) => a.plus(buckets[b]), new Decimal(0));
  return { asOf, basis: 'daysPastDue', buckets, retainage: retainageTotal, total, invoices: aged };
}
