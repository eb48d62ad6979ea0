import type { InvoiceKind } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { documentNumber } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { enqueueCheckoutExpiry } from '../payments/checkout-expiry';
import { conflict, notFound } from '../http/problem';
import { firmToday, LIVE_ISSUED, loadBillingJob } from './billing-job';
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
 * met; a progress-billed job's open draft is refigured (by the queue); a checkout still open for it
 * is expired at the card processor (by the queue). The client hears of it only if the invoice was e-mailed.
 */
export async function voidInvoice(tx: TenantTx, deps: IssueDeps, actor: Actor, id: string, reason: string, now: Date): Promise<void> {
  // The job's row first, as issuing and drafting take it: an issue crediting this deposit, or billing
  // after this application, waits for the void (and the void for it).
  const owner = (
    await tx.client.query<{ job_id: string }>(`select job_id from invoices where tenant_id = $1 and id = $2`, [tx.tenantId, id])
  ).rows[0];
  if (!owner) throw notFound('invoice');
  const job = await loadBillingJob(tx, owner.job_id, true);
  const inv = (
    await tx.client.query<VoidedRow>(
      `select id, job_id, kind, status, total::text as total, amount_paid::text as amount_paid, currency, document, schedule_line_id, sent_at,
              issued_at, number
         from invoices where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, id],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  if (inv.status === 'draft') throw conflict('A draft has no number: delete it instead of voiding it.');
  if (inv.status === 'void') throw conflict('This invoice is already void.');
  if (new Decimal(inv.amount_paid).greaterThan(0)) throw conflict('Refund the payments first: this invoice has payments recorded.');
  await refuseWhatLaterInvoicesRelyOn(tx, inv);
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
  // A checkout the client still has open at the card processor stops taking money once this commits.
  await enqueueCheckoutExpiry(tx, deps.queue, id);
  const progress = job.billing_method === 'progress';
  if (progress || inv.schedule_line_id) await enqueueBillingCheck(tx, deps.queue, job.id, { refreshDraft: progress });
  if (inv.sent_at) await enqueueInvoiceMail(tx, deps.queue, deps.config, id, { kind: 'creditNote', creditNoteId });
}

interface VoidedRow {
  id: string;
  job_id: string;
  kind: InvoiceKind;
  status: string;
  total: string;
  amount_paid: string;
  currency: string;
  document: unknown;
  schedule_line_id: string | null;
  sent_at: Date | null;
  issued_at: Date;
  number: number;
}

/**
 * Later invoices of a progress-billed job build on earlier ones, so voiding one of those would lose
 * money no invoice could bill again (409 naming them, newest first):
 * - a deposit that later invoices took off as a credit, beyond what the job's other deposits cover;
 * - a progress application with a later application or retainage release (each application bills
 *   work to date less the previous one's, and a release the retainage the last one held).
 */
async function refuseWhatLaterInvoicesRelyOn(tx: TenantTx, inv: VoidedRow): Promise<void> {
  if (inv.kind === 'deposit') {
    const { rows } = await tx.client.query<{ others: string; credited: string; numbers: string[] | null }>(
      `select coalesce(sum(total) filter (where kind = 'deposit' and id <> $3), 0)::text as others,
              coalesce(sum(deposit_credit) filter (where kind <> 'deposit'), 0)::text as credited,
              array_agg(number_text order by issued_at desc, number desc) filter (where kind <> 'deposit' and deposit_credit > 0) as numbers
         from invoices where tenant_id = $1 and job_id = $2 and ${LIVE_ISSUED}`,
      [tx.tenantId, inv.job_id, inv.id],
    );
    const r = rows[0];
    if (new Decimal(r.credited).greaterThan(r.others)) {
      throw conflict(
        `Later invoices take this deposit off as a credit (${list(r.numbers ?? [])}): void them first, newest first, then this deposit.`,
      );
    }
    return;
  }
  if (inv.kind !== 'progress') return;
  const { rows } = await tx.client.query<{ number_text: string }>(
    `select number_text from invoices
      where tenant_id = $1 and job_id = $2 and kind in ('progress', 'retainage') and ${LIVE_ISSUED} and id <> $3
        and (issued_at, number) > ($4, $5)
      order by issued_at desc, number desc`,
    [tx.tenantId, inv.job_id, inv.id, inv.issued_at, inv.number],
  );
  if (rows.length > 0) {
    throw conflict(
      `${list(rows.map((r) => r.number_text))} ${rows.length === 1 ? 'was' : 'were'} issued after this application and bill${rows.length === 1 ? 's' : ''} from it: void ${rows.length === 1 ? 'it' : 'them, newest first,'} before this one.`,
    );
  }
}

const list = (numbers: readonly string[]) =>
  numbers.length <= 1 ? (numbers[0] ?? '') : `${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1]}`;
