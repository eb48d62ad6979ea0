import type {
  AuditTrailEntry,
  BillingSettings,
  CreditNoteView,
  InvoiceDetail,
  InvoiceDocument,
  InvoiceKind,
  InvoiceLine,
  InvoiceReminderView,
  InvoiceStatus,
  InvoiceSummary,
  KeysetPage,
  PaymentMethod,
  ProgressTable,
} from '@layerbook/contracts';
import { PAYMENT_METHOD_LABELS } from '@layerbook/contracts';
import { formatMoney } from '@layerbook/domain';
import type { InvoiceListQuery } from '@layerbook/contracts';
import { isoUtcText, readAllInOneTrip, type SqlQuery, statementName, type TenantTx } from '@layerbook/db';
import { decodeCursor, encodeCursor } from '../inquiries/cursor';
import { notFound } from '../http/problem';
import { invoiceCreditsRead, invoiceCredits, invoicePaymentReads, invoicePayments } from '../payments/payment-read';
import { type BillingJob, jobOfInvoiceRead } from './billing-job';
import { documentFrom, documentReadOfInvoice } from './document';
import { moneyOut } from './money';
import { billingSettingsOf, billingSettingsRead, billingTermsFor } from './settings';
import { countsTowardLineSql } from './work-items';

/**
 * An invoice summary's columns; `$today` is the firm-local day the query is given, so whether an
 * invoice is overdue is decided in the same statement.
 */
export const summaryColumns = (today: string) => `i.id, i.number_text, i.kind, i.status, i.job_id, j.title as job_title, i.client_id,
  c.name as client_name, i.issued_on::text as issued_on, i.due_on::text as due_on, i.currency, i.total::text as total,
  (case when i.status = 'void' then 0 else i.total - i.amount_paid - i.amount_credited end)::text as amount_due, i.origin,
  ${isoUtcText('i.created_at')} as created_at,
  (i.status in ('issued', 'part_paid') and i.due_on < ${today}::date) as is_overdue`;

export const SUMMARY_FROM = `from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
  join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id`;

export interface SummaryRow {
  id: string;
  number_text: string | null;
  kind: InvoiceKind;
  status: InvoiceStatus;
  job_id: string;
  job_title: string;
  client_id: string;
  client_name: string;
  issued_on: string | null;
  due_on: string | null;
  currency: string;
  total: string;
  amount_due: string;
  origin: 'office' | 'queue';
  /** ISO 8601, UTC */
  created_at: string;
  is_overdue: boolean;
}

export const toSummary = (r: SummaryRow): InvoiceSummary => ({
  id: r.id,
  number: r.number_text,
  kind: r.kind,
  status: r.status,
  isOverdue: r.is_overdue,
  jobId: r.job_id,
  jobTitle: r.job_title,
  clientId: r.client_id,
  clientName: r.client_name,
  issuedOn: r.issued_on,
  dueOn: r.due_on,
  currency: r.currency,
  total: moneyOut(r.total, r.currency),
  amountDue: moneyOut(r.amount_due, r.currency),
  origin: r.origin,
  createdAt: r.created_at,
});

const FILTERS: Record<InvoiceListQuery['filter'], string> = {
  all: '',
  drafts: `and i.status = 'draft'`,
  open: `and i.status in ('issued', 'part_paid')`,
  overdue: `and i.status in ('issued', 'part_paid') and i.due_on < (select today from clock)`,
  paid: `and i.status = 'paid'`,
  refunded: `and i.status = 'refunded'`,
  void: `and i.status = 'void'`,
};

export type InvoiceListRow = SummaryRow & { created_at_text: string };

/**
 * The firm's invoices, newest first, keyset over (created_at, id): one statement. The page is cut
 * from invoices alone first (a backward walk of invoices_tenant_created_idx, stopping at the limit;
 * a name search matches the firm's few clients once, as a hashed set), and only the page's rows are
 * joined to their job and client, so a deep page of 100k invoices costs what the first does. The
 * firm-local day (for overdue) is computed inside it from the firm's zone and the given clock.
 */
