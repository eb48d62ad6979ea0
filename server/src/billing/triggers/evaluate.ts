import type { BillingTrigger, InvoiceKind } from '@layerbook/contracts';
import { longDate } from '../../i18n/long-date';
import { withTenant, type TenantTx } from '@layerbook/db';
import { layerCompletion } from '@layerbook/domain';
import type { Pool } from 'pg';
import { localDate } from '../../firms/local-date';
import { type Actor, SYSTEM_ACTOR } from '../../http/actor';
import { HttpError } from '../../http/problem';
import type { BillingEvaluateJob } from '../../queue/queues';
import { recordAudit } from '../../audit/record';
import { draftLineInvoice, refreshOpenReleaseDraft } from '../drafts';
import { draftProgressInvoice, refreshOpenProgressDraft } from '../progress-invoice';
import { countsTowardLine } from '../work-items';

interface JobRow {
  billing_started_at: Date | null;
  billing_method: 'schedule' | 'progress';
  status: string;
  walkthrough_on: string | null;
}

interface LineRow {
  id: string;
  trigger: BillingTrigger;
}

interface ItemRow {
  layer_id: string;
  layer_name: string;
  done_on: string | null;
}

/** A work item as the check reads it: whether a change order added it, and when (see countsTowardLine). */
interface CheckedItemRow extends ItemRow {
  is_change: boolean;
  created_at: Date;
}

/**
 * Whether a billing-schedule line's trigger is met today, and in words what met it (kept on the
 * invoice for the office to read); null when it is not met yet.
 */
export function triggerMet(
  trigger: BillingTrigger,
  job: { walkthroughOn: string | null },
  items: readonly ItemRow[],
  today: string,
): string | null {
  switch (trigger.kind) {
    case 'acceptance':
      return 'Due on acceptance: billing started';
    case 'date':
      return trigger.date <= today ? `Billing date ${longDate(trigger.date)} reached` : null;
    case 'layerComplete': {
      const done = layerCompletion(
        items.map((i) => ({ layerId: i.layer_id, doneOn: i.done_on })),
        trigger.layerId,
      );
      if (!done.isComplete) return null;
      const name = items.find((i) => i.layer_id === trigger.layerId)?.layer_name ?? 'The layer';
      const surfaces =
        done.total === 1
          ? 'the one surface it covers'
          : done.total === 2
            ? 'both surfaces it covers'
            : `all ${done.total} surfaces it covers`;
      return `${name} finished on ${surfaces} on ${longDate(done.completedOn ?? today)}`;
    }
    case 'walkthrough':
      return job.walkthroughOn ? `Final walkthrough held on ${longDate(job.walkthroughOn)}` : null;
  }
}

/**
 * Checks a started job's billing triggers and drafts the invoice of every scheduled line whose
 * trigger is met (the queue drafts, a person issues); a stage payment's untouched draft whose layer
 * was reopened is withdrawn. Idempotent: a line with a live invoice is
 * 'ready', not 'scheduled', and draftLineInvoice drafts once per line however often it is asked.
 * With `progressMarked` (a percent or stored materials was just marked) a progress-billed job's one
 * open application is drafted, or refreshed, to the period ending today; with `refreshDraft` (another
 * invoice of the job was issued or voided) the open one is refigured for its own period. Returns how many invoices
 * it drafted.
 */
