import { INVOICE_KIND_LABELS, type InvoiceKind, type JobHistory, type JobHistoryEntry } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { localDate } from '../firms/local-date';
import { notFound } from '../http/problem';

/** How many entries the history shows, newest first. */
const HISTORY_MAX = 500;

const AUTOMATIC = 'Automatic (billing)';

interface ProgressRow {
  id: string;
  kind: 'layerDone' | 'layerReopened' | 'valuePercent' | 'storedMaterials' | 'walkthrough';
  happened_on: string;
  created_at: Date;
  value: string | null;
  note: string;
  actor_name: string | null;
  room_name: string | null;
  surface_name: string | null;
  layer_name: string | null;
  line_label: string | null;
}

interface AuditRow {
  id: string;
  action: string;
  entity: string;
  actor_kind: 'staff' | 'client' | 'system';
  actor_name: string | null;
  created_at: Date;
  data: Record<string, unknown>;
  invoice_kind: InvoiceKind | null;
  invoice_number: string | null;
  credit_note_number: string | null;
  change_order_number: number | null;
  change_order_title: string | null;
}

/** "before:3" → "3 days before the due date". */
export function reminderStepWords(step: string): string {
  if (step === 'due') return 'on the due date';
  const m = /^(before|after):(\d+)$/.exec(step);
  if (!m) return step;
  const days = `${m[2]} day${m[2] === '1' ? '' : 's'}`;
  return m[1] === 'before' ? `${days} before the due date` : `${days} after the due date`;
}

function progressText(r: ProgressRow, currency: string): string {
  const where = `${r.room_name ?? 'Room'} · ${r.surface_name ?? 'Surface'}`;
  const note = r.note ? ` — ${r.note}` : '';
  switch (r.kind) {
    case 'layerDone':
      return `${r.layer_name ?? 'Layer'} done on ${where}${note}`;
    case 'layerReopened':
      return `${r.layer_name ?? 'Layer'} reopened on ${where}${note}`;
    case 'valuePercent':
      return `${r.line_label ?? 'Line'} at ${Number(r.value ?? 0)} % complete${note}`;
    case 'storedMaterials':
      return `Materials stored on site for ${r.line_label ?? 'a line'}: ${new Decimal(r.value ?? '0').toFixed(minorUnitDigits(currency))}${note}`;
    case 'walkthrough':
      return `Final walkthrough held${note}`;
  }
}

function auditText(r: AuditRow): string | null {
  // A deleted draft's row is gone: its audit row still says what kind it was.
  const kind = r.invoice_kind ?? (typeof r.data['kind'] === 'string' ? (r.data['kind'] as InvoiceKind) : null);
  const draft = (kind && INVOICE_KIND_LABELS[kind]) || 'Invoice';
  const invoice = `${draft}${r.invoice_number ? ` ${r.invoice_number}` : ''}`;
  const order = `Change order${r.change_order_number !== null ? ` ${r.change_order_number}` : ''}${r.change_order_title ? ` (${r.change_order_title})` : ''}`;
  const step = typeof r.data['step'] === 'string' ? r.data['step'] : '';
  switch (r.action) {
    case 'job.created':
      return 'Job made: the client accepted the proposal';
    case 'job.status_changed':
      return r.data['to'] === 'complete'
        ? 'Job marked finished'
        : r.data['to'] === 'in_progress'
          ? 'Job reopened'
          : `Job cancelled${typeof r.data['reason'] === 'string' ? `: ${r.data['reason']}` : ''}`;
    case 'billing.started':
      return 'Billing started';
    case 'billing.schedule_updated':
      return 'Billing schedule changed';
    case 'billing.value_lines_updated':
      return 'Schedule of values changed';
    case 'invoice.drafted':
      return `${draft} drafted`;
    case 'invoice.updated':
      return typeof r.data['refigured'] === 'string' ? `${draft} draft refigured: ${r.data['refigured']}` : `${draft} draft changed`;
    case 'invoice.deleted':
      return typeof r.data['withdrawn'] === 'string' ? `${draft} draft withdrawn: ${r.data['withdrawn']}` : `${draft} draft deleted`;
    case 'invoice.issued':
      return `${invoice} issued`;
    case 'invoice.sent':
      return `${invoice} e-mailed to the client`;
    case 'invoice.voided':
      return `${invoice} voided`;
    case 'invoice.reminded':
      return `Reminder for ${invoice} sent${step ? `, ${reminderStepWords(step)}` : ''}`;
    case 'invoice.payment_recorded':
      return `Payment recorded on ${invoice}`;
    case 'invoice.refund_recorded':
      return `Refund given back on ${invoice}`;
    case 'invoice.refund_failed':
      return `Refund on ${invoice} failed`;
    case 'invoice.refund_needs_attention':
      return `A refund on ${invoice} needs checking`;
    case 'invoice.payment_needs_attention':
      return `A card payment on ${invoice} needs checking`;
    case 'invoice.attention_cleared':
      return `A check on ${invoice} marked as dealt with`;
    case 'billing.deposit_left_for_office':
      return 'Deposit not issued at acceptance: the billing schedule needs the office first';
    case 'credit_note.issued':
      return `Credit note${r.credit_note_number ? ` ${r.credit_note_number}` : ''} issued`;
    case 'change_order.created':
      return `${order} written`;
    case 'change_order.updated':
      return `${order} changed`;
    case 'change_order.sent':
      return `${order} sent to the client`;
    case 'change_order.approved':
      return `${order} approved by the client`;
    case 'change_order.declined':
      return `${order} declined by the client`;
    default:
      return null;
  }
}

