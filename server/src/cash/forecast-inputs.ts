import { DEFAULT_STAGE_LIKELIHOOD, INQUIRY_STAGES, type InquiryStage } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { addDays } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { loadBillingSettings, toDepositCapRule } from '../billing/settings';
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
 * the open balances the database keeps per client and due date (cash_open_balances: issued, part
 * paid or refunded invoices with total − paid − credited > 0; issuing always sets the due date).
 */
export const OWED = `select 'i' as kind, b.due_on::text as date, sum(b.owed)::text as amount from cash_open_balances b
      where b.tenant_id = $1
      group by b.due_on
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

/** Open invoices (amount still owed, by due date) and unbilled schedule lines (by the engine's expected date), per date. */
export async function loadOwed(tx: TenantTx): Promise<{ invoices: Receipt[]; scheduled: Receipt[] }> {
  const { rows } = await tx.client.query<{ kind: 'i' | 's'; date: string | null; amount: string }>(OWED, [tx.tenantId]);
  const pick = (kind: 'i' | 's') =>
    rows.filter((r) => r.kind === kind).map(({ date, amount }) => ({ id: `${kind}:${date ?? 'undated'}`, date, amount }));
  return { invoices: pick('i'), scheduled: pick('s') };
}

/**
 * Deposits of open inquiries, each weighted by its stage's odds. Value: the inquiry's estimated
 * value, else its latest estimate's price. Deposit share: the firm's own (deposit lines ÷ original
 * contract sums of its jobs) or the default, within the firm's deposit limit.
 */
export async function loadPipeline(
  tx: TenantTx,
  today: string,
  currency: string,
): Promise<{
  deposits: Receipt[];
  odds: ReturnType<typeof stageOdds<InquiryStage>>;
  counts: Map<InquiryStage, number>;
  share: string;
  shareIsFirm: boolean;
}> {
  const settings = await tx.client.query<{ stage: InquiryStage; percent: string }>(
    `select stage, likelihood_percent::text as percent from inquiry_stage_settings where tenant_id = $1`,
    [tx.tenantId],
  );
  const odds = stageOdds(OPEN_STAGES, new Map(settings.rows.map((r) => [r.stage, Number(r.percent)])), DEFAULT_STAGE_LIKELIHOOD);
  const history = await tx.client.query<{ deposits: string | null; contracts: string | null }>(
    `select sum(d.amount)::text as deposits, sum(j.original_contract_sum)::text as contracts
       from jobs j join (select job_id, sum(amount) as amount from payment_schedule_lines where tenant_id = $1 and role = 'deposit' group by job_id) d
         on d.job_id = j.id
      where j.tenant_id = $1 and j.status <> 'cancelled' and j.original_contract_sum > 0`,
    [tx.tenantId],
  );
  const h = history.rows[0];
  const shareIsFirm = h.deposits !== null && h.contracts !== null;
  const share = shareIsFirm
    ? new Decimal(h.deposits as string)
        .dividedBy(h.contracts as string)
        .toDecimalPlaces(4)
        .toString()
    : DEFAULT_DEPOSIT_SHARE;
  const cap = toDepositCapRule((await loadBillingSettings(tx)).settings.depositCap);
  const open = await tx.client.query<{ id: string; stage: InquiryStage; value: string | null; follow_up: string | null }>(
    `select q.id, q.stage, coalesce(q.estimated_value,
              (select e.price from estimates e where e.tenant_id = q.tenant_id and e.inquiry_id = q.id and e.price is not null
                order by e.created_at desc limit 1))::text as value, q.next_follow_up::text as follow_up
       from inquiries q where q.tenant_id = $1 and q.stage not in ('won', 'lost')`,
    [tx.tenantId],
  );
  const counts = new Map<InquiryStage, number>();
  const percent = new Map(odds.map((o) => [o.stage, o.percent]));
  const signing = addDays(today, DEFAULT_SIGNING_DAYS);
  const deposits: Receipt[] = [];
  for (const q of open.rows) {
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
