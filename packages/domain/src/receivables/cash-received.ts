import Decimal from 'decimal.js';
import { toDayNumber } from '../calendar/local-date';
import { DomainInputError } from '../errors/domain-input-error';
import { requireInteger, toNonNegativeMoney } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';

/** Money in or out on a local date; `count` lets a caller pass a day's sum at once (default 1). */
export interface DatedAmount {
  date: string;
  amount: MoneyInput;
  count?: number;
}

export interface ReceivedMonth {
  /** "2026-07" */
  month: string;
  received: Decimal;
  paymentCount: number;
  refunded: Decimal;
  refundCount: number;
  /** received − refunded */
  net: Decimal;
}

const MONTH = /^(\d{4})-(0[1-9]|1[0-2])$/;

/** The `count` calendar months ending with `endMonth` ("YYYY-MM"), oldest first. */
export function monthsEnding(endMonth: string, count: number): string[] {
  const m = MONTH.exec(endMonth);
  if (!m) throw new DomainInputError('endMonth', 'Use a month as YYYY-MM.');
  requireInteger(count, 'months', 1, 'number of months');
  const last = Number(m[1]) * 12 + Number(m[2]) - 1;
  return Array.from({ length: count }, (_, i) => {
    const n = last - count + 1 + i;
    return `${String(Math.floor(n / 12)).padStart(4, '0')}-${String((n % 12) + 1).padStart(2, '0')}`;
  });
}

/**
 * Cash received by calendar month (cash basis: money counted on the day it came in, refunds on the
 * day they went out; common practice, no source): payments less refunds per month, with counts.
 * Entries outside the months are ignored.
 */
export function cashReceivedByMonth(input: {
  endMonth: string;
  months: number;
  payments: readonly DatedAmount[];
  refunds: readonly DatedAmount[];
}): { months: ReceivedMonth[]; totals: { received: Decimal; refunded: Decimal; net: Decimal } } {
  const months = monthsEnding(input.endMonth, input.months);
  const rows = new Map(
    months.map((month) => [month, { month, received: new Decimal(0), paymentCount: 0, refunded: new Decimal(0), refundCount: 0 }]),
  );
  const add = (list: readonly DatedAmount[], field: string, into: 'received' | 'refunded'): void => {
    list.forEach((e, i) => {
      toDayNumber(e.date, `${field}[${i}].date`);
      const amount = toNonNegativeMoney(e.amount, `${field}[${i}].amount`);
      const count = e.count === undefined ? 1 : requireInteger(e.count, `${field}[${i}].count`, 0, 'count');
      const row = rows.get(e.date.slice(0, 7));
      if (!row) return;
      row[into] = row[into].plus(amount);
      if (into === 'received') row.paymentCount += count;
      else row.refundCount += count;
    });
  };
  add(input.payments, 'payments', 'received');
  add(input.refunds, 'refunds', 'refunded');
  const out = [...rows.values()].map((r) => ({ ...r, net: r.received.minus(r.refunded) }));
  const received = out.reduce((a, r) => a.plus(r.received), new Decimal(0));
  const refunded = out.reduce((a, r) => a.plus(r.refunded), new Decimal(0));
  return { months: out, totals: { received, refunded, net: received.minus(refunded) } };
}
