import type { BillingMethod, BillingTerms, JobStatus } from '@layerbook/contracts';
import type { SqlQuery, TenantTx } from '@layerbook/db';
import { includedTax } from '@layerbook/domain';
import type Decimal from 'decimal.js';
import { localDate } from '../firms/local-date';
import { conflict, notFound } from '../http/problem';
import { billingTermsFor, loadBillingSettings } from './settings';

/** A job's row as billing reads it, with its firm's time zone. */
export interface BillingJob {
  id: string;
  client_id: string;
  site_id: string;
  title: string;
  currency: string;
  contract_sum: string;
  original_contract_sum: string;
  contract_tax: string;
  billing_method: BillingMethod;
  billing_terms: BillingTerms | null;
  billing_started_at: Date | null;
  walkthrough_on: string | null;
  finish_date: string | null;
  proposal_version_id: string;
  accepted_variant_id: string;
  status: JobStatus;
  time_zone: string;
}

const JOB_COLUMNS = `j.id, j.client_id, j.site_id, j.title, j.currency, j.contract_sum::text as contract_sum,
            j.original_contract_sum::text as original_contract_sum, j.contract_tax::text as contract_tax, j.billing_method,
            j.billing_terms, j.billing_started_at, j.walkthrough_on::text as walkthrough_on, j.finish_date::text as finish_date,
            j.proposal_version_id, j.accepted_variant_id, j.status, f.time_zone`;

/** Loads a job (404 when it is not this firm's); `lock` takes its row lock, so billing writes on one job go one at a time. */
export async function loadBillingJob(tx: TenantTx, jobId: string, lock = false): Promise<BillingJob> {
  const { rows } = await tx.client.query<BillingJob>(
    `select ${JOB_COLUMNS}
       from jobs j join firms f on f.id = j.tenant_id
      where j.tenant_id = $1 and j.id = $2 ${lock ? 'for update of j' : ''}`,
    [tx.tenantId, jobId],
  );
  if (!rows[0]) throw notFound('job');
  return rows[0];
}

/**
 * The job an invoice ($2) bills (loadBillingJob's row, found through the invoice in the same
 * statement), for a batch of statements; `lock` takes the job's row lock. No row: no such invoice.
 */
export const jobOfInvoiceRead = (tenantId: string, invoiceId: string, lock = false): SqlQuery => ({
  name: lock ? 'billing_lock_job_of_invoice' : 'billing_job_of_invoice',
  text: `select ${JOB_COLUMNS}
       from jobs j join firms f on f.id = j.tenant_id
      where j.tenant_id = $1 and j.id = (select job_id from invoices where tenant_id = $1 and id = $2) ${lock ? 'for update of j' : ''}`,
  values: [tenantId, invoiceId],
});

/** The terms a job bills by: its own copy once billing started, the firm's current ones before. */
export async function termsOf(tx: TenantTx, job: BillingJob): Promise<BillingTerms> {
  if (job.billing_terms) return job.billing_terms;
  const { settings } = await loadBillingSettings(tx);
  return billingTermsFor(settings, job.contract_sum, job.currency);
}

/** A job whose billing has started: it carries its own terms. */
export type StartedJob = BillingJob & { billing_terms: BillingTerms };

export function assertBillingStarted(job: BillingJob): asserts job is StartedJob {
  refuseCancelledJob(job);
  if (!job.billing_started_at || !job.billing_terms) {
    throw conflict('Start billing for this job first (confirm its schedule).');
  }
}

/** A cancelled job bills nothing more and its schedule and change orders stay as they are (409). */
export function refuseCancelledJob(job: Pick<BillingJob, 'status'>): void {
  if (job.status === 'cancelled') throw conflict('This job was cancelled: nothing more is billed or changed on it.');
}

export const firmToday = (job: Pick<BillingJob, 'time_zone'>, now: Date): string => localDate(job.time_zone, now);

/** Issued invoices of the job that still count (not drafts, not void). */
export const LIVE_ISSUED = `status in ('issued', 'part_paid', 'paid', 'refunded')`;

/** What the job's issued non-void invoices billed and the tax inside it, but for one invoice ($3, or null): read by invoiceTax. */
export const billedBeforeRead = (tenantId: string, jobId: string, exceptInvoiceId: string | null): SqlQuery => ({
  name: 'billing_job_billed_before',
  text: `select coalesce(sum(total), 0)::text as billed, coalesce(sum(tax_included), 0)::text as tax
       from invoices where tenant_id = $1 and job_id = $2 and ${LIVE_ISSUED} and id is distinct from $3::uuid`,
  values: [tenantId, jobId, exceptInvoiceId],
});

/** billedBeforeRead for the job of the invoice ($2), leaving that invoice out. */
export const billedBeforeReadOfInvoice = (tenantId: string, invoiceId: string): SqlQuery => ({
  name: 'billing_job_billed_before_invoice',
  text: `select coalesce(sum(total), 0)::text as billed, coalesce(sum(tax_included), 0)::text as tax
       from invoices where tenant_id = $1 and job_id = (select job_id from invoices where tenant_id = $1 and id = $2)
        and ${LIVE_ISSUED} and id <> $2`,
  values: [tenantId, invoiceId],
});

/** The tax inside `amount` from billedBeforeRead's row (see invoiceTax). */
export const taxInside = (job: BillingJob, amount: Decimal | string, billedBefore: { billed: string; tax: string }): Decimal =>
  includedTax({
    amount,
    contractSum: job.contract_sum,
    contractTax: job.contract_tax,
    billedBefore: billedBefore.billed,
    taxBilledBefore: billedBefore.tax,
    currency: job.currency,
  });

/**
 * The tax inside `amount` (contract sums include tax): the invoice's share of the contract's tax,
 * the invoice that closes the contract taking the rest, over the job's issued non-void invoices.
 */
export async function invoiceTax(
  tx: TenantTx,
  job: BillingJob,
  amount: Decimal | string,
  exceptInvoiceId: string | null,
): Promise<Decimal> {
  const read = billedBeforeRead(tx.tenantId, job.id, exceptInvoiceId);
  const { rows } = await tx.client.query<{ billed: string; tax: string }>(read.text, [...read.values]);
  return taxInside(job, amount, rows[0]);
}
