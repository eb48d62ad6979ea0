import { DEFAULT_STAGE_LIKELIHOOD, INQUIRY_STAGES, type BillingSettings, type InquiryStage } from '@layerbook/contracts';
import type { SqlQuery } from '@layerbook/db';
import { addDays } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { BILLING_SETTINGS_SQL, billingSettingsOf, toDepositCapRule } from '../billing/settings';
import { expectedDeposit, stageOdds } from './domain';

/** The stages an open inquiry can be at. */
export const OPEN_STAGES = INQUIRY_STAGES.filter((s) => s !== 'won' && s !== 'lost');

/** Deposit share when the firm has no jobs to learn it from (common practice, no source). */
export const DEFAULT_DEPOSIT_SHARE = '0.1';
/** Days until an open inquiry with no follow-up date is expected to sign (common practice, no source). */
export const DEFAULT_SIGNING_DAYS = 14;

/**
 * Open invoices' amounts owed and unbilled schedule lines, each summed per date (the forecast adds
 * them up per week, so a day's sum counts the same as its rows); $1 tenant. What is owed comes from
 * the open balances the database keeps per due date (cash_open_due_days: issued, part paid or
 * refunded invoices with total − paid − credited > 0; issuing always sets the due date).
 */
export const OWED = `select 'i' as kind, d.due_on::text as date, d.owed::text as amount from cash_open_due_days d
      where d.tenant_id = $1
     union all
     select 's', l.expected_on::text, sum(l.amount)::text from payment_schedule_lines l
       join jobs j on j.tenant_id = l.tenant_id and j.id = l.job_id
      where l.tenant_id = $1 and l.status in ('draft', 'scheduled', 'ready') and j.status <> 'cancelled' and l.amount > 0
      group by l.expected_on`;

export interface Receipt {
  id: string;
  date: string | null;
  amount: string;
  /** 0–1 as a decimal string */
  probability?: string;
}

type Rows = Record<string, unknown>[];

/** The stage odds the firm set in Inquiries. */
const STAGE_SETTINGS = `select stage, likelihood_percent::text as percent from inquiry_stage_settings where tenant_id = $1`;

/** The firm's own deposit share so far: Σ deposit lines ÷ Σ original contract sums of its jobs. */
const DEPOSIT_HISTORY = `select sum(d.amount)::text as deposits, sum(j.original_contract_sum)::text as contracts
       from jobs j join (select job_id, sum(amount) as amount from payment_schedule_lines where tenant_id = $1 and role = 'deposit' group by job_id) d
         on d.job_id = j.id
      where j.tenant_id = $1 and j.status <> 'cancelled' and j.original_contract_sum > 0`;

/** Open inquiries with their value: the inquiry's estimated value, else its latest estimate's price. */
const OPEN_INQUIRIES = `select q.id, q.stage, coalesce(q.estimated_value,
              (select e.price from estimates e where e.tenant_id = q.tenant_id and e.inquiry_id = q.id and e.price is not null
                order by e.created_at desc limit 1))::text as value, q.next_follow_up::text as follow_up
       from inquiries q where q.tenant_id = $1 and q.stage not in ('won', 'lost')`;

/** What the forecast reads, in order: owed (OWED), then the pipeline's four (see readPipeline); $1 tenant. */
export const forecastQueries = (tenantId: string): SqlQuery[] =>
  (
    [
      ['cash_forecast_owed', OWED],
      ['cash_forecast_odds', STAGE_SETTINGS],
      ['cash_forecast_deposit_history', DEPOSIT_HISTORY],
      ['cash_forecast_billing_settings', BILLING_SETTINGS_SQL],
      ['cash_forecast_inquiries', OPEN_INQUIRIES],
    ] as const
  ).map(([name, text]) => ({ name, text, values: [tenantId] }));

/** Open invoices (amount still owed, by due date) and unbilled schedule lines (by the engine's expected date), per date. */
export function readOwed(owedRows: Rows): { invoices: Receipt[]; scheduled: Receipt[] } {
  const rows = owedRows as Array<{ kind: 'i' | 's'; date: string | null; amount: string }>;
  const pick = (kind: 'i' | 's') =>
    rows.filter((r) => r.kind === kind).map(({ date, amount }) => ({ id: `${kind}:${date ?? 'undated'}`, date, amount }));
  return { invoices: pick('i'), scheduled: pick('s') };
}

/**
 * Deposits of open inquiries, each weighted by its stage's odds. Value: the inquiry's estimated
 * value, else its latest estimate's price. Deposit share: the firm's own (deposit lines ÷ original
 * contract sums of its jobs) or the default, within the firm's deposit limit. From the rows of
 * forecastQueries' last four, in order.
 */
export function readPipeline(
  [settingRows, historyRows, billingRows, openRows]: Rows[],
  today: string,
  currency: string,
): {
  deposits: Receipt[];
  odds: ReturnType<typeof stageOdds<InquiryStage>>;
  counts: Map<InquiryStage, number>;
  share: string;
  shareIsFirm: boolean;
} {
  const settings = settingRows as Array<{ stage: InquiryStage; percent: string }>;
  const odds = stageOdds(OPEN_STAGES, new Map(settings.map((r) => [r.stage, Number(r.percent)])), DEFAULT_STAGE_LIKELIHOOD);
  const h = historyRows[0] as { deposits: string | null; contracts: string | null };
  const shareIsFirm = h.deposits !== null && h.contracts !== null;
  const share = shareIsFirm
    ? new Decimal(h.deposits as string)
        .dividedBy(h.contracts as string)
        .toDecimalPlaces(4)
        .toString()
    : DEFAULT_DEPOSIT_SHARE;
  const cap = toDepositCapRule(billingSettingsOf(billingRows as Array<{ settings: BillingSettings }>).settings.depositCap);
  const counts = new Map<InquiryStage, number>();
  const percent = new Map(odds.map((o) => [o.stage, o.percent]));
  const signing = addDays(today, DEFAULT_SIGNING_DAYS);
  const deposits: Receipt[] = [];
  for (const q of openRows as Array<{ id: string; stage: InquiryStage; value: string | null; follow_up: string | null }>) {
    counts.set(q.stage, (counts.get(q.stage) ?? 0) + 1);
    if (q.value === null) continue;
    deposits.push({
      id: q.id,
      date: q.follow_up !== null && q.follow_up >= today ? q.follow_up : signing,
      amount: expectedDeposit(q.value, share, cap, currency).toFixed(2),
      probability: new Decimal(percent.get(q.stage) ?? 0).dividedBy(100).toString(),
    });
  }
  return { deposits, odds, counts, share, shareIsFirm };
}