export function buildInvoiceListQuery(tenantId: string, q: InvoiceListQuery, now: Date): SqlQuery & { values: unknown[] } {
  const values: unknown[] = [tenantId, now];
  const add = (v: unknown) => `$${values.push(v)}`;
  const where: string[] = [FILTERS[q.filter]];
  if (q.q) {
    const like = add(`%${q.q.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`);
    where.push(
      `and (i.number_text ilike ${like} or i.client_id in (select c.id from clients c where c.tenant_id = $1 and c.name ilike ${like}))`,
    );
  }
  if (q.after) {
    const cursor = decodeCursor(q.after, 'timestamptz');
    where.push(`and (i.created_at, i.id) < (${add(cursor.sortValue)}::timestamptz, ${add(cursor.id)}::uuid)`);
  }
  const text = `with clock as materialized (select ($2::timestamptz at time zone f.time_zone)::date as today from firms f where f.id = $1),
    page as materialized (select i.tenant_id, i.id, i.number_text, i.kind, i.status, i.job_id, i.client_id, i.issued_on, i.due_on, i.currency,
        i.total, i.amount_paid, i.amount_credited, i.origin, i.created_at from invoices i where i.tenant_id = $1 ${where.join(' ')}
      order by i.created_at desc, i.id desc limit ${add(q.limit + 1)})
    select ${summaryColumns('(select today from clock)')}, i.created_at::text as created_at_text
      from page i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
      join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
     order by i.created_at desc, i.id desc`;
  return { text, values, name: statementName('invoice_list', text) };
}

/** The page the list query's rows make: it asks for one row more than the page, which says there is a next one. */
export function invoicePage(rows: InvoiceListRow[], limit: number): KeysetPage<InvoiceSummary> {
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  return { items: page.map(toSummary), nextCursor: rows.length > limit && last ? encodeCursor(last.created_at_text, last.id) : null };
}

/** Summaries of one job's invoices, newest first. */
export async function jobInvoices(tx: TenantTx, jobId: string, today: string): Promise<InvoiceSummary[]> {
  const { rows } = await tx.client.query<SummaryRow>(
    `select ${summaryColumns('$3')} ${SUMMARY_FROM} where i.tenant_id = $1 and i.job_id = $2 order by i.created_at desc, i.id desc`,
    [tx.tenantId, jobId, today],
  );
  return rows.map(toSummary);
}

interface DetailRow extends SummaryRow {
  schedule_line_id: string | null;
  period_end: string | null;
  subtotal: string;
  deposit_credit: string;
  retainage_held: string;
  tax_included: string;
  amount_paid: string;
  amount_credited: string;
  lines: InvoiceLine[];
  progress: ProgressTable | null;
  document: InvoiceDocument | null;
  notes: string;
  trigger: { text?: string | null } | null;
  reopened_layer: string | null;
  sent_at: Date | null;
  void_reason: string | null;
  time_zone: string;
}

/** "3 days before the due date", "On the due date", "7 days after the due date". */
export function reminderLabel(step: string): string {
  if (step === 'due') return 'On the due date';
  const [side, days] = step.split(':');
  const n = Number(days);
  const d = `${n} ${n === 1 ? 'day' : 'days'}`;
  return side === 'before' ? `${d} before the due date` : `${d} after the due date`;
}

/** One transaction writes several rows at one instant (issued and sent, voided and its credit note): their order in the trail. */
const TRAIL_ORDER = [
  'invoice.drafted',
  'invoice.updated',
  'invoice.issued',
  'invoice.sent',
  'invoice.reminded',
  'invoice.payment_recorded',
  'invoice.refund_requested',
  'invoice.refund_recorded',
  'invoice.refund_failed',
  'invoice.payment_needs_attention',
  'invoice.refund_needs_attention',
  'invoice.attention_cleared',
  'invoice.voided',
  'credit_note.issued',
];

type AuditData = Record<string, string | number | null | undefined>;

/** The office reads amounts as everywhere else ("$2,721.65"), and how money moved in words ("Bank transfer"). */
function trailWords(currency: string) {
  const money = (value: unknown): string => {
    try {
      return formatMoney(String(value), currency, 'en-US');
    } catch {
      return String(value);
    }
  };
  const method = (value: unknown): string =>
    typeof value === 'string' && value in PAYMENT_METHOD_LABELS
      ? PAYMENT_METHOD_LABELS[value as PaymentMethod].toLowerCase()
      : String(value);
  return { money, method };
}

/** "paid €30.00 where the checkout asked $25.00", each amount in its own currency. */
export function paidOther(data: Readonly<Record<string, unknown>>): string {
  const say = (amount: unknown, currency: unknown) => trailWords(typeof currency === 'string' ? currency : '').money(amount);
  return `paid ${say(data['amount'], data['currency'])} where the checkout asked ${say(data['asked'], data['askedCurrency'])}`;
}

