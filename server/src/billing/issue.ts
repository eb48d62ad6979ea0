import type { BillingTrigger, InvoiceIssue, InvoiceLine, ProgressTable } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { dueDate } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Config } from '../config';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import type { JobQueue } from '../queue/job-queue';
import { assertBillingStarted, firmToday, invoiceTax, loadBillingJob } from './billing-job';
import { invoiceDocument } from './document';
import { progressDepositCredit, retainageHeld } from './drafts';
import { enqueueInvoiceMail } from './invoice-mail';
import { linesWithWords, progressWithWords } from './invoice-words';
import { takeInvoiceNumber } from './numbering';
import { loadBillingSettings } from './settings';

interface LockedInvoice {
  id: string;
  job_id: string;
  kind: string;
  status: string;
  schedule_line_id: string | null;
  subtotal: string;
  lines: InvoiceLine[];
  progress: ProgressTable | null;
}

export interface IssueDeps {
  readonly queue: JobQueue;
  readonly config: Config;
}

/**
 * POST /api/invoices/:id/issue — in ONE transaction: lock the draft, recompute what depends on
 * other invoices (the deposit credit, the tax inside), take the next number of the firm's invoice
 * series (the counter row stays locked until commit; a failure anywhere rolls the number back),
 * date it and its due date by the job's terms, freeze the document, mark its line invoiced, audit,
 * and e-mail it when asked. Issued twice: 409.
 */
export async function issueInvoice(tx: TenantTx, deps: IssueDeps, actor: Actor, id: string, body: InvoiceIssue, now: Date): Promise<void> {
  // The job first, then the invoice (the order drafting takes them in): issues on one job go one at
  // a time, so each one's tax and deposit credit see the others.
  const owner = await tx.client.query<{ job_id: string }>(`select job_id from invoices where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    id,
  ]);
  if (!owner.rows[0]) throw notFound('invoice');
  const job = await loadBillingJob(tx, owner.rows[0].job_id, true);
  const inv = (
    await tx.client.query<LockedInvoice>(
      `select id, job_id, kind, status, schedule_line_id, subtotal::text as subtotal, lines, progress
         from invoices where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, id],
    )
  ).rows[0];
  if (!inv) throw notFound('invoice');
  if (inv.status !== 'draft') throw conflict('This invoice is already issued.');
  assertBillingStarted(job);
  const subtotal = new Decimal(inv.subtotal);
  // A release drafted before its application was voided would bill retainage no longer held.
  if (inv.kind === 'retainage' && subtotal.greaterThan(await retainageHeld(tx, job.id, inv.id))) {
    throw conflict('Less retainage is held now than this release bills: delete it and draft the release again.');
  }
  const isProgressJob = job.billing_method === 'progress' && (inv.kind === 'progress' || inv.kind === 'retainage');
  const credit = isProgressJob ? await progressDepositCredit(tx, job, subtotal, inv.kind === 'retainage', inv.id) : new Decimal(0);
  const total = subtotal.minus(credit);
  if (total.isNegative()) {
    throw conflict('This invoice comes to less than nothing: earlier invoices billed more than is earned. Correct the readings first.');
  }
  const tax = await invoiceTax(tx, job, total, inv.id);
  const { settings } = await loadBillingSettings(tx);
  const issuedOn = body.issuedOn ?? firmToday(job, now);
  const dueOn = dueDate(issuedOn, job.billing_terms.terms);
  const document = await invoiceDocument(tx, job.id, job.billing_terms, settings);
  const words = await frozenWords(tx, inv);
  // Everything but what the firm's kept figures read (status, due date, total: cash's triggers), so
  // the rows those triggers lock are taken only by the last statement below, with the number.
  await tx.client.query(
    `update invoices set issued_on = $3, document = $4, deposit_credit = $5, tax_included = $6, issued_by = $7, issued_at = $8,
            updated_at = $8, lines = $9, progress = $10
      where tenant_id = $1 and id = $2`,
    [
      tx.tenantId,
      id,
      issuedOn,
      JSON.stringify(document),
      credit.toFixed(2),
      tax.toFixed(2),
      actor.userId,
      now,
      JSON.stringify(words.lines),
      words.progress === null ? null : JSON.stringify(words.progress),
    ],
  );
  if (inv.schedule_line_id) {
    await tx.client.query(`update payment_schedule_lines set status = 'invoiced', updated_at = $3 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      inv.schedule_line_id,
      now,
    ]);
  }
  // The number last: every issuer of the firm waits on the counter from here to commit.
  const { text: numberText } = await takeInvoiceNumber(tx, id, settings.invoicePrefix, {
    // Nothing due (no work this period, or all of it taken by the deposit credit): no payment can
    // follow, so it is paid as issued, never overdue nor reminded.
    status: total.isZero() ? 'paid' : 'issued',
    dueOn,
    total: total.toFixed(2),
  });
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.issued',
    entity: 'invoice',
    entityId: id,
    data: { number: numberText, issuedOn, dueOn, total: total.toFixed(2) },
  });
  if (body.send) {
    await enqueueInvoiceMail(tx, deps.queue, deps.config, id, { kind: 'issued' });
    await tx.client.query(`update invoices set sent_at = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, id, now]);
    await recordAudit(tx, { actorUserId: actor.userId, actorKind: actor.kind, action: 'invoice.sent', entity: 'invoice', entityId: id });
  }
}

/**
 * The invoice's lines and progress table with the key of every label the system wrote, so each
 * client reads them in their language (a draft made before words were kept gets them here).
 */
async function frozenWords(tx: TenantTx, inv: LockedInvoice): Promise<{ lines: InvoiceLine[]; progress: ProgressTable | null }> {
  const line = inv.schedule_line_id
    ? (
        await tx.client.query<{ role: 'deposit' | 'milestone' | 'final'; trigger: BillingTrigger }>(
          `select role, trigger from payment_schedule_lines where tenant_id = $1 and id = $2`,
          [tx.tenantId, inv.schedule_line_id],
        )
      ).rows[0]
    : undefined;
  return { lines: linesWithWords(inv.lines, line ?? null), progress: progressWithWords(inv.progress) };
}