/**
 * The job's history, newest first, in plain words with who: progress from the work (from
 * job_progress), and from the audit trail the job's billing schedule, its invoices, credit notes
 * and change orders.
 */
export async function jobHistory(tx: TenantTx, jobId: string): Promise<JobHistory> {
  const { rows: jobs } = await tx.client.query<{ time_zone: string; client_name: string; currency: string }>(
    `select f.time_zone, j.currency, c.name as client_name from jobs j join firms f on f.id = j.tenant_id join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
      where j.tenant_id = $1 and j.id = $2`,
    [tx.tenantId, jobId],
  );
  const job = jobs[0];
  if (!job) throw notFound('job');
  const { rows: progress } = await tx.client.query<ProgressRow>(
    `select p.id, p.kind, p.happened_on::text as happened_on, p.created_at, trim_scale(p.value)::text as value, p.note, u.name as actor_name,
            w.room_name, w.surface_name, w.layer_name, v.label as line_label
       from job_progress p
       left join users u on u.id = p.actor_user_id
       left join job_work_items w on w.tenant_id = p.tenant_id and w.id = p.work_item_id
       left join job_value_lines v on v.tenant_id = p.tenant_id and v.id = p.value_line_id
      where p.tenant_id = $1 and p.job_id = $2
      order by p.created_at desc, p.id desc limit ${HISTORY_MAX}`,
    [tx.tenantId, jobId],
  );
  const { rows: audit } = await tx.client.query<AuditRow>(
    `with inv as (select id, kind, number_text from invoices where tenant_id = $1 and job_id = $2),
          cn as (select c.id, c.number_text from credit_notes c join inv on inv.id = c.invoice_id where c.tenant_id = $1),
          co as (select id, number, title from change_orders where tenant_id = $1 and job_id = $2)
     select a.id, a.action, a.entity, a.actor_kind, u.name as actor_name, a.created_at, a.data,
            inv.kind as invoice_kind, inv.number_text as invoice_number, cn.number_text as credit_note_number,
            co.number as change_order_number, co.title as change_order_title
       from audit_log a
       left join users u on u.id = a.actor_user_id
       left join inv on a.entity = 'invoice' and inv.id = a.entity_id
       left join cn on a.entity = 'credit_note' and cn.id = a.entity_id
       left join co on a.entity = 'change_order' and co.id = a.entity_id
      where a.tenant_id = $1 and a.action <> 'progress.marked'
        and ((a.entity = 'job' and a.entity_id = $2) or a.data->>'jobId' = $2::text
             or inv.id is not null or cn.id is not null or co.id is not null)
      order by a.created_at desc, a.id desc limit ${HISTORY_MAX}`,
    [tx.tenantId, jobId],
  );
  const who = (kind: 'staff' | 'client' | 'system', name: string | null): string =>
    kind === 'system' ? AUTOMATIC : kind === 'client' ? job.client_name : (name ?? 'Someone who has left');
  const entries: Array<JobHistoryEntry & { sortKey: number }> = [
    ...progress.map((r) => ({
      at: r.created_at.toISOString(),
      on: r.happened_on,
      text: progressText(r, job.currency),
      who: r.actor_name ?? 'Someone who has left',
      kind: `progress.${r.kind}`,
      sortKey: r.created_at.getTime(),
    })),
    ...audit.flatMap((r) => {
      const text = auditText(r);
      return text
        ? [
            {
              at: r.created_at.toISOString(),
              on: localDate(job.time_zone, r.created_at),
              text,
              who: who(r.actor_kind, r.actor_name),
              kind: r.action,
              sortKey: r.created_at.getTime(),
            },
          ]
        : [];
    }),
  ];
  entries.sort((a, b) => b.sortKey - a.sortKey);
  return { items: entries.slice(0, HISTORY_MAX).map(({ sortKey: _s, ...e }) => e) };
}
