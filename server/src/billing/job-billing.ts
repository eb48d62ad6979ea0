import type {
  BillingTrigger,
  ChangeOrderSummary,
  JobBillingView,
  ScheduleLineStatus,
  ScheduleLineView,
  ValueLineView,
  WorkItemView,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { longDate } from '../i18n/long-date';
import { layerCompletion } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { layerMilestones } from '../jobs/jobs';
import { firmToday, LIVE_ISSUED, loadBillingJob, termsOf } from './billing-job';
import { retainageHeld } from './drafts';
import { jobInvoices } from './invoice-read';
import { moneyOut } from './money';
import { billedWorkByLine, loadValueLines } from './progress-invoice';
import { ensureJobWork, loadWorkItems } from './work-items';

export interface ScheduleLineRow {
  id: string;
  position: number;
  label: string;
  role: 'deposit' | 'milestone' | 'final';
  trigger: BillingTrigger;
  amount: string;
  expected_on: string | null;
  status: ScheduleLineStatus;
}

export async function loadScheduleLines(tx: TenantTx, jobId: string): Promise<ScheduleLineRow[]> {
  const { rows } = await tx.client.query<ScheduleLineRow>(
    `select id, position, label, role, trigger, amount::text as amount, expected_on::text as expected_on, status
       from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position, created_at`,
    [tx.tenantId, jobId],
  );
  return rows;
}

/** How far a line's trigger is, in words: "3 of 5 surfaces done", "Due December 14, 2026". */
export function triggerProgress(
  trigger: BillingTrigger,
  facts: { today: string; isStarted: boolean; walkthroughOn: string | null; workItems: readonly WorkItemView[] },
): string {
  switch (trigger.kind) {
    case 'acceptance':
      return facts.isStarted ? 'Met when billing started' : 'Met when billing starts';
    case 'date':
      return trigger.date <= facts.today ? `Date reached (${longDate(trigger.date)})` : `Due ${longDate(trigger.date)}`;
    case 'layerComplete': {
      const c = layerCompletion(
        facts.workItems.map((w) => ({ layerId: w.layerId, doneOn: w.doneOn })),
        trigger.layerId,
      );
      if (c.total === 0) return 'No surface takes this layer';
      if (c.isComplete) return `Done on every surface (${c.total}) on ${longDate(c.completedOn ?? facts.today)}`;
      return `${c.done} of ${c.total} ${c.total === 1 ? 'surface' : 'surfaces'} done`;
    }
    case 'walkthrough':
      return facts.walkthroughOn ? `Walkthrough held on ${longDate(facts.walkthroughOn)}` : 'Waiting for the final walkthrough';
  }
}

/** GET /api/jobs/:id/billing (owner, office). */
export async function getJobBilling(tx: TenantTx, jobId: string, now: Date): Promise<JobBillingView> {
  const job = await loadBillingJob(tx, jobId);
  // a job made before work items and value lines existed gets them on first read
  await ensureJobWork(tx, job.id);
  const today = firmToday(job, now);
  const money = (v: string | Decimal) => moneyOut(v, job.currency);
  const [terms, lineRows, workItems, valueRows, billed, invoices, milestones] = [
    await termsOf(tx, job),
    await loadScheduleLines(tx, job.id),
    await loadWorkItems(tx, job.id),
    await loadValueLines(tx, job.id),
    await billedWorkByLine(tx, job.id),
    await jobInvoices(tx, job.id, today),
    await layerMilestones(tx, job.proposal_version_id, job.accepted_variant_id),
  ];
  const liveByLine = new Map(
    (
      await tx.client.query<{ id: string; schedule_line_id: string }>(
        `select id, schedule_line_id from invoices where tenant_id = $1 and job_id = $2 and status <> 'void' and schedule_line_id is not null`,
        [tx.tenantId, job.id],
      )
    ).rows.map((r) => [r.schedule_line_id, r.id]),
  );
  const layerNames = new Map([...milestones].map(([id, m]) => [id, m.label]));
  for (const w of workItems) if (!layerNames.has(w.layerId)) layerNames.set(w.layerId, w.layerName);
  const facts = { today, isStarted: job.billing_started_at !== null, walkthroughOn: job.walkthrough_on, workItems };
  const lines: ScheduleLineView[] = lineRows.map((l) => ({
    id: l.id,
    position: l.position,
    label: l.label,
    role: l.role,
    trigger: l.trigger,
    layerName: l.trigger.kind === 'layerComplete' ? (layerNames.get(l.trigger.layerId) ?? null) : null,
    amount: money(l.amount),
    expectedOn: l.expected_on,
    status: l.status,
    invoiceId: liveByLine.get(l.id) ?? null,
    triggerProgress: triggerProgress(l.trigger, facts),
  }));
  const valueLines: ValueLineView[] = valueRows.map((v) => ({
    id: v.id,
    position: v.position,
    label: v.label,
    scheduledValue: money(v.scheduled_value),
    changeOrderId: v.change_order_id,
    percentComplete: v.percent_complete,
    storedMaterials: money(v.stored_materials),
    billedWork: money(billed.get(v.id) ?? new Decimal(0)),
  }));
  const changeOrders = (
    await tx.client.query<{
      id: string;
      number: number;
      title: string;
      status: ChangeOrderSummary['status'];
      price: string;
      tax: string;
      amount: string;
      sent_at: Date | null;
      decided_at: Date | null;
    }>(
      `select id, number, title, status, price::text as price, tax::text as tax, amount::text as amount, sent_at, decided_at
         from change_orders where tenant_id = $1 and job_id = $2 order by number`,
      [tx.tenantId, job.id],
    )
  ).rows.map((c): ChangeOrderSummary => ({
    id: c.id,
    jobId: job.id,
    number: c.number,
    title: c.title,
    status: c.status,
    currency: job.currency,
    price: money(c.price),
    tax: money(c.tax),
    amount: money(c.amount),
    sentAt: c.sent_at?.toISOString() ?? null,
    decidedAt: c.decided_at?.toISOString() ?? null,
  }));
  const sums = (
    await tx.client.query<{ invoiced: string; credited: string; paid: string; billed: string }>(
      `select coalesce(sum(total) filter (where status <> 'draft'), 0)::text as invoiced,
              coalesce(sum(amount_credited) filter (where status <> 'draft'), 0)::text as credited,
              coalesce(sum(amount_paid), 0)::text as paid,
              coalesce(sum(total) filter (where ${LIVE_ISSUED}), 0)::text as billed
         from invoices where tenant_id = $1 and job_id = $2`,
      [tx.tenantId, job.id],
    )
  ).rows[0];
  const held = job.billing_method === 'progress' ? await retainageHeld(tx, job.id) : new Decimal(0);
  return {
    jobId: job.id,
    currency: job.currency,
    method: job.billing_method,
    originalContractSum: money(job.original_contract_sum),
    contractSum: money(job.contract_sum),
    contractTax: money(job.contract_tax),
    billingStartedAt: job.billing_started_at?.toISOString() ?? null,
    terms,
    walkthroughOn: job.walkthrough_on,
    lines,
    workItems,
    valueLines,
    invoices,
    changeOrders,
    totals: {
      invoiced: money(new Decimal(sums.invoiced).minus(sums.credited)),
      paid: money(sums.paid),
      unbilled: money(new Decimal(job.contract_sum).minus(sums.billed)),
      retainageHeld: money(held),
    },
    readyToBill: invoices.filter((i) => i.status === 'draft').length,
  };
}
