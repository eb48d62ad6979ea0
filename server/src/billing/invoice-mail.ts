import { type InvoiceDocument, type InvoiceKind, type InvoiceStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import { createPortalLink } from '../auth/portal-auth';
import type { Config } from '../config';
import { HttpError, conflict, notFound } from '../http/problem';
import { localeOf, translator } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';
import { firmDateTime } from '../mail/firm-time';
import { enqueueMail } from '../mail/outbox';
import { ensurePortalAccount } from '../proposals/client-portal-account';
import { PROPOSAL_LINK_DAYS } from '../proposals/send-proposal';
import type { JobQueue } from '../queue/job-queue';
import { formatsFor } from '../proposals/pdf/format';
import { creditNoteMail, invoiceIssuedMail, invoiceReminderMail, type InvoiceMailFacts } from './invoice-templates';
import { documentForReader } from './invoice-words';
import { moneyOut } from './money';

export type InvoiceMailPurpose =
  | { readonly kind: 'issued' }
  | { readonly kind: 'reminder'; readonly step: string }
  | { readonly kind: 'creditNote'; readonly creditNoteId: string };

/** An invoice e-mail may sit unread for a while, like a proposal's: its sign-in link lasts as long. */
export const INVOICE_LINK_DAYS = PROPOSAL_LINK_DAYS;

interface MailRow {
  number_text: string | null;
  kind: InvoiceKind;
  status: InvoiceStatus;
  currency: string;
  amount_due: string;
  due_on: string | null;
  document: InvoiceDocument | null;
  issued_at: Date | null;
  voided_at: Date | null;
  client_id: string;
  client_name: string;
  client_email: string;
  time_zone: string;
  /** the transaction's clock, for a reminder's sign-in link when the caller passes no time */
  db_now: Date;
}

const purposeKey = (invoiceId: string, purpose: InvoiceMailPurpose): string => {
  switch (purpose.kind) {
    case 'issued':
      return `invoice:${invoiceId}:issued`;
    case 'reminder':
      return `invoice:${invoiceId}:reminder:${purpose.step}`;
    case 'creditNote':
      return `credit-note:${purpose.creditNoteId}`;
  }
};

/**
 * E-mails the client about an issued invoice (a one-time sign-in link that opens it in the portal,
 * where its PDF is), a reminder step, or a credit note, through the outbox in the caller's
 * transaction, from the firm (sender 'firm'). The purpose key makes each (invoice, purpose) go once.
 * The office asked to send an issued invoice, so a client without a usable e-mail is a 400/409 on
 * `client.email`; a reminder or a credit note for such a client is simply not sent (the queue must
 * not fail on it). The link's clock: `now` when given, else when the invoice was issued (for
 * 'issued') or voided (credit note), else the transaction's own clock.
 * The caller records the invoice as sent (sent_at, audit 'invoice.sent'), as issuing does.
 */
export async function enqueueInvoiceMail(
  tx: TenantTx,
  queue: JobQueue,
  config: Config,
  invoiceId: string,
  purpose: InvoiceMailPurpose,
  now?: Date,
): Promise<void> {
  const row = (
    await tx.client.query<MailRow>(
      `select i.number_text, i.kind, i.status, i.currency, i.due_on::text, i.document, i.issued_at, i.voided_at,
              (case when i.status = 'void' then 0 else i.total - i.amount_paid - i.amount_credited end)::numeric(14, 2)::text as amount_due,
              c.id as client_id, c.name as client_name, c.email as client_email, f.time_zone, now() as db_now
         from invoices i join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id join firms f on f.id = i.tenant_id
        where i.tenant_id = $1 and i.id = $2`,
      [tx.tenantId, invoiceId],
    )
  ).rows[0];
  if (!row) throw notFound('invoice');
  if (row.status === 'draft' || !row.document || !row.number_text || !row.due_on) throw conflict('Only an issued invoice can be e-mailed.');
  const doc = row.document;
  const clock = now ?? (purpose.kind === 'issued' ? row.issued_at : purpose.kind === 'creditNote' ? row.voided_at : null) ?? row.db_now;

  const account = await portalAccount(tx, row, purpose.kind === 'issued');
  if (!account) return;
  const base = config.PUBLIC_URL;
  const next = `/portal/invoices/${invoiceId}`;
  const link = account.isActive ? await createPortalLink(tx, account.id, clock, INVOICE_LINK_DAYS * 24 * 60) : null;
  // In the client's language (theirs, else the firm's), numbers and dates for it in the firm's country.
  const reader = await clientReader(tx, row.client_id);
  const locale = localeOf(reader.language, reader.country);
  const money = (amount: string) => formatMoney(moneyOut(amount, row.currency), row.currency, locale);
  const facts: InvoiceMailFacts = {
    firmName: doc.firm.name,
    clientName: row.client_name,
    number: row.number_text,
    kindLabel: translator(reader.language)(`pdf.invoice.kinds.${row.kind}`),
    jobTitle: doc.jobTitle,
    amountDue: money(row.amount_due),
    dueOn: formatsFor(locale, row.currency).date(row.due_on),
    termsText: documentForReader({ language: reader.language, locale }, doc).termsText,
    url: link ? `${base}/portal/sign-in/link?token=${link.token}&next=${next}` : `${base}${next}`,
    linkDays: link ? INVOICE_LINK_DAYS : null,
    portalUrl: `${base}/portal/sign-in`,
    language: reader.language,
  };

  let mail;
  if (purpose.kind === 'issued') mail = invoiceIssuedMail(facts);
  else if (purpose.kind === 'reminder') mail = invoiceReminderMail(facts, purpose.step);
  else {
    const note = (
      await tx.client.query<{ number_text: string; amount: string; reason: string }>(
        `select number_text, amount::text, reason from credit_notes where tenant_id = $1 and id = $2 and invoice_id = $3`,
        [tx.tenantId, purpose.creditNoteId, invoiceId],
      )
    ).rows[0];
    if (!note) throw notFound('credit note');
    mail = creditNoteMail({
      ...facts,
      creditNoteNumber: note.number_text,
      amount: money(note.amount),
      reason: note.reason,
      voidedAt: firmDateTime(row.voided_at ?? clock, locale, row.time_zone),
    });
  }
  await enqueueMail(tx, queue, {
    purposeKey: purposeKey(invoiceId, purpose),
    tenantId: tx.tenantId,
    to: account.email,
    sender: 'firm',
    ...mail,
  });
}

/**
 * The client's portal sign-in, made on first send as a proposal's is. For an issued invoice the
 * office's refusal words pass through; for a reminder or a credit note, a client without an e-mail
 * gets nothing, and one whose portal access is off (or whose address signs in for another client)
 * gets the mail without a sign-in link.
 */
async function portalAccount(
  tx: TenantTx,
  row: MailRow,
  isStrict: boolean,
): Promise<{ id: string; email: string; isActive: boolean } | null> {
  const client = { id: row.client_id, name: row.client_name, email: row.client_email };
  if (isStrict) return { ...(await ensurePortalAccount(tx, client)), isActive: true };
  if (!client.email.trim()) return null;
  try {
    return { ...(await ensurePortalAccount(tx, client)), isActive: true };
  } catch (error) {
    if (error instanceof HttpError) return { id: '', email: client.email.trim().toLowerCase(), isActive: false };
    throw error;
  }
}
