import Decimal from 'decimal.js';
import { type IsoDate, toDayNumber } from '../calendar/local-date';
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
}

export interface AgedReceivable {
  id: string;
  daysPastDue: number;
  bucket: AgingBucket;
  /** due now: amount − retainage − payments (payments go to the due part first) */
  open: Decimal;
  retainage: Decimal;
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

/** Ages open receivables by days past due as of a date (accounting glossaries; common practice). */
export function ageReceivables(invoices: readonly ReceivableInput[], asOf: IsoDate): AgingReport {
  const today = toDayNumber(asOf, 'asOf');
  const buckets = Object.fromEntries(AGING_BUCKETS.map((b) => [b, new Decimal(0)])) as Record<AgingBucket, Decimal>;
  let retainageTotal = new Decimal(0);
  const dueDays = new Map<IsoDate, number>();
  const aged = invoices.map((inv, i) => {
    const at = `invoices[${i}]`;
    const amount = toNonNegativeMoney(inv.amount, `${at}.amount`);
    const retainage = inv.retainageHeld === undefined ? new Decimal(0) : toNonNegativeMoney(inv.retainageHeld, `${at}.retainageHeld`);
    let paid = new Decimal(0);
    (inv.payments ?? []).forEach((p, k) => {
      paid = paid.plus(toNonNegativeMoney(p, `${at}.payments[${k}]`, 'payment'));
    });
    const duePart = Decimal.max(amount.minus(retainage), 0);
    const open = Decimal.max(duePart.minus(paid), 0);
    const overpaid = Decimal.max(paid.minus(duePart), 0);
    const retainageOpen = Decimal.max(retainage.minus(overpaid), 0);
    // Many invoices share a due date: read each date once (a bad one still fails at its first invoice).
    let due = dueDays.get(inv.dueDate);
    if (due === undefined) {
      due = toDayNumber(inv.dueDate, `${at}.dueDate`);
      dueDays.set(inv.dueDate, due);
    }
    const daysPastDue = today - due;
    const bucket = bucketFor(daysPastDue);
    buckets[bucket] = buckets[bucket].plus(open);
    retainageTotal = retainageTotal.plus(retainageOpen);
    return { id: inv.id, daysPastDue, bucket, open, retainage: retainageOpen };
  });
  const total = AGING_BUCKETS.reduce((a, b) => a.plus(buckets[b]), new Decimal(0));
  return { asOf, basis: 'daysPastDue', buckets, retainage: retainageTotal, total, invoices: aged };
}
