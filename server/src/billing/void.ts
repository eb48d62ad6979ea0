import type { TenantTx } from '@layerbook/db';
import { documentNumber } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import { firmToday, loadBillingJob } from './billing-job';
import { enqueueInvoiceMail } from './invoice-mail';
import type { IssueDeps } from './issue';
import { nextDocumentNumber } from './numbering';
import { enqueueBillingCheck } from './triggers/enqueue';
import { loadBillingSettings } from './settings';

/**
 * POST /api/invoices/:id/void — an issued invoice is never changed: voiding makes a credit note
 * numbered from the firm's credit-note series in the same transaction, for the whole total. Refused
 * (409) on a draft (delete it), a void invoice, or one with payments (refund them first). Its
 * schedule line waits for its trigger again, and the queue drafts it afresh if the trigger is still
 * met; a progress-billed job's open draft is refigured (by the queue). The client hears of it only if
 * the invoice was e-mailed.
 */
export async function voidInvoice(tx: TenantTx, deps: IssueDeps, actor: Actor, id: string, reason: string, now: Date): Promise<void> {
  const inv = (
    await tx.client.query<{
      id: string;
      job_id: string;
      status: string;
      total: string;
      amount_paid: string;
      currency: string;
      document: unknown;
      schedule_line_id: string | null;
      sent_at: Date | null;
    }>(
      `select id, job_id, status, total::text as total, amount_paid::text as amount_paid, currency, document, schedule_line_id, sent_at
         from invoices where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, id],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  if (inv.status === 'draft') throw conflict('A draft has no number: delete it instead of voiding it.');
  if (inv.status === 'void') throw conflict('This invoice is already void.');
  if (new Decimal(inv.amount_paid).greaterThan(0)) throw conflict('Refund the payments first: this invoice has payments recorded.');
  const job = await loadBillingJob(tx, inv.job_id);
  const { settings } = await loadBillingSettings(tx);
  const issuedOn = firmToday(job, now);
  const n = await nextDocumentNumber(tx, 'credit_note');
  const numberText = documentNumber(settings.creditNotePrefix, n);
  const { rows } = await tx.client.query<{ id: string }>(
    `insert into credit_notes (tenant_id, invoice_id, number, number_text, issued_on, currency, amount, reason, document, created_by)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10) returning id`,
    [tx.tenantId, id, n, numberText, issuedOn, inv.currency, inv.total, reason, JSON.stringify(inv.document ?? {}), actor.userId],
  );
  const creditNoteId = rows[0].id;
  await tx.client.query(
    `update invoices set status = 'void', amount_credited = total, void_reason = $3, voided_at = $4, voided_by = $5, updated_at = $4
      where tenant_id = $1 and id = $2`,
    [tx.tenantId, id, reason, now, actor.userId],
  );
  if (inv.schedule_line_id) {
    await tx.client.query(`update payment_schedule_lines set status = 'scheduled', updated_at = $3 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      inv.schedule_line_id,
      now,
    ]);
  }
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.voided',
    entity: 'invoice',
    entityId: id,
    data: { reason, creditNote: numberText },
  });
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'credit_note.issued',
    entity: 'credit_note',
    entityId: creditNoteId,
    data: { number: numberText, invoiceId: id, amount: inv.total },
  });
  // Once this commits the queue checks the job, taking its lock first as drafting does: the line whose
  // trigger is still met is drafted again for the office to review (as the daily check would the next
  // morning), and the open progress draft is refigured from what stays issued (the deposit it credits,
  // the work billed before).
  const progress = job.billing_method === 'progress';
  if (progress || inv.schedule_line_id) await enqueueBillingCheck(tx, deps.queue, job.id, { refreshDraft: progress });
  if (inv.sent_at) await enqueueInvoiceMail(tx, deps.queue, deps.config, id, { kind: 'creditNote', creditNoteId });
}
