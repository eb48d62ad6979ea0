import type { ProgressTable } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { computePayApplication, DomainInputError, minorUnitDigits, type PayApplication, valueLineWork } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { conflict } from '../http/problem';
import { assertBillingStarted, invoiceTax, LIVE_ISSUED, loadBillingJob, type StartedJob } from './billing-job';
import { progressDepositCredit } from './drafts';

/** Work billed per value line on the job's issued non-void progress invoices (their `progress` JSON is the record). */
export async function billedWorkByLine(tx: TenantTx, jobId: string): Promise<Map<string, Decimal>> {
  const { rows } = await tx.client.query<{ id: string; billed: string }>(
    `select l->>'valueLineId' as id, sum((l->>'thisPeriodWork')::numeric)::text as billed
       from invoices i, jsonb_array_elements(i.progress->'lines') l
      where i.tenant_id = $1 and i.job_id = $2 and i.kind = 'progress' and i.${LIVE_ISSUED}
      group by 1`,
    [tx.tenantId, jobId],
  );
  return new Map(rows.map((r) => [r.id, new Decimal(r.billed)]));
}

export interface ValueLineRow {
  id: string;
  position: number;
  label: string;
  scheduled_value: string;
  change_order_id: string | null;
  percent_complete: string;
  stored_materials: string;
}

export async function loadValueLines(tx: TenantTx, jobId: string): Promise<ValueLineRow[]> {
  const { rows } = await tx.client.query<ValueLineRow>(
    `select id, position, label, scheduled_value::text as scheduled_value, change_order_id, trim_scale(percent_complete)::text as percent_complete,
            stored_materials::text as stored_materials
       from job_value_lines where tenant_id = $1 and job_id = $2 order by position, created_at`,
    [tx.tenantId, jobId],
  );
  return rows;
}

/** A reading's percent complete for an amount of work to date: 4 decimals, as job_value_lines keeps it. */
export function percentOf(workToDate: Decimal, scheduledValue: string): Decimal {
  const scheduled = new Decimal(scheduledValue);
  return scheduled.isZero() ? new Decimal(0) : workToDate.div(scheduled).times(100).toDecimalPlaces(4, Decimal.ROUND_HALF_UP);
}

export interface ProgressFigures {
  table: ProgressTable;
  application: PayApplication;
  subtotal: Decimal;
  depositCredit: Decimal;
  total: Decimal;
  tax: Decimal;
}

/**
 * The application for a progress draft: per value line work to date from the latest reading (or the
 * exact amount the office typed: `toDate`), previous work from issued applications, retainage by the
 * job's terms, computed by computePayApplication; then the deposit credit and the tax inside.
 * Work never goes below what was billed (a lower reading bills nothing this period).
 */