export async function evaluateJobBilling(
  tx: TenantTx,
  jobId: string,
  today: string,
  actor: Actor,
  opts: { progressMarked?: boolean; refreshDraft?: boolean } = {},
): Promise<number> {
  // The job's row first, as issuing and drafting take it: two checks of one job (a progress mark's and
  // billing start's, on two workers) go one after the other. Unlocked, they could deadlock: one drafting a
  // line's invoice (whose foreign key share-locks the job) while the other held the job for a progress draft
  // and waited on that line — the loser retried 10 s later (likely what left a spec's queue unsettled).
  const { rows: jobs } = await tx.client.query<JobRow>(
    `select billing_started_at, billing_method, status, walkthrough_on::text as walkthrough_on from jobs
      where tenant_id = $1 and id = $2 for update`,
    [tx.tenantId, jobId],
  );
  const job = jobs[0];
  if (!job || !job.billing_started_at || job.status === 'cancelled') return 0;
  let drafted = 0;
  if ((opts.progressMarked || opts.refreshDraft) && job.billing_method === 'progress') {
    // A schedule of values that does not tie out (say, after a change order) is the office's to fix
    // and a retry cannot: the draft is left for a person (who sees why on drafting), not retried.
    await tx.client.query('savepoint progress_draft');
    try {
      if (opts.progressMarked) {
        const { isNew } = await draftProgressInvoice(tx, { jobId, periodEnd: today, origin: 'queue', actor });
        if (isNew) drafted++;
      } else {
        await refreshOpenProgressDraft(tx, jobId, actor);
        await refreshOpenReleaseDraft(tx, jobId, actor);
      }
      await tx.client.query('release savepoint progress_draft');
    } catch (error) {
      if (!(error instanceof HttpError) || error.status >= 500) throw error;
      await tx.client.query('rollback to savepoint progress_draft');
    }
  }
  const { rows: lines } = await tx.client.query<
    LineRow & {
      status: 'scheduled' | 'ready';
      withdrawable: string | null;
      withdrawable_kind: InvoiceKind | null;
      billed_since: Date | null;
    }
  >(
    `select l.id, l.trigger, l.status, i.id as withdrawable, i.kind as withdrawable_kind,
            (select min(b.created_at) from invoices b where b.tenant_id = l.tenant_id and b.schedule_line_id = l.id) as billed_since
       from payment_schedule_lines l
       left join invoices i on i.tenant_id = l.tenant_id and i.schedule_line_id = l.id and i.status = 'draft' and i.origin = 'queue'
                           and i.updated_at = i.created_at
      where l.tenant_id = $1 and l.job_id = $2 and (l.status = 'scheduled' or (l.status = 'ready' and l.trigger->>'kind' = 'layerComplete'))
      order by l.position`,
    [tx.tenantId, jobId],
  );
  if (!lines.length) return drafted;
  const { rows: items } = await tx.client.query<CheckedItemRow>(
    `select layer_id, layer_name, done_on::text as done_on, change_order_id is not null as is_change, created_at
       from job_work_items where tenant_id = $1 and job_id = $2 order by position`,
    [tx.tenantId, jobId],
  );
  for (const line of lines) {
    const counted = items.filter((i) => countsTowardLine({ isChange: i.is_change, createdAt: i.created_at }, line.billed_since));
    const triggerText = triggerMet(line.trigger, { walkthroughOn: job.walkthrough_on }, counted, today);
    if (line.status === 'ready') {
      if (triggerText === null && line.withdrawable && line.withdrawable_kind) {
        await withdrawDraft(
          tx,
          { id: line.withdrawable, kind: line.withdrawable_kind, lineId: line.id, trigger: line.trigger },
          jobId,
          items,
          actor,
        );
      }
      continue;
    }
    if (triggerText === null) continue;
    const { isNew } = await draftLineInvoice(tx, { lineId: line.id, origin: 'queue', actor, today, triggerText });
    if (isNew) drafted++;
  }
  return drafted;
}

/**
 * A layer reopened after the payment waiting on it was drafted: the draft the queue made, still untouched,
 * goes (its line waits for the layer again, and the office reads why in the job's history). A draft
 * the office has changed is theirs to keep or delete.
 */
async function withdrawDraft(
  tx: TenantTx,
  draft: { readonly id: string; readonly kind: InvoiceKind; readonly lineId: string; readonly trigger: BillingTrigger },
  jobId: string,
  items: readonly ItemRow[],
  actor: Actor,
): Promise<void> {
  const { id: invoiceId, lineId, trigger } = draft;
  const layerId = trigger.kind === 'layerComplete' ? trigger.layerId : '';
  const layer = items.find((i) => i.layer_id === layerId)?.layer_name ?? 'The layer';
  // Rechecked as it deletes: an edit committed meanwhile (the row re-read after its lock) keeps the draft.
  const deleted = await tx.client.query(
    `delete from invoices where tenant_id = $1 and id = $2 and status = 'draft' and updated_at = created_at returning id`,
    [tx.tenantId, invoiceId],
  );
  if (!deleted.rowCount) return;
  await tx.client.query(`update payment_schedule_lines set status = 'scheduled', updated_at = now() where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    lineId,
  ]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.deleted',
    entity: 'invoice',
    entityId: invoiceId,
    data: { kind: draft.kind, jobId, withdrawn: `${layer} was reopened`, scheduleLineId: lineId },
  });
}

/** The billing-evaluate worker: one job's triggers, on the firm's today. */
export async function runBillingEvaluate(pool: Pool, data: BillingEvaluateJob, now: Date): Promise<number> {
  return withTenant(pool, data.tenantId, async (tx) => {
    const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
    if (!rows[0]) return 0;
    return evaluateJobBilling(tx, data.jobId, localDate(rows[0].time_zone, now), SYSTEM_ACTOR, {
      progressMarked: data.progressMarked,
      refreshDraft: data.refreshDraft,
    });
  });
}
