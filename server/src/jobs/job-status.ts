import type { JobStatus, JobStatusChange } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { deleteDraft } from '../billing/draft-edits';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';

/** Where a job may go from where it is: finished from scheduled or under way; reopened from finished; cancelled before it is finished. */
const MOVES: Readonly<Record<JobStatusChange['status'], readonly JobStatus[]>> = {
  complete: ['scheduled', 'in_progress'],
  in_progress: ['complete'],
  cancelled: ['scheduled', 'in_progress'],
};

const refused = (message: string) => conflict(message, [{ field: 'status', message }]);

/**
 * POST /api/jobs/:id/status, in the caller's transaction with the job's row locked (as billing locks
 * it). Asking for the status a job already has changes nothing. A cancelled job stays cancelled.
 * Cancelling needs every invoice of the job void first (a paid one refunded, then voided): its
 * drafts are withdrawn with it, the billing checks skip it from then on, and a change order still
 * waiting for the client can no longer be approved. Audited as `job.status_changed`.
 */
export async function changeJobStatus(tx: TenantTx, actor: Actor, jobId: string, change: JobStatusChange, now: Date): Promise<void> {
  const { rows } = await tx.client.query<{ status: JobStatus }>(`select status from jobs where tenant_id = $1 and id = $2 for update`, [
    tx.tenantId,
    jobId,
  ]);
  const job = rows[0];
  if (!job) throw notFound('job');
  if (job.status === change.status) return;
  if (job.status === 'cancelled') throw refused('This job was cancelled and stays so. A new proposal makes a new job.');
  if (!MOVES[change.status].includes(job.status)) {
    throw refused(
      change.status === 'in_progress'
        ? 'Only a finished job can be reopened.'
        : 'A finished job cannot be cancelled. Reopen it first if the work stopped before the end.',
    );
  }
  if (change.status === 'cancelled') {
    const standing = await tx.client.query<{ number_text: string }>(
      `select number_text from invoices where tenant_id = $1 and job_id = $2 and status not in ('draft', 'void') order by number`,
      [tx.tenantId, jobId],
    );
    if (standing.rows.length) {
      throw refused(
        `Void the job's invoices first (refund what was paid, then void): ${standing.rows.map((r) => r.number_text).join(', ')}.`,
      );
    }
    const drafts = await tx.client.query<{ id: string }>(
      `select id from invoices where tenant_id = $1 and job_id = $2 and status = 'draft'`,
      [tx.tenantId, jobId],
    );
    for (const draft of drafts.rows) await deleteDraft(tx, actor, draft.id, now);
  }
  await tx.client.query(`update jobs set status = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    jobId,
    change.status,
    now,
  ]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'job.status_changed',
    entity: 'job',
    entityId: jobId,
    data: { from: job.status, to: change.status, ...(change.reason ? { reason: change.reason } : {}) },
  });
}