function trailText(action: string, data: AuditData, currency: string): string {
  const { money, method } = trailWords(currency);
  switch (action) {
    case 'invoice.drafted':
      return data['origin'] === 'queue' ? 'Drafted when its trigger was met' : 'Drafted';
    case 'invoice.updated':
      return typeof data['refigured'] === 'string'
        ? `Refigured from ${money(data['totalBefore'])} to ${money(data['total'])}: ${data['refigured']}`
        : 'Draft changed';
    case 'invoice.issued':
      return `Issued as ${String(data['number'])}`;
    case 'invoice.sent':
      return 'E-mailed to the client';
    case 'invoice.voided':
      return `Voided: ${String(data['reason'] ?? '')}`;
    case 'credit_note.issued':
      return `Credit note ${String(data['number'])} made`;
    case 'invoice.payment_recorded':
      return `Payment of ${money(data['amount'])} received (${method(data['method'])})${data['receipt'] ? `, receipt ${String(data['receipt'])}` : ''}`;
    case 'invoice.refund_requested':
      return `Refund of ${money(data['amount'])} asked for (${method(data['method'])})`;
    case 'invoice.refund_recorded':
      return `Refund of ${money(data['amount'])} given back${data['receipt'] ? `, receipt ${String(data['receipt'])}` : ''}`;
    case 'invoice.refund_failed':
      return `Refund of ${money(data['amount'])} failed: ${String(data['message'] ?? '')}`;
    case 'invoice.refund_needs_attention':
      return `A refund at the card processor needs checking: ${String(data['why'] ?? '')}`;
    case 'invoice.payment_needs_attention':
      return data['reason'] === 'paidWhenNotAsked'
        ? `A card payment of ${money(data['amount'])} came in after the invoice stopped asking for it; kept as the client's credit (${money(data['credit'])})`
        : `A card payment needs checking: ${paidOther(data)}`;
    case 'invoice.attention_cleared':
      return 'Marked as dealt with';
    case 'invoice.reminded':
      return `Reminder sent: ${reminderLabel(String(data['step'] ?? 'due'))}`;
    default:
      return action;
  }
}

const TRAIL_ORDER_SQL = `array[${TRAIL_ORDER.map((a) => `'${a}'`).join(', ')}]::text[]`;

/**
 * The reads of an invoice's page, run in one round trip (readAllInOneTrip): the invoice with its
 * firm-local day ($3 is now), its credit note, payments and refunds, client credits, reminders,
 * trail (the credit note's entries found through it), and the rows a draft's document is made from.
 */
export const invoiceDetailReads = (tenantId: string, id: string, now: Date): SqlQuery[] => [
  {
    name: 'invoice_detail',
    text: `with clock as (select ($3::timestamptz at time zone f.time_zone)::date as today, f.time_zone from firms f where f.id = $1)
     select ${summaryColumns('(select today from clock)')}, i.schedule_line_id, i.period_end::text as period_end, i.subtotal::text as subtotal,
            i.deposit_credit::text as deposit_credit, i.retainage_held::text as retainage_held, i.tax_included::text as tax_included,
            i.amount_paid::text as amount_paid, i.amount_credited::text as amount_credited, i.lines, i.progress, i.document, i.notes,
            i.trigger, i.sent_at, i.void_reason,
            (select w.layer_name from job_work_items w
              where i.status = 'draft' and i.trigger->>'kind' = 'layerComplete'
                and w.tenant_id = i.tenant_id and w.job_id = i.job_id and w.layer_id = i.trigger->>'layerId' and w.done_on is null
                and ${countsTowardLineSql('w', 'i.schedule_line_id')}
              limit 1) as reopened_layer
       ${SUMMARY_FROM} where i.tenant_id = $1 and i.id = $2`,
    values: [tenantId, id, now],
  },
  {
    name: 'invoice_credit_note',
    text: `select id, number_text, issued_on::text as issued_on, amount::text as amount, reason from credit_notes where tenant_id = $1 and invoice_id = $2`,
    values: [tenantId, id],
  },
  ...invoicePaymentReads(tenantId, id),
  invoiceCreditsRead(tenantId, id),
  {
    name: 'invoice_reminders_sent',
    text: `select step, sent_on::text as sent_on from invoice_reminders where tenant_id = $1 and invoice_id = $2 order by sent_on, created_at`,
    values: [tenantId, id],
  },
  {
    name: 'invoice_trail',
    text: `select a.created_at, a.action, a.data, a.actor_kind, coalesce(u.name, pu.name) as who
         from audit_log a
         left join users u on a.actor_kind = 'staff' and u.id = a.actor_user_id
         left join portal_users pu on a.actor_kind = 'client' and pu.tenant_id = a.tenant_id and pu.id = a.actor_user_id
        where a.tenant_id = $1 and ((a.entity = 'invoice' and a.entity_id = $2)
              or (a.entity = 'credit_note' and a.entity_id in (select id from credit_notes where tenant_id = $1 and invoice_id = $2)))
        order by a.created_at, array_position(${TRAIL_ORDER_SQL}, a.action), a.id`,
    values: [tenantId, id],
  },
  // What a draft would print today (an issued one keeps its frozen document).
  jobOfInvoiceRead(tenantId, id),
  billingSettingsRead(tenantId),
  documentReadOfInvoice(tenantId, id),
];

