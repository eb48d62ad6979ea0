import { ATTENTION_REASONS, type AttentionNote, type AttentionReason, type InvoiceStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';

/**
 * What the card processor's word leaves for a person. Each note is an audit entry on its invoice
 * (so it stays in the invoice's trail for good); it shows on Today's money panel until someone marks
 * it dealt with, which is an audit entry of its own naming the note (`invoice.attention_cleared`).
 */
export const ATTENTION_ACTIONS = ['invoice.payment_needs_attention', 'invoice.refund_needs_attention'] as const;
const ATTENTION_SQL = `(${ATTENTION_ACTIONS.map((a) => `'${a}'`).join(', ')})`;
const LIMIT = 50;

export interface PaymentMismatch {
  readonly invoiceId: string;
  readonly paymentId: string;
  readonly receiptNumber: string | null;
  /** what was paid and what the checkout asked, in each one's own currency */
  readonly amount: string;
  readonly currency: string;
  readonly asked: string;
  readonly askedCurrency: string;
}

/** A note on the invoice for a person about a card payment, with what was paid and what was asked. */
function notePayment(tx: TenantTx, reason: AttentionReason, m: PaymentMismatch, more: Record<string, string> = {}): Promise<void> {
  return recordAudit(tx, {
    actorUserId: null,
    actorKind: 'system',
    action: 'invoice.payment_needs_attention',
    entity: 'invoice',
    entityId: m.invoiceId,
    data: {
      reason,
      paymentId: m.paymentId,
      receipt: m.receiptNumber,
      amount: m.amount,
      currency: m.currency,
      asked: m.asked,
      askedCurrency: m.askedCurrency,
      ...more,
    },
  });
}

/** A card payment recorded in another amount or currency than its checkout asked, noted on its invoice. */
export function notePaymentMismatch(tx: TenantTx, m: PaymentMismatch): Promise<void> {
  return notePayment(tx, 'paidOtherAmount', m);
}

/**
 * A card payment that came in when the invoice no longer asked for it all (voided or settled another
 * way while the client was on the processor's page): recorded, the rest kept as the client's credit,
 * and noted on its invoice for a person to give back or put to use.
 */
export function notePaidWhenNotAsked(
  tx: TenantTx,
  m: PaymentMismatch & { readonly credit: string; readonly invoiceStatus: InvoiceStatus },
): Promise<void> {
  return notePayment(tx, 'paidWhenNotAsked', m, { credit: m.credit, invoiceStatus: m.invoiceStatus });
}

interface NoteRow {
  id: string;
  data: Record<string, unknown>;
  invoice_id: string;
  number_text: string | null;
  client_name: string;
  created_at: Date;
}

const text = (v: unknown): string | null => (typeof v === 'string' && v !== '' ? v : typeof v === 'number' ? String(v) : null);

/** Today's notes not yet dealt with, oldest first (the partial index audit_log_attention_idx finds them). */
export async function openAttentionNotes(tx: TenantTx): Promise<AttentionNote[]> {
  const { rows } = await tx.client.query<NoteRow>(
    `select a.id, a.data, a.entity_id as invoice_id, i.number_text, c.name as client_name, a.created_at
       from audit_log a
       join invoices i on i.tenant_id = a.tenant_id and i.id = a.entity_id
       join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
      where a.tenant_id = $1 and a.action in ${ATTENTION_SQL}
        and not exists (select 1 from audit_log d
                         where d.tenant_id = a.tenant_id and d.entity_id = a.entity_id
                           and d.action = 'invoice.attention_cleared' and d.data->>'noteId' = a.id::text)
      order by a.created_at, a.id limit ${LIMIT}`,
    [tx.tenantId],
  );
  return rows.map((r) => {
    const reason = text(r.data['reason']);
    return {
      id: r.id,
      reason: reason && (ATTENTION_REASONS as readonly string[]).includes(reason) ? (reason as AttentionReason) : 'other',
      invoiceId: r.invoice_id,
      invoiceNumber: r.number_text,
      clientName: r.client_name,
      amount: text(r.data['amount']),
      currency: text(r.data['currency']),
      asked: text(r.data['asked']),
      askedCurrency: text(r.data['askedCurrency']),
      notedAt: r.created_at.toISOString(),
    };
  });
}

/**
 * POST /api/billing/attention/:id/clear: the note is dealt with. Another firm's note, or an audit
 * entry that is no note, is 404; a note already cleared stays cleared (no second entry), also when
 * two people clear it at once (a transaction lock on the note's id).
 */
export async function clearAttentionNote(tx: TenantTx, actor: Actor, id: string): Promise<void> {
  const { rows } = await tx.client.query<{ entity_id: string; action: string }>(
    `select entity_id, action from audit_log where tenant_id = $1 and id = $2 and action in ${ATTENTION_SQL}`,
    [tx.tenantId, id],
  );
  const note = rows[0];
  if (!note) throw notFound('note to check');
  await tx.client.query(`select pg_advisory_xact_lock(hashtextextended($1, 0))`, [`attention:${id}`]);
  const cleared = await tx.client.query(
    `select 1 from audit_log where tenant_id = $1 and entity_id = $2 and action = 'invoice.attention_cleared' and data->>'noteId' = $3`,
    [tx.tenantId, note.entity_id, id],
  );
  if (cleared.rowCount) return;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.attention_cleared',
    entity: 'invoice',
    entityId: note.entity_id,
    data: { noteId: id, note: note.action },
  });
}
