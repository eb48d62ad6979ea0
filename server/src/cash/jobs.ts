import type { CashJobMargin, CashJobRow, CashJobs } from '@layerbook/contracts';
import type Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import type { StaffPrincipal } from '../http/principal';
import { averageJobSize, grossMargin, jobMoney, winRate } from './domain';
import { JOB_MONEY, JOB_TOTALS, type JobMoneyRow, type JobTotalsRow, type StoredPrice } from './jobs-sql';
import type { ReportPlan } from './read-only';

export const NO_ACTUAL_COSTS = 'Actual costs (hours worked, materials bought) are not recorded yet, so only the estimated margin is known.';

/** Estimated margin from the estimate's cost lines; null figures when the estimate has no costs. */
function marginOf(price: StoredPrice | null, money: (d: Decimal) => string): CashJobMargin {
  const known = price?.price !== undefined && price.labour !== undefined && price.materialsCost !== undefined;
  const m = known
    ? grossMargin(price.price as string, {
        labour: price.labour as string,
        materialsCost: price.materialsCost as string,
        equipment: price.equipment ?? '0',
        subcontracts: price.subcontracts ?? '0',
        sundries: price.sundries ?? '0',
      })
    : null;
  return {
    estimatedCost: m ? money(m.cost) : null,
    estimatedMargin: m ? money(m.margin) : null,
    estimatedMarginPercent: m?.percent ? m.percent.toFixed(1) : null,
    actualCost: null,
    actualMargin: null,
    actualMarginPercent: null,
    actualMarginReason: NO_ACTUAL_COSTS,
  };
}

/** GET /api/cash/jobs: win rate, average job size and each job's money; margins for the owner only. */
export function cashJobs(staff: StaffPrincipal): ReportPlan<CashJobs> {
  const showMargins = staff.role === 'owner';
  const currency = staff.currency;
  return {
    queries: [
      { name: 'cash_job_totals', text: JOB_TOTALS, values: [staff.tenantId] },
      { name: 'cash_job_money', text: JOB_MONEY, values: [staff.tenantId] },
    ],
    answer: ([totalRows, jobRows]) => {
      const totals = totalRows[0] as unknown as JobTotalsRow;
      const money = (d: Decimal) => moneyOut(d, currency);
      const rate = winRate(totals.accepted, totals.declined);
      const average = averageJobSize(totals.contracted_sum, totals.contracted_count);
      const jobs: CashJobRow[] = (jobRows as unknown as JobMoneyRow[]).map((r) => {
        const m = jobMoney({
          originalContractSum: r.original,
          approvedChangeOrders: r.change_orders,
          issued: r.issued,
          credited: r.credited,
          // an invoice's amount paid is already less the refunds taken from it
          paymentsApplied: r.paid,
          refunded: '0',
        });
        const row: CashJobRow = {
          jobId: r.id,
          title: r.title,
          clientId: r.client_id,
          clientName: r.client_name,
          status: r.status,
          estimated: r.price?.total !== undefined ? moneyOut(r.price.total, currency) : null,
          contracted: money(m.contracted),
          changeOrders: money(m.changeOrders),
          invoiced: money(m.invoiced),
          paid: money(m.paid),
        };
        return showMargins ? { ...row, margin: marginOf(r.price, money) } : row;
      });
      return {
        currency,
        winRate: { accepted: rate.accepted, decided: rate.decided, percent: rate.percent ? rate.percent.toFixed(1) : null },
        averageJobSize: average ? money(average) : null,
        marginsShown: showMargins,
        jobCount: totals.contracted_count,
        jobs,
      };
    },
  };
}