export async function progressFigures(
  tx: TenantTx,
  job: StartedJob,
  periodEnd: string,
  draftId: string | null,
  toDate: ReadonlyMap<string, Decimal>,
): Promise<ProgressFigures> {
  const digits = minorUnitDigits(job.currency);
  const lines = await loadValueLines(tx, job.id);
  if (lines.length === 0)
    throw conflict('This job has no schedule of values yet.', [{ field: 'valueLines', message: 'Add its lines first.' }]);
  const billed = await billedWorkByLine(tx, job.id);
  const previous = await tx.client.query<{ earned: string | null; retainage: string | null }>(
    `select progress->'summary'->>'earnedLessRetainage' as earned, progress->'summary'->>'retainage' as retainage from invoices
      where tenant_id = $1 and job_id = $2 and kind = 'progress' and ${LIVE_ISSUED} order by issued_at desc, number desc limit 1`,
    [tx.tenantId, job.id],
  );
  const inputs = lines.map((l) => {
    const previousWork = billed.get(l.id) ?? new Decimal(0);
    let thisPeriod: Decimal;
    try {
      const given = toDate.get(l.id);
      thisPeriod = valueLineWork({
        scheduledValue: l.scheduled_value,
        previousWork,
        currency: job.currency,
        ...(given ? { amountToDate: given.toFixed(digits) } : { percentToDate: l.percent_complete }),
      });
    } catch (e) {
      if (!(e instanceof DomainInputError)) throw e;
      thisPeriod = new Decimal(0);
    }
    return {
      id: l.id,
      label: l.label,
      scheduledValue: l.scheduled_value,
      previousWork,
      thisPeriodWork: thisPeriod,
      storedMaterials: l.stored_materials,
    };
  });
  const r = job.billing_terms.retainage;
  const share = (p: number) => new Decimal(p).div(100);
  const app = payApplication({
    currency: job.currency,
    originalContractSum: job.original_contract_sum,
    // The job's contract sum already carries every approved change order; their net is one change here.
    changeOrders: [
      {
        id: 'approved',
        number: 0,
        description: '',
        amount: new Decimal(job.contract_sum).minus(job.original_contract_sum),
        status: 'approved',
      },
    ],
    lines: inputs,
    retainage: {
      work: share(r.workPercent),
      stored: share(r.storedPercent),
      ...(r.stopAtPercentComplete === null ? {} : { stopAtShareComplete: share(r.stopAtPercentComplete) }),
    },
    previousCertified: previous.rows[0]?.earned ?? '0',
  });
  const subtotal = app.summary.currentDue;
  // A release issued before this application already billed part of the retainage on its work.
  const released = new Decimal(
    (
      await tx.client.query<{ released: string }>(
        `select coalesce(sum(subtotal), 0)::text as released from invoices
          where tenant_id = $1 and job_id = $2 and kind = 'retainage' and ${LIVE_ISSUED}`,
        [tx.tenantId, job.id],
      )
    ).rows[0].released,
  );
  const credit = await progressDepositCredit(tx, job, subtotal, false, draftId);
  const total = subtotal.minus(credit);
  const tax = await invoiceTax(tx, job, total, draftId);
  const m = (d: Decimal) => d.toFixed(digits);
  const pct = (d: Decimal) => d.times(100).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toString();
  const s = app.summary;
  const table: ProgressTable = {
    periodEnd,
    lines: app.lines.map((l) => ({
      valueLineId: l.id,
      label: l.label,
      scheduledValue: m(l.scheduledValue),
      previousWork: m(l.previousWork),
      thisPeriodWork: m(l.thisPeriodWork),
      storedMaterials: m(l.storedMaterials),
      completedToDate: m(l.completedAndStored),
      percentComplete: pct(l.shareComplete),
      balanceToFinish: m(l.balanceToFinish),
      retainage: m(l.retainage),
    })),
    retainageRates: { workPercent: r.workPercent, storedPercent: r.storedPercent, stopAtPercentComplete: r.stopAtPercentComplete },
    summary: {
      originalContractSum: m(s.originalContractSum),
      changeOrders: m(s.netChangeOrders),
      contractSumToDate: m(s.contractSumToDate),
      completedToDate: m(s.completedAndStoredToDate),
      retainage: m(s.retainage),
      // what this period kept back: the retainage to date less the last application's
      retainageThisPeriod: m(s.retainage.minus(previous.rows[0]?.retainage ?? '0')),
      earnedLessRetainage: m(s.earnedLessRetainage),
      previouslyBilled: m(s.previousCertified),
      dueThisPeriod: m(s.currentDue),
      ...(released.isZero() ? {} : { retainageReleased: m(released) }),
      balanceToFinishWithRetainage: m(s.balanceToFinishWithRetainage.minus(released)),
    },
  };
  return { table, application: app, subtotal, depositCredit: credit, total, tax };
}

/** The domain's arithmetic; a schedule of values that does not tie out is the office's to fix (409 naming it). */
function payApplication(input: Parameters<typeof computePayApplication>[0]): PayApplication {
  try {
    return computePayApplication(input);
  } catch (e) {
    if (!(e instanceof DomainInputError)) throw e;
    throw conflict(`The schedule of values does not tie out: ${e.message}`, [{ field: 'valueLines', message: e.message }]);
  }
}

