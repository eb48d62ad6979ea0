import type { FieldProblem, InvoiceDraftCreate, InvoiceDraftUpdate } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { addDays, DomainInputError, valueLineWork, yearBefore } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, conflict, notFound } from '../http/problem';
import { type BillingJob, firmToday, loadBillingJob } from './billing-job';
import { longDate } from '../i18n/long-date';
import { draftLineInvoice, draftRetainageInvoice } from './drafts';
import { decimalsMessage, fitsCurrency } from './money';
import { billedWorkByLine, draftProgressInvoice, lastIssuedPeriodEnd, loadValueLines, percentOf } from './progress-invoice';

/** POST /api/jobs/:id/invoices: a draft the office asks for (a schedule line, a progress application, a retainage release). */
export async function createDraft(tx: TenantTx, actor: Actor, jobId: string, body: InvoiceDraftCreate, now: Date): Promise<string> {
  // The job's row lock first, the order the queue's trigger check and issuing take: a line drafted
  // here while the queue drafted it too once deadlocked (this took the line, then its invoice's
  // foreign key share-locked the job the queue held while it waited on the line).
  const job = await loadBillingJob(tx, jobId, true);
  switch (body.kind) {
    case 'line': {
      const line = await tx.client.query<{ job_id: string }>(`select job_id from payment_schedule_lines where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        body.scheduleLineId,
      ]);
      if (line.rows[0]?.job_id !== job.id) throw badRequest([{ field: 'scheduleLineId', message: 'No such line on this job.' }]);
      const made = await draftLineInvoice(tx, {
        lineId: body.scheduleLineId,
        origin: 'office',
        actor,
        today: firmToday(job, now),
        triggerText: null,
      });
      if (!made.isNew)
        throw conflict('This line already has its invoice.', [{ field: 'scheduleLineId', message: 'Open its invoice instead.' }]);
      return made.invoiceId;
    }
    case 'progress':
      await checkPeriodEnd(tx, job, body.periodEnd, now);
      return (await draftProgressInvoice(tx, { jobId: job.id, periodEnd: body.periodEnd, origin: 'office', actor })).invoiceId;
    case 'retainage':
      return (await draftRetainageInvoice(tx, { jobId: job.id, origin: 'office', actor })).invoiceId;
  }
}

/**
 * An application's period ends on or after the last issued one's (work is billed in order) and within
 * a year either side of the firm's today; otherwise 400 naming periodEnd.
 */
async function checkPeriodEnd(tx: TenantTx, job: BillingJob, periodEnd: string, now: Date): Promise<void> {
  const today = firmToday(job, now);
  const last = await lastIssuedPeriodEnd(tx, job.id);
  const latest = addDays(today, 366);
  const message =
    last !== null && periodEnd < last
      ? `The last application billed work up to ${longDate(last)}: this period ends on that day or later.`
      : periodEnd < yearBefore(today)
        ? `A period ends within a year of today: not before ${longDate(yearBefore(today))}.`
        : periodEnd > latest
          ? `A period ends within a year of today: not after ${longDate(latest)}.`
          : null;
  if (message) throw badRequest([{ field: 'periodEnd', message }]);
}

interface DraftRow {
  id: string;
  job_id: string;
  kind: string;
  status: string;
  period_end: string | null;
  schedule_line_id: string | null;
}

/** Locks the draft's job, then the draft (the order issuing and drafting take them in, so they never deadlock). */
async function lockDraft(tx: TenantTx, id: string): Promise<DraftRow> {
  const owner = await tx.client.query<{ job_id: string }>(`select job_id from invoices where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    id,
  ]);
  if (!owner.rows[0]) throw notFound('invoice');
  await loadBillingJob(tx, owner.rows[0].job_id, true);
  const { rows } = await tx.client.query<DraftRow>(
    `select id, job_id, kind, status, period_end::text as period_end, schedule_line_id from invoices where tenant_id = $1 and id = $2 for update`,
    [tx.tenantId, id],
  );
  if (!rows[0]) throw notFound('invoice');
  if (rows[0].status !== 'draft') throw conflict('An issued invoice never changes; void it to make a credit note.');
  return rows[0];
}

/**
 * PATCH /api/invoices/:id (drafts only). On a progress draft, `progressLines` are new readings from
 * the work: each updates its value line (percent complete to date, stored materials), is kept in the
 * job's history, and the draft is recomputed with the exact amounts typed.
 */
export async function updateDraft(tx: TenantTx, actor: Actor, id: string, body: InvoiceDraftUpdate, now: Date): Promise<void> {
  const draft = await lockDraft(tx, id);
  const isProgress = draft.kind === 'progress';
  if (!isProgress && (body.progressLines !== undefined || body.periodEnd !== undefined)) {
    throw badRequest([
      {
        field: body.progressLines !== undefined ? 'progressLines' : 'periodEnd',
        message: 'Only a progress invoice has a period and progress lines.',
      },
    ]);
  }
  if (body.notes !== undefined) {
    await tx.client.query(`update invoices set notes = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      id,
      body.notes,
      now,
    ]);
  }
  if (isProgress && (body.progressLines !== undefined || body.periodEnd !== undefined)) {
    const job = await loadBillingJob(tx, draft.job_id);
    const periodEnd = body.periodEnd ?? draft.period_end ?? firmToday(job, now);
    if (body.periodEnd !== undefined) await checkPeriodEnd(tx, job, body.periodEnd, now);
    // Readings typed on the invoice are kept in the job's history as of the period's end, or today when the
    // period ends later: dated ahead, they would outrank the crew's marks until then (isOlderThanRecorded).
    const readOn = periodEnd < firmToday(job, now) ? periodEnd : firmToday(job, now);
    const toDate = new Map<string, Decimal>();
    if (body.progressLines) {
      const lines = new Map((await loadValueLines(tx, job.id)).map((l) => [l.id, l]));
      const billed = await billedWorkByLine(tx, job.id);
      const problems: FieldProblem[] = [];
      const readings: Array<{ id: string; percent: Decimal; stored: string; work: Decimal }> = [];
      body.progressLines.forEach((p, i) => {
        const at = `progressLines[${i}]`;
        const line = lines.get(p.valueLineId);
        if (!line) return problems.push({ field: `${at}.valueLineId`, message: 'No such line in this job’s schedule of values.' });
        if (body.progressLines!.findIndex((q) => q.valueLineId === p.valueLineId) !== i) {
          return problems.push({ field: `${at}.valueLineId`, message: 'This line is listed twice.' });
        }
        const previousWork = billed.get(line.id) ?? new Decimal(0);
        let work: Decimal;
        try {
          const thisPeriod = valueLineWork({
            scheduledValue: line.scheduled_value,
            previousWork,
            currency: job.currency,
            ...('percent' in p.workToDate ? { percentToDate: p.workToDate.percent } : { amountToDate: p.workToDate.amount }),
          });
          work = previousWork.plus(thisPeriod);
        } catch (e) {
          if (!(e instanceof DomainInputError)) throw e;
          return problems.push({ field: `${at}.workToDate`, message: e.message });
        }
        if (!fitsCurrency(p.storedMaterials, job.currency)) {
          return problems.push({
            field: `${at}.storedMaterials`,
            message: decimalsMessage(job.currency),
          });
        }
        if (work.plus(p.storedMaterials).greaterThan(line.scheduled_value)) {
          return problems.push({
            field: `${at}.storedMaterials`,
            message: `Work to date and stored materials come to more than the scheduled value ${line.scheduled_value}.`,
          });
        }
        const percent = 'percent' in p.workToDate ? new Decimal(p.workToDate.percent) : percentOf(work, line.scheduled_value);
        readings.push({ id: line.id, percent, stored: p.storedMaterials, work });
      });
      if (problems.length) throw badRequest(problems);
      for (const r of readings) {
        const line = lines.get(r.id)!;
        toDate.set(r.id, r.work);
        if (!r.percent.equals(line.percent_complete)) {
          await tx.client.query(`update job_value_lines set percent_complete = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
            tx.tenantId,
            r.id,
            r.percent.toString(),
            now,
          ]);
          await tx.client.query(
            `insert into job_progress (tenant_id, job_id, kind, value_line_id, value, happened_on, actor_user_id, note)
             values ($1, $2, 'valuePercent', $3, $4, $5, $6, 'From the progress invoice')`,
            [tx.tenantId, job.id, r.id, r.percent.toString(), readOn, actor.userId],
          );
        }
        if (!new Decimal(r.stored).equals(line.stored_materials)) {
          await tx.client.query(`update job_value_lines set stored_materials = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
            tx.tenantId,
            r.id,
            r.stored,
            now,
          ]);
          await tx.client.query(
            `insert into job_progress (tenant_id, job_id, kind, value_line_id, value, happened_on, actor_user_id, note)
             values ($1, $2, 'storedMaterials', $3, $4, $5, $6, 'From the progress invoice')`,
            [tx.tenantId, job.id, r.id, r.stored, readOn, actor.userId],
          );
        }
      }
    }
    await draftProgressInvoice(tx, { jobId: job.id, periodEnd, origin: 'office', actor, toDate });
  }
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.updated',
    entity: 'invoice',
    entityId: id,
    data: { fields: Object.keys(body).filter((k) => body[k as keyof InvoiceDraftUpdate] !== undefined) },
  });
}

/** DELETE /api/invoices/:id (drafts only): its schedule line goes back to waiting for its trigger. */
export async function deleteDraft(tx: TenantTx, actor: Actor, id: string, now: Date): Promise<void> {
  const draft = await lockDraft(tx, id);
  await tx.client.query(`delete from invoices where tenant_id = $1 and id = $2`, [tx.tenantId, id]);
  if (draft.schedule_line_id) {
    await tx.client.query(`update payment_schedule_lines set status = 'scheduled', updated_at = $3 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      draft.schedule_line_id,
      now,
    ]);
  }
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'invoice.deleted',
    entity: 'invoice',
    entityId: id,
    data: { kind: draft.kind, jobId: draft.job_id },
  });
}
