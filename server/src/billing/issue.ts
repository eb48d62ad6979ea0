import type { BillingSettings, BillingTrigger, InvoiceIssue, InvoiceLine, ProgressTable } from '@layerbook/contracts';
import { readAllInOneTrip, type TenantTx } from '@layerbook/db';
import { dueDate } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Config } from '../config';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import type { JobQueue } from '../queue/job-queue';
import { assertBillingStarted, billedBeforeRead, firmToday, lockJobOfInvoice, taxInside } from './billing-job';
import { documentFrom, documentRead } from './document';
import { progressDepositCredit, retainageHeld } from './drafts';
import { enqueueInvoiceMail } from './invoice-mail';
import { linesWithWords, progressWithWords } from './invoice-words';
import { takeInvoiceNumber } from './numbering';
import { billingSettingsOf, billingSettingsRead } from './settings';

interface LockedInvoice {
  id: string;
  job_id: string;
  kind: string;
  status: string;
  schedule_line_id: string | null;
  subtotal: string;
  lines: InvoiceLine[];
  progress: ProgressTable | null;
  line_role: 'deposit' | 'milestone' | 'final' | null;
  line_trigger: BillingTrigger | null;
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
 * and e-mail it when asked. Issued twice: 409. `endsTransaction`: issuing is the caller's last step,
 * so without an e-mail the number goes with COMMIT in one round trip (takeInvoiceNumber).
 */
export async function issueInvoice(
  tx: TenantTx,
  deps: IssueDeps,
  actor: Actor,
  id: string,
  body: InvoiceIssue,
  now: Date,
  options: { endsTransaction?: boolean } = {},
): Promise<void> {
  // The job first, then the invoice (the order drafting takes them in): issues on one job go one at
  // a time, so each one's tax and deposit credit see the others.
  const job = await lockJobOfInvoice(tx, id);
  const inv = (
    await tx.client.query<LockedInvoice>(
      `select i.id, i.job_id, i.kind, i.status, i.schedule_line_id, i.subtotal::text as subtotal, i.lines, i.progress,
              l.role as line_role, l.trigger as line_trigger
         from invoices i left join payment_schedule_lines l on l.tenant_id = i.tenant_id and l.id = i.schedule_line_id
        where i.tenant_id = $1 and i.id = $2 for update of i`,
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
  // What the tax, the terms and the frozen document need, in one round trip.
  const [billedRows, settingsRows, documentRows] = await readAllInOneTrip(tx, [
    billedBeforeRead(tx.tenantId, job.id, inv.id),
    billingSettingsRead(tx.tenantId),
    documentRead(tx.tenantId, job.id),
  ]);
  const tax = taxInside(job, total, billedRows[0] as { billed: string; tax: string });
  const { settings } = billingSettingsOf(settingsRows as Array<{ settings: BillingSettings }>);
  const issuedOn = body.issuedOn ?? firmToday(job, now);
  const dueOn = dueDate(issuedOn, job.billing_terms.terms);
  const document = documentFrom(documentRows[0], job.billing_terms, settings);
  // The key of every label the system wrote, so each client reads the lines in their language (a
  // draft made before words were kept gets them here).
  const line = inv.line_role && inv.line_trigger ? { role: inv.line_role, trigger: inv.line_trigger } : null;
  const lines = linesWithWords(inv.lines, line);
  const progress = progressWithWords(inv.progress);
  // Everything but what the firm's kept figures read (status, due date, total: cash's triggers), so
  // the rows those triggers lock are taken only by the number's statement below; its schedule line
  // marked invoiced in the same statement.
  await tx.client.query(
    `with line as (update payment_schedule_lines set status = 'invoiced', updated_at = $8 where tenant_id = $1 and id = $11)
     update invoices set issued_on = $3, document = $4, deposit_credit = $5, tax_included = $6, issued_by = $7, issued_at = $8,
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
      JSON.stringify(lines),
      progress === null ? null : JSON.stringify(progress),
      inv.schedule_line_id,
    ],
  );
  // The number last: every issuer of the firm waits on the counter from here to commit. Without an
  // e-mail to write (which shows the number) the number, its audit entry and COMMIT go as one trip.
  await takeInvoiceNumber(
    tx,
    id,
    settings.invoicePrefix,
    // Nothing due (no work this period, or all of it taken by the deposit credit): no payment can
    // follow, so it is paid as issued, never overdue nor reminded.
    { status: total.isZero() ? 'paid' : 'issued', dueOn, total: total.toFixed(2) },
    { actorUserId: actor.userId, actorKind: actor.kind },
    { commit: options.endsTransaction === true && !body.send },
  );
  if (body.send) {
    await enqueueInvoiceMail(tx, deps.queue, deps.config, id, { kind: 'issued' });
    await tx.client.query(`update invoices set sent_at = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, id, now]);
    await recordAudit(tx, { actorUserId: actor.userId, actorKind: actor.kind, action: 'invoice.sent', entity: 'invoice', entityId: id });
  }
}