/** Work to date per line of an existing draft, kept when the line's reading still says the same percent (so a typed amount survives a refresh). */
function keptAmounts(draft: ProgressTable | null, lines: readonly ValueLineRow[]): Map<string, Decimal> {
  const kept = new Map<string, Decimal>();
  if (!draft) return kept;
  const byId = new Map(lines.map((l) => [l.id, l]));
  for (const d of draft.lines) {
    const line = byId.get(d.valueLineId);
    // compared as numbers: the table holds the currency's digits ("10000000" for yen), the column two ("10000000.00")
    if (!line || !new Decimal(line.scheduled_value).equals(d.scheduledValue)) continue;
    const work = new Decimal(d.previousWork).plus(d.thisPeriodWork);
    if (percentOf(work, line.scheduled_value).equals(line.percent_complete)) kept.set(d.valueLineId, work);
  }
  return kept;
}

/** The day the job's last issued application billed work up to, or null before the first. */
export async function lastIssuedPeriodEnd(tx: TenantTx, jobId: string): Promise<string | null> {
  const { rows } = await tx.client.query<{ last: string | null }>(
    `select max(period_end)::text as last from invoices where tenant_id = $1 and job_id = $2 and kind = 'progress' and ${LIVE_ISSUED}`,
    [tx.tenantId, jobId],
  );
  return rows[0]?.last ?? null;
}

export interface ProgressDraftRequest {
  readonly jobId: string;
  /**
   * the last day of the period billed; from the queue (a mark's day) it only moves a period forward: never
   * before the open draft's, nor the last issued application's
   */
  readonly periodEnd: string;
  readonly origin: 'office' | 'queue';
  readonly actor: Actor;
  /** exact work to date per value line, as the office typed it (PATCH) */
  readonly toDate?: ReadonlyMap<string, Decimal>;
}

/**
 * Drafts, or refreshes, the job's one open progress invoice from the value lines' latest readings:
 * the job's row lock makes two marks (or two workers) end with one draft. Never issues.
 */
export async function draftProgressInvoice(tx: TenantTx, request: ProgressDraftRequest): Promise<{ invoiceId: string; isNew: boolean }> {
  const job = await loadBillingJob(tx, request.jobId, true);
  assertBillingStarted(job);
  if (job.billing_method !== 'progress') {
    throw conflict('This job is billed by its payment schedule, not by progress.', [
      { field: 'kind', message: 'Bill its schedule lines.' },
    ]);
  }
  const open = (
    await tx.client.query<{ id: string; progress: ProgressTable | null; period_end: string | null }>(
      `select id, progress, period_end::text as period_end from invoices
        where tenant_id = $1 and job_id = $2 and kind = 'progress' and status = 'draft' for update`,
      [tx.tenantId, job.id],
    )
  ).rows[0];
  let periodEnd = request.periodEnd;
  if (request.origin === 'queue') {
    // The queue moves a period forward to the mark's day, never back: not before the period the office
    // gave the open draft, nor before the last issued application's.
    for (const day of [open?.period_end ?? null, await lastIssuedPeriodEnd(tx, job.id)])
      if (day !== null && day > periodEnd) periodEnd = day;
  }
  const lines = await loadValueLines(tx, job.id);
  const toDate = new Map([...keptAmounts(open?.progress ?? null, lines), ...(request.toDate ?? new Map<string, Decimal>())]);
  const f = await progressFigures(tx, job, periodEnd, open?.id ?? null, toDate);
  const values = [
    f.subtotal.toFixed(2),
    f.depositCredit.toFixed(2),
    f.application.summary.retainage.toFixed(2),
    f.tax.toFixed(2),
    f.total.toFixed(2),
    JSON.stringify(f.table),
    periodEnd,
  ];
  if (open) {
    await tx.client.query(
      `update invoices set subtotal = $3, deposit_credit = $4, retainage_held = $5, tax_included = $6, total = $7, progress = $8, period_end = $9,
              updated_at = now()
        where tenant_id = $1 and id = $2`,
      [tx.tenantId, open.id, ...values],
    );
    return { invoiceId: open.id, isNew: false };
  }
  const { rows } = await tx.client.query<{ id: string }>(
    `insert into invoices (tenant_id, job_id, client_id, kind, currency, subtotal, deposit_credit, retainage_held, tax_included, total, progress,
                           period_end, origin, created_by)
     values ($1, $2, $3, 'progress', $4, $5, $6, $7, $8, $9, $10, $11, $12, $13) returning id`,
    [tx.tenantId, job.id, job.client_id, job.currency, ...values, request.origin, request.actor.userId],
  );
  await recordAudit(tx, {
    actorUserId: request.actor.userId,
    actorKind: request.actor.kind,
    action: 'invoice.drafted',
    entity: 'invoice',
    entityId: rows[0].id,
    data: { origin: request.origin, kind: 'progress', periodEnd, total: f.total.toFixed(2) },
  });
  return { invoiceId: rows[0].id, isNew: true };
}

