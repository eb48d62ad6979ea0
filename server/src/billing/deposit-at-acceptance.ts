import type { TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { AppContext } from '../context';
import { SYSTEM_ACTOR } from '../http/actor';
import { HttpError } from '../http/problem';
import { draftLineInvoice } from './drafts';
import { issueInvoice } from './issue';
import { startBilling } from './schedule';
import { loadBillingSettings } from './settings';

/** Kept on the invoice as what met its trigger. */
export const ISSUED_AT_ACCEPTANCE = 'Due on acceptance: issued and e-mailed when the client accepted';

/**
 * The firm's "deposit at acceptance" setting, run inside the acceptance's transaction once the job
 * exists. With 'issueAndSend' and a deposit line due on acceptance: billing starts on the schedule
 * as the client signed it (the firm's terms copied, as the office's start does), the deposit is
 * drafted, issued with the next invoice number and e-mailed through the outbox, so the client can
 * pay it right away. Returns the invoice's id.
 *
 * Null, with nothing of it written, when the setting is 'draft' (the office starts billing and the
 * queue drafts the deposit for it to check, as before), when the option has no deposit due on
 * acceptance, or when the schedule needs the office first (a deposit above the firm's limit, a
 * client without a usable e-mail): the acceptance itself always goes through.
 */
export async function depositAtAcceptance(
  tx: TenantTx,
  ctx: Pick<AppContext, 'queue' | 'config' | 'logger'>,
  jobId: string,
  today: string,
  now: Date,
): Promise<string | null> {
  const { settings } = await loadBillingSettings(tx);
  if (settings.depositAtAcceptance !== 'issueAndSend') return null;
  const { rows } = await tx.client.query<{ id: string }>(
    `select id from payment_schedule_lines
      where tenant_id = $1 and job_id = $2 and role = 'deposit' and trigger->>'kind' = 'acceptance' and amount > 0
      order by position limit 1`,
    [tx.tenantId, jobId],
  );
  const lineId = rows[0]?.id;
  if (!lineId) return null;
  await tx.client.query('savepoint deposit_at_acceptance');
  try {
    await startBilling(tx, ctx.queue, SYSTEM_ACTOR, jobId, now, { draftNow: false });
    const { invoiceId } = await draftLineInvoice(tx, {
      lineId,
      origin: 'queue',
      actor: SYSTEM_ACTOR,
      today,
      triggerText: ISSUED_AT_ACCEPTANCE,
    });
    await issueInvoice(tx, ctx, SYSTEM_ACTOR, invoiceId, { send: true }, now);
    await tx.client.query('release savepoint deposit_at_acceptance');
    return invoiceId;
  } catch (error) {
    if (!(error instanceof HttpError) || error.status >= 500) throw error;
    await tx.client.query('rollback to savepoint deposit_at_acceptance');
    ctx.logger.warn({ jobId, reason: error.message }, 'deposit not issued at acceptance; left for the office');
    await recordAudit(tx, {
      actorUserId: null,
      actorKind: 'system',
      action: 'billing.deposit_left_for_office',
      entity: 'job',
      entityId: jobId,
      data: { reason: error.message, problems: error.errors ?? [] },
    });
    return null;
  }
}
