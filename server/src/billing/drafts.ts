import type { BillingTrigger, InvoiceLine } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { depositCredit } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import { linesWithWords, RETAINAGE_RELEASED_LINE } from './invoice-words';
import { assertBillingStarted, invoiceTax, LIVE_ISSUED, loadBillingJob, type StartedJob } from './billing-job';

export interface LineDraftRequest {
  readonly lineId: string;
  readonly origin: 'office' | 'queue';
  readonly actor: Actor;
  /** today in the firm's zone */
  readonly today: string;
  /** what met the trigger, in words, kept on the invoice ("Base coat finished on every surface on 2026-12-10") */
  readonly triggerText: string | null;
}

interface LineRow {
  id: string;
  job_id: string;
  label: string;
  role: 'deposit' | 'milestone' | 'final';
  trigger: BillingTrigger;
  amount: string;
  status: 'draft' | 'scheduled' | 'ready' | 'invoiced';
}

const KIND_OF_ROLE = { deposit: 'deposit', milestone: 'milestone', final: 'final' } as const;

/**
 * Drafts the invoice for one billing-schedule line (deposit, stage or final), marking the line
 * ready. Idempotent: when the line already has a live invoice, returns it with `isNew` false (the
 * line's row lock and the partial unique index invoices_schedule_line_key make a trigger met twice
 * — two workers, a retry — draft once). The line must be scheduled (billing started).
 */
export async function draftLineInvoice(tx: TenantTx, request: LineDraftRequest): Promise<{ invoiceId: string; isNew: boolean }> {
  const line = (
    await tx.client.query<LineRow>(
      `select id, job_id, label, role, trigger, amount::text as amount, status from payment_schedule_lines
        where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, request.lineId],
    )
  ).rows[0];
  if (!line) throw notFound('schedule line');
  const live = await tx.client.query<{ id: string }>(
    `select id from invoices where tenant_id = $1 and schedule_line_id = $2 and status <> 'void'`,
    [tx.tenantId, line.id],
  );
  if (live.rows[0]) return { invoiceId: live.rows[0].id, isNew: false };
  if (line.status !== 'scheduled') throw conflict('Start billing for this job first (confirm its schedule).');
  const job = await loadBillingJob(tx, line.job_id);
  assertBillingStarted(job);
  const tax = await invoiceTax(tx, job, line.amount, null);
  const lines = linesWithWords([{ label: line.label, amount: line.amount }], line);
  const inserted = await tx.client.query<{ id: string }>(
    `insert into invoices (tenant_id, job_id, client_id, kind, schedule_line_id, currency, subtotal, tax_included, total, lines, origin, trigger, created_by)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $7, $9, $10, $11, $12)
     on conflict (tenant_id, schedule_line_id) where status <> 'void' and schedule_line_id is not null do nothing
     returning id`,
    [
      tx.tenantId,
      job.id,
      job.client_id,
      KIND_OF_ROLE[line.role],
      line.id,
      job.currency,
      line.amount,
      tax.toFixed(2),
      JSON.stringify(lines),
      request.origin,
      JSON.stringify({ ...line.trigger, text: request.triggerText }),
      request.actor.userId,
    ],
  );
  const invoiceId = inserted.rows[0]?.id;
  if (!invoiceId) {
    const again = await tx.client.query<{ id: string }>(
      `select id from invoices where tenant_id = $1 and schedule_line_id = $2 and status <> 'void'`,
      [tx.tenantId, line.id],
    );
    return { invoiceId: again.rows[0].id, isNew: false };
  }
  await tx.client.query(`update payment_schedule_lines set status = 'ready', updated_at = now() where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    line.id,
  ]);
  await recordAudit(tx, {
    actorUserId: request.actor.userId,
    actorKind: request.actor.kind,
    action: 'invoice.drafted',
    entity: 'invoice',
    entityId: invoiceId,
    data: { origin: request.origin, kind: KIND_OF_ROLE[line.role], scheduleLineId: line.id, total: line.amount, today: request.today },
  });
  return { invoiceId, isNew: true };
}

/**
 * The deposit credit on an invoice of a progress-billed job: the deposit invoiced so far is an
 * advance, taken off by the job's rule (pro rata of the work billed to date, or on the next invoices);
 * the invoice that bills the contract sum in full, or the release, takes the rest.
 */
export async function progressDepositCredit(
  tx: TenantTx,
  job: StartedJob,
  earned: Decimal,
  isFinal: boolean,
  exceptInvoiceId: string | null,
): Promise<Decimal> {
  const { rows } = await tx.client.query<{ deposit: string; credited: string; earned: string }>(
    `select coalesce(sum(total) filter (where kind = 'deposit'), 0)::text as deposit,
            coalesce(sum(deposit_credit) filter (where kind <> 'deposit'), 0)::text as credited,
            coalesce(sum(subtotal) filter (where kind <> 'deposit'), 0)::text as earned
       from invoices where tenant_id = $1 and job_id = $2 and ${LIVE_ISSUED} and id is distinct from $3`,
    [tx.tenantId, job.id, exceptInvoiceId],
  );
  const deposit = new Decimal(rows[0].deposit);
  if (deposit.isZero()) return new Decimal(0);
  return depositCredit({
    rule: job.billing_terms.depositCredit,
    deposit,
    creditedBefore: Decimal.min(new Decimal(rows[0].credited), deposit),
    earnedBefore: rows[0].earned,
    earnedThisInvoice: earned,
    contractSum: job.contract_sum,
    isFinal,
    currency: job.currency,
  });
}