/**
 * After another invoice of a progress-billed job is issued or voided — a deposit to credit, a period
 * no longer billed — or a change order or an edit moves its contract sum or value lines, the queue refigures the open progress draft (evaluateJobBilling's
 * `refreshDraft`), its period and typed amounts kept, so the office never reads a stale total; a
 * changed total is in the job's history. Throws as draftProgressInvoice does (a schedule of values
 * that no longer ties out: 409, before anything is written).
 */
export async function refreshOpenProgressDraft(tx: TenantTx, jobId: string, actor: Actor): Promise<void> {
  const open = (
    await tx.client.query<{ id: string; period_end: string; total: string }>(
      `select id, period_end::text as period_end, total::text as total from invoices
        where tenant_id = $1 and job_id = $2 and kind = 'progress' and status = 'draft'`,
      [tx.tenantId, jobId],
    )
  ).rows[0];
  if (!open) return;
  await draftProgressInvoice(tx, { jobId, periodEnd: open.period_end, origin: 'queue', actor });
  const { rows } = await tx.client.query<{ total: string }>(`select total::text as total from invoices where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    open.id,
  ]);
  if (rows[0].total === open.total) return;
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.updated',
    entity: 'invoice',
    entityId: open.id,
    data: {
      kind: 'progress',
      refigured: 'the job’s other invoices, contract sum or schedule of values changed',
      totalBefore: open.total,
      total: rows[0].total,
    },
  });
}

/**
 * A progress application about to be issued, figured afresh for its own period with its typed work
 * kept (the issuer holds the job's lock): answers the subtotal and table to freeze. A changed total is
 * in the invoice's trail, so the office can see why the issued figure differs from the draft it read.
 */
export async function refigureDraftForIssue(
  tx: TenantTx,
  jobId: string,
  draft: { readonly id: string; readonly periodEnd: string },
  actor: Actor,
): Promise<{ subtotal: string; progress: ProgressTable | null }> {
  const read = async () =>
    (
      await tx.client.query<{ subtotal: string; total: string; progress: ProgressTable | null }>(
        `select subtotal::text as subtotal, total::text as total, progress from invoices where tenant_id = $1 and id = $2`,
        [tx.tenantId, draft.id],
      )
    ).rows[0];
  const before = await read();
  await draftProgressInvoice(tx, { jobId, periodEnd: draft.periodEnd, origin: 'office', actor });
  const after = await read();
  if (after.total !== before.total) {
    await recordAudit(tx, {
      actorUserId: actor.userId,
      actorKind: actor.kind,
      action: 'invoice.updated',
      entity: 'invoice',
      entityId: draft.id,
      data: { kind: 'progress', refigured: 'figured again as it was issued', totalBefore: before.total, total: after.total },
    });
  }
  return { subtotal: after.subtotal, progress: after.progress };
}
