import { STAGE_LABELS, type CashForecast, type CashForecastAmounts } from '@layerbook/contracts';
import { addDays } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { cashForecast } from './domain';
import type { StaffPrincipal } from '../http/principal';
import { staffClock } from './firm-clock';
import { DEFAULT_SIGNING_DAYS, forecastQueries, readOwed, readPipeline, type Receipt } from './forecast-inputs';
import type { ReportPlan } from './read-only';

export const FORECAST_WEEKS = 13;

/**
 * GET /api/cash/forecast: 13 weeks from this week (firm zone), computed by packages/domain's
 * cashForecast from open invoices, unbilled schedule lines and weighted inquiry deposits.
 */
export function cashForecastView(staff: StaffPrincipal, now: Date): ReportPlan<CashForecast> {
  const clock = staffClock(staff, now);
  return {
    queries: forecastQueries(staff.tenantId),
    answer: ([owedRows, ...pipelineRows]) => forecastOf(clock, readOwed(owedRows), readPipeline(pipelineRows, clock.today, clock.currency)),
  };
}

function forecastOf(
  clock: { today: string; currency: string },
  owed: ReturnType<typeof readOwed>,
  pipeline: ReturnType<typeof readPipeline>,
): CashForecast {
  // A line whose trigger has no date yet is counted beyond the horizon (the day after it).
  const undated = addDays(clock.today, 7 * FORECAST_WEEKS + 7);
  const dated = (list: readonly Receipt[]) => list.map((r) => ({ ...r, date: r.date ?? undated }));
  const result = cashForecast({
    asOf: clock.today,
    weeks: FORECAST_WEEKS,
    currency: clock.currency,
    openInvoices: dated(owed.invoices),
    milestones: dated(owed.scheduled),
    pipelineDeposits: dated(pipeline.deposits),
  });
  const money = (d: Decimal) => moneyOut(d, clock.currency);
  const amounts = (invoices: Decimal, scheduled: Decimal, pipe: Decimal): CashForecastAmounts => ({
    invoices: money(invoices),
    scheduled: money(scheduled),
    pipeline: money(pipe),
    total: money(invoices.plus(scheduled).plus(pipe)),
  });
  const weeks = result.weeks.map((w) => ({ weekStart: w.weekStart, isoWeek: w.isoWeek, ...amounts(w.invoices, w.milestones, w.pipeline) }));
  const sum = (k: 'invoices' | 'milestones' | 'pipeline') => result.weeks.reduce((a, w) => a.plus(w[k]), result.beyond[k]);
  const share = `${new Decimal(pipeline.share).times(100).toFixed(1)} %`;
  return {
    asOf: clock.today,
    currency: clock.currency,
    weeks,
    beyondHorizon: amounts(result.beyond.invoices, result.beyond.milestones, result.beyond.pipeline),
    totals: amounts(sum('invoices'), sum('milestones'), sum('pipeline')),
    odds: pipeline.odds.map((o) => ({
      stage: o.stage,
      label: STAGE_LABELS[o.stage],
      percent: o.percent,
      source: o.source,
      openCount: pipeline.counts.get(o.stage) ?? 0,
    })),
    notes: [
      'Open invoices: what is still owed, in the week it falls due; overdue ones in this week.',
      'Scheduled billing: payment schedule lines not yet invoiced, in the week the work schedule expects their trigger; lines with no date yet are counted beyond the 13 weeks. Progress-billed work not yet claimed is not counted.',
      `Inquiry deposits: the inquiry's value × ${share} (${pipeline.shareIsFirm ? "the firm's own deposits ÷ its contract sums" : 'a default share, common practice, no source'}), within the deposit limit, × the stage's odds (the firm's own where set in Inquiries, else a default, common practice, no source); expected at the next follow-up, or in ${DEFAULT_SIGNING_DAYS} days when none is set.`,
      'Retainage held is not forecast: it is released when the firm bills it.',
    ],
  };
}