type CreditNoteRow = { id: string; number_text: string; issued_on: string; amount: string; reason: string };
type ReminderRow = { step: string; sent_on: string };
type TrailRow = { created_at: Date; action: string; data: AuditData; actor_kind: string; who: string | null };

/**
 * GET /api/invoices/:id: the invoice with its credit note, payments, reminders and trail, in one
 * round trip. `endsTransaction`: reading it is the caller's last step, so its COMMIT goes in that trip.
 */
export async function getInvoice(tx: TenantTx, id: string, now: Date, options: { endsTransaction?: boolean } = {}): Promise<InvoiceDetail> {
  return invoiceDetailFrom(
    id,
    await readAllInOneTrip(tx, invoiceDetailReads(tx.tenantId, id, now), { commit: options.endsTransaction === true }),
  );
}

/** The invoice's page from invoiceDetailReads' rows, in their order; 404 when there is no such invoice. */
export function invoiceDetailFrom(id: string, results: Record<string, unknown>[][]): InvoiceDetail {
  const [detailRows, creditRows, paymentRows, refundRows, clientCreditRows, reminderRows, trailRows, jobRows, settingsRows, documentRows] =
    results;
  const r = detailRows[0] as unknown as DetailRow | undefined;
  if (!r) throw notFound('invoice');
  const m = (v: string) => moneyOut(v, r.currency);
  const credit = creditRows[0] as unknown as CreditNoteRow | undefined;
  const creditNote: CreditNoteView | null = credit
    ? {
        id: credit.id,
        number: credit.number_text,
        invoiceId: id,
        issuedOn: credit.issued_on,
        amount: m(credit.amount),
        currency: r.currency,
        reason: credit.reason,
      }
    : null;
  const payments = invoicePayments(paymentRows, refundRows);
  const clientCredits = invoiceCredits(clientCreditRows);
  const reminders = (reminderRows as unknown as ReminderRow[]).map((x): InvoiceReminderView => ({
    step: x.step,
    label: reminderLabel(x.step),
    sentOn: x.sent_on,
  }));
  const trail = (trailRows as unknown as TrailRow[]).map((a): AuditTrailEntry => ({
    at: a.created_at.toISOString(),
    who: a.who ?? (a.actor_kind === 'system' ? 'Automatic' : 'Someone'),
    action: a.action,
    text: trailText(a.action, a.data, r.currency),
  }));
  let document = r.document;
  if (!document) {
    const job = jobRows[0] as unknown as BillingJob;
    const { settings } = billingSettingsOf(settingsRows as Array<{ settings: BillingSettings }>);
    document = documentFrom(documentRows[0], job.billing_terms ?? billingTermsFor(settings, job.contract_sum, job.currency), settings);
  }
  return {
    ...toSummary(r),
    scheduleLineId: r.schedule_line_id,
    periodEnd: r.period_end,
    subtotal: m(r.subtotal),
    depositCredit: m(r.deposit_credit),
    retainageHeld: m(r.retainage_held),
    taxIncluded: m(r.tax_included),
    amountPaid: m(r.amount_paid),
    amountCredited: m(r.amount_credited),
    lines: r.lines,
    progress: r.progress,
    document,
    notes: r.notes,
    triggerText: r.trigger?.text ?? null,
    reopenedLayer: r.reopened_layer,
    sentAt: r.sent_at?.toISOString() ?? null,
    voidReason: r.void_reason,
    creditNote,
    payments,
    clientCredits,
    reminders,
    auditTrail: trail,
  };
}
