import type { CashReceived } from '@layerbook/contracts';
import type Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import type { StaffPrincipal } from '../http/principal';
import { cashReceivedByMonth, type DatedAmount } from './domain';
import { staffClock } from './firm-clock';
import type { ReportPlan } from './read-only';

const MONTHS = 12;

/**
 * Payments by received day and refunds that went through by refund day, since $2; $1 tenant. The
 * database keeps these per-day sums itself (cash_received_days, by triggers on payments and refunds).
 */
export const RECEIVED_BY_DAY = `select case d.kind when 'payment' then 'p' else 'r' end as kind, d.day::text as day, d.amount::text as amount, d.count as n
      from cash_received_days d where d.tenant_id = $1 and d.day >= $2::date`;

/** First day of the month `back` months before the month of `today` (YYYY-MM-DD). */
function monthStart(today: string, back: number): string {
  const n = Number(today.slice(0, 4)) * 12 + Number(today.slice(5, 7)) - 1 - back;
  return `${String(Math.floor(n / 12)).padStart(4, '0')}-${String((n % 12) + 1).padStart(2, '0')}-01`;
}

type DayRow = { kind: 'p' | 'r'; day: string; amount: string; n: number };

/**
 * GET /api/cash/received: payments by their received date less refunds that went through by their
 * refund date (both firm-local dates), summed per day in SQL and per month by packages/domain.
 */
export function cashReceived(staff: StaffPrincipal, now: Date): ReportPlan<CashReceived> {
  const clock = staffClock(staff, now);
  const from = monthStart(clock.today, MONTHS - 1);
  return {
    queries: [{ name: 'cash_received_days', text: RECEIVED_BY_DAY, values: [staff.tenantId, from] }],
    answer: ([days]) => {
      const rows = days as DayRow[];
      const of = (kind: 'p' | 'r'): DatedAmount[] =>
        rows.filter((r) => r.kind === kind).map((r) => ({ date: r.day, amount: r.amount, count: r.n }));
      const result = cashReceivedByMonth({ endMonth: clock.today.slice(0, 7), months: MONTHS, payments: of('p'), refunds: of('r') });
      const money = (d: Decimal) => moneyOut(d, clock.currency);
      return {
        currency: clock.currency,
        months: result.months.map((m) => ({
          month: m.month,
          received: money(m.received),
          paymentCount: m.paymentCount,
          refunded: money(m.refunded),
          refundCount: m.refundCount,
          net: money(m.net),
        })),
        totals: { received: money(result.totals.received), refunded: money(result.totals.refunded), net: money(result.totals.net) },
      };
    },
  };
}
