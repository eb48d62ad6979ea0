import type { BillingSettings, BillingTrigger, InvoiceDetail, InvoiceIssue, InvoiceLine, ProgressTable } from '@layerbook/contracts';
import { commitThenRead, readAllInOneTrip, runInOneTrip, type SqlQuery, type TenantTx } from '@layerbook/db';
import { addDays, dueDate, yearBefore } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Config } from '../config';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import type { JobQueue } from '../queue/job-queue';
import { assertBillingStarted, type BillingJob, billedBeforeReadOfInvoice, firmToday, jobOfInvoiceRead, taxInside } from './billing-job';
import { documentFrom, documentReadOfInvoice } from './document';
import { progressDepositCredit, retainageHeld } from './drafts';
import { lastIssuedPeriodEnd, refigureDraftForIssue } from './progress-invoice';
import { enqueueInvoiceMail } from './invoice-mail';
import { linesWithWords, progressWithWords } from './invoice-words';
import { invoiceDetailFrom, invoiceDetailReads } from './invoice-read';
import { invoiceNumberQuery } from './numbering';
import { billingSettingsOf, billingSettingsRead } from './settings';
import { enqueueBillingCheck } from './triggers/enqueue';
import { longDate } from '../i18n/long-date';

interface LockedInvoice {
  id: string;
  job_id: string;
  kind: string;
  status: string;
  schedule_line_id: string | null;
  subtotal: string;
  lines: InvoiceLine[];
  progress: ProgressTable | null;
  period_end: string | null;
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
 * and e-mail it when asked. Issued twice: 409. For a caller whose transaction goes on (acceptance,
 * the demo); the route uses issueAndRead.
 */
export async function issueInvoice(tx: TenantTx, deps: IssueDeps, actor: Actor, id: string, body: InvoiceIssue, now: Date): Promise<void> {
  const { writes } = await prepareIssue(tx, deps, actor, id, body, now);
  await runInOneTrip(tx, writes);
  if (body.send) await sendIssued(tx, deps, actor, id, now);
}

/**
 * issueInvoice as a whole request's transaction, answering the invoice's page. On a busy firm
 * every issuer waits on the counter row from the number's statement to COMMIT, so (without an
 * e-mail, which shows the number) the writes, COMMIT and the page's reads go as one round trip
 * (commitThenRead): the lock is held only while PostgreSQL runs the number's statement.
 */
export async function issueAndRead(
  tx: TenantTx,
  deps: IssueDeps,
  actor: Actor,
  id: string,
  body: InvoiceIssue,
  now: Date,
): Promise<InvoiceDetail> {
  const { writes } = await prepareIssue(tx, deps, actor, id, body, now);
  if (body.send) {
    await runInOneTrip(tx, writes);
    await sendIssued(tx, deps, actor, id, now);
  }
  const { after } = await commitThenRead(tx, body.send ? [] : writes, invoiceDetailReads(tx.tenantId, id, now));
  return invoiceDetailFrom(id, after);
}

/**
 * Everything issuing decides, in at most three round trips for a stage payment: the job's and the
 * invoice's locks (in drafting's order: the job first, so issues on one job go one at a time and
 * each one's tax and deposit credit see the others) with the rows the tax, terms and document need;
 * a progress job's credit and retainage; then the writes to send (the frozen invoice with its
 * schedule line marked, then the number).
 */
async function prepareIssue(
  tx: TenantTx,
  deps: IssueDeps,
  actor: Actor,
  id: string,
  body: InvoiceIssue,
  now: Date,
): Promise<{ writes: SqlQuery[] }> {
  const [jobRows, invoiceRows, billedRows, settingsRows, documentRows] = await readAllInOneTrip(tx, [
    jobOfInvoiceRead(tx.tenantId, id, true),
    lockInvoiceRead(tx.tenantId, id),
    billedBeforeReadOfInvoice(tx.tenantId, id),
    billingSettingsRead(tx.tenantId),
    documentReadOfInvoice(tx.tenantId, id),
  ]);
  const job = jobRows[0] as unknown as BillingJob | undefined;
  const locked = invoiceRows[0] as unknown as LockedInvoice | undefined;
  if (!job || !locked) throw notFound('invoice');
  if (locked.status !== 'draft') throw conflict('This invoice is already issued.');
  assertBillingStarted(job);
  if (locked.kind === 'progress' && locked.period_end !== null) {
    const last = await lastIssuedPeriodEnd(tx, job.id);
    if (last !== null && locked.period_end < last) {
      const message = `The last application billed work up to ${longDate(last)}: this period ends on that day or later.`;
      throw conflict(message, [{ field: 'periodEnd', message }]);
    }
  }
  // An application is issued as it figures now (its period and typed work kept): its value lines, the
  // contract sum or the invoices before it may have moved since it was drafted.
  const inv =
    locked.kind === 'progress' && job.billing_method === 'progress' && locked.period_end !== null
      ? { ...locked, ...(await refigureDraftForIssue(tx, job.id, { id: locked.id, periodEnd: locked.period_end }, actor)) }
      : locked;
  const subtotal = new Decimal(inv.subtotal);
  // A deposit, stage or final payment of nothing would read as paid at once and could never be voided
  // (nothing to refund); a progress invoice for a period with nothing due is a record of the period, kept.
  if (subtotal.isZero() && inv.kind !== 'progress' && inv.kind !== 'retainage') {
    throw conflict('This draft bills 0.00: there is nothing to issue. Change its line or delete the draft.');
  }
  // A release bills all the retainage held when it was drafted: one drafted before its application was
  // voided would bill retainage no longer held, one drafted before a later application too little.
  if (inv.kind === 'retainage') {
    const held = await retainageHeld(tx, job.id, inv.id);
    if (subtotal.greaterThan(held)) {
      throw conflict('Less retainage is held now than this release bills: delete it and draft the release again.');
    }
    if (subtotal.lessThan(held)) {
      throw conflict(
        `More retainage is held now (${held.toFixed(2)}) than this release bills: an application was issued after it was drafted. Delete it and draft the release again.`,
      );
    }
  }
  const isProgressJob = job.billing_method === 'progress' && (inv.kind === 'progress' || inv.kind === 'retainage');
  const credit = isProgressJob ? await progressDepositCredit(tx, job, subtotal, inv.kind === 'retainage', inv.id) : new Decimal(0);
  const total = subtotal.minus(credit);
  if (total.isNegative()) {
    throw conflict('This invoice comes to less than nothing: earlier invoices billed more than is earned. Correct the readings first.');
  }
  if (body.expectedTotal !== undefined && !total.equals(body.expectedTotal)) throw totalMoved(inv.kind, total, body.expectedTotal);
  const tax = taxInside(job, total, billedRows[0] as { billed: string; tax: string });
  const { settings } = billingSettingsOf(settingsRows as Array<{ settings: BillingSettings }>);
  const issuedOn = issueDate(job, body.issuedOn, now);
  const dueOn = dueDate(issuedOn, job.billing_terms.terms);
  const document = documentFrom(documentRows[0], job.billing_terms, settings);
  // The key of every label the system wrote, so each client reads the lines in their language (a
  // draft made before words were kept gets them here).
  const line = inv.line_role && inv.line_trigger ? { role: inv.line_role, trigger: inv.line_trigger } : null;
  const progress = progressWithWords(inv.progress);
  // First everything but what the firm's kept figures read (status, due date, total: cash's
  // triggers), with its schedule line marked invoiced; the number's statement last, so the counter
  // and the rows those triggers lock are taken only then.
  const frozen: SqlQuery = {
    name: 'invoice_issue_freeze',
    text: `with line as (update payment_schedule_lines set status = 'invoiced', updated_at = $8 where tenant_id = $1 and id = $11)
     update invoices set issued_on = $3, document = $4, deposit_credit = $5, tax_included = $6, issued_by = $7, issued_at = $8,
            updated_at = $8, lines = $9, progress = $10
      where tenant_id = $1 and id = $2`,
    values: [
      tx.tenantId,
      id,
      issuedOn,
      JSON.stringify(document),
      credit.toFixed(2),
      tax.toFixed(2),
      actor.userId,
      now,
      JSON.stringify(linesWithWords(inv.lines, line)),
      progress === null ? null : JSON.stringify(progress),
      inv.schedule_line_id,
    ],
  };
  const number = invoiceNumberQuery(
    tx.tenantId,
    id,
    settings.invoicePrefix,
    // Nothing due (no work this period, or all of it taken by the deposit credit): no payment can
    // follow, so it is paid as issued, never overdue nor reminded.
    { status: total.isZero() ? 'paid' : 'issued', dueOn, total: total.toFixed(2) },
    { actorUserId: actor.userId, actorKind: actor.kind },
  );
  // A deposit (or a release) issued on a progress-billed job changes what its open progress draft
  // credits, and an application what its open release bills: the queue refigures them once this commits
  // (a trip only for those, before the counter is taken).
  if (job.billing_method === 'progress') await enqueueBillingCheck(tx, deps.queue, job.id, { refreshDraft: true });
  return { writes: [frozen, number] };
}

/**
 * Issuing figures an application (and a release's deposit credit) again, so what it takes can differ
 * from the total the office confirmed (`expectedTotal`, from the issue dialog): nothing is issued then.
 * An application's draft can be figured again and confirmed; a release is drafted again.
 */
function totalMoved(kind: string, total: Decimal, expected: string) {
  const moved = `This invoice now comes to ${total.toFixed(2)}, not the ${new Decimal(expected).toFixed(2)} you confirmed: the job's figures changed since it was drafted.`;
  const message = `${moved} ${kind === 'progress' ? 'Check the new total, then issue it.' : 'Delete it and draft it again.'}`;
  return conflict(message, [{ field: 'expectedTotal', message }]);
}

/** The invoice with the schedule line it bills, locked (for update of the invoice alone). */
const lockInvoiceRead = (tenantId: string, id: string): SqlQuery => ({
  name: 'invoice_issue_lock',
  text: `select i.id, i.job_id, i.kind, i.status, i.schedule_line_id, i.subtotal::text as subtotal, i.lines, i.progress, i.period_end::text as period_end,
              l.role as line_role, l.trigger as line_trigger
         from invoices i left join payment_schedule_lines l on l.tenant_id = i.tenant_id and l.id = i.schedule_line_id
        where i.tenant_id = $1 and i.id = $2 for update of i`,
  values: [tenantId, id],
});

/** E-mails the just-numbered invoice through the outbox, with its audit entry. */
async function sendIssued(tx: TenantTx, deps: IssueDeps, actor: Actor, id: string, now: Date): Promise<void> {
  await enqueueInvoiceMail(tx, deps.queue, deps.config, id, { kind: 'issued' });
  await tx.client.query(`update invoices set sent_at = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, id, now]);
  await recordAudit(tx, { actorUserId: actor.userId, actorKind: actor.kind, action: 'invoice.sent', entity: 'invoice', entityId: id });
}

/**
 * The invoice's date: the firm's today unless the office gives one, which may go back a year before
 * billing started on the job (paperwork caught up, a job brought in from before) but not past
 * tomorrow (as work marks): an invoice dated ahead would take its number out of date order.
 */
function issueDate(job: BillingJob, asked: string | undefined, now: Date): string {
  const today = firmToday(job, now);
  if (asked === undefined) return today;
  const latest = addDays(today, 1);
  const earliest = yearBefore(job.billing_started_at ? firmToday(job, job.billing_started_at) : today);
  if (asked > latest) throw badRequest([{ field: 'issuedOn', message: `The invoice date cannot be later than ${longDate(latest)}.` }]);
  if (asked < earliest) {
    throw badRequest([
      {
        field: 'issuedOn',
        message: `The invoice date cannot be earlier than ${longDate(earliest)}, a year before billing started on this job.`,
      },
    ]);
  }
  return asked;
}