/** Retainage still held on a progress-billed job: held on the last issued application less what releases billed. */
export async function retainageHeld(tx: TenantTx, jobId: string, exceptInvoiceId: string | null = null): Promise<Decimal> {
  const { rows } = await tx.client.query<{ held: string; released: string }>(
    `select coalesce((select retainage_held from invoices where tenant_id = $1 and job_id = $2 and kind = 'progress' and ${LIVE_ISSUED}
                       order by issued_at desc, number desc limit 1), 0)::text as held,
            coalesce((select sum(subtotal) from invoices where tenant_id = $1 and job_id = $2 and kind = 'retainage' and ${LIVE_ISSUED}
                       and id is distinct from $3), 0)::text as released`,
    [tx.tenantId, jobId, exceptInvoiceId],
  );
  return Decimal.max(new Decimal(rows[0].held).minus(rows[0].released), 0);
}

/** Drafts the release of the retainage held (progress billing); one open release draft per job. */
export async function draftRetainageInvoice(
  tx: TenantTx,
  request: { jobId: string; origin: 'office' | 'queue'; actor: Actor },
): Promise<{ invoiceId: string; isNew: boolean }> {
  const job = await loadBillingJob(tx, request.jobId, true);
  assertBillingStarted(job);
  if (job.billing_method !== 'progress') throw conflict('Retainage is released on jobs billed by progress.');
  const open = await tx.client.query<{ id: string }>(
    `select id from invoices where tenant_id = $1 and job_id = $2 and kind = 'retainage' and status = 'draft'`,
    [tx.tenantId, job.id],
  );
  if (open.rows[0]) return { invoiceId: open.rows[0].id, isNew: false };
  const { held, credit, total, tax, lines } = await releaseFigures(tx, job, null);
  if (held.lessThanOrEqualTo(0)) throw conflict('No retainage is held on this job.');
  const { rows } = await tx.client.query<{ id: string }>(
    `insert into invoices (tenant_id, job_id, client_id, kind, currency, subtotal, deposit_credit, tax_included, total, lines, origin, created_by)
     values ($1, $2, $3, 'retainage', $4, $5, $6, $7, $8, $9, $10, $11) returning id`,
    [
      tx.tenantId,
      job.id,
      job.client_id,
      job.currency,
      held.toFixed(2),
      credit.toFixed(2),
      tax.toFixed(2),
      total.toFixed(2),
      JSON.stringify(lines),
      request.origin,
      request.actor.userId,
    ],
  );
  await recordAudit(tx, {
    actorUserId: request.actor.userId,
    actorKind: request.actor.kind,
    action: 'invoice.drafted',
    entity: 'invoice',
    entityId: rows[0].id,
    data: { origin: request.origin, kind: 'retainage', total: total.toFixed(2) },
  });
  return { invoiceId: rows[0].id, isNew: true };
}

/** A release's amounts: all the retainage held now (less other releases than `draftId`), the rest of the deposit credited, the tax inside. */
async function releaseFigures(tx: TenantTx, job: StartedJob, draftId: string | null) {
  const held = await retainageHeld(tx, job.id, draftId);
  const credit = await progressDepositCredit(tx, job, held, true, draftId);
  const total = held.minus(credit);
  const tax = await invoiceTax(tx, job, total, draftId);
  const lines: InvoiceLine[] = [{ ...RETAINAGE_RELEASED_LINE, amount: held.toFixed(2) }];
  return { held, credit, total, tax, lines };
}

/**
 * After another invoice of a progress-billed job is issued or voided (the queue's `refreshDraft`), its
 * open retainage release is figured again, so it bills all the retainage held now, never what an
 * application issued since it was drafted left behind; a changed total is in its history. One that
 * would bill nothing is left as it is: issuing refuses it, and the office deletes it.
 */
export async function refreshOpenReleaseDraft(tx: TenantTx, jobId: string, actor: Actor): Promise<void> {
  // The job's row first, the order issuing and drafting take.
  const job = await loadBillingJob(tx, jobId, true);
  const open = (
    await tx.client.query<{ id: string; total: string }>(
      `select id, total::text as total from invoices where tenant_id = $1 and job_id = $2 and kind = 'retainage' and status = 'draft' for update`,
      [tx.tenantId, jobId],
    )
  ).rows[0];
  if (!open) return;
  assertBillingStarted(job);
  const { held, credit, total, tax, lines } = await releaseFigures(tx, job, open.id);
  if (held.lessThanOrEqualTo(0) || total.equals(open.total)) return;
  await tx.client.query(
    `update invoices set subtotal = $3, deposit_credit = $4, tax_included = $5, total = $6, lines = $7, updated_at = now()
      where tenant_id = $1 and id = $2`,
    [tx.tenantId, open.id, held.toFixed(2), credit.toFixed(2), tax.toFixed(2), total.toFixed(2), JSON.stringify(lines)],
  );
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.updated',
    entity: 'invoice',
    entityId: open.id,
    data: { kind: 'retainage', refigured: 'the job’s other invoices changed', totalBefore: open.total, total: total.toFixed(2) },
  });
}
