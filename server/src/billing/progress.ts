import type { JobProgressView, Language, ProgressMark } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { addDays, DomainInputError, minorUnitDigits, valueLineWork, yearBefore } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import { localDate } from '../firms/local-date';
import type { Actor } from '../http/actor';
import { badRequest, conflict, forbidden, notFound } from '../http/problem';
import type { JobQueue } from '../queue/job-queue';
import { decimalsMessage, fitsCurrency } from './money';
import { enqueueBillingCheck } from './triggers/enqueue';
import { countsTowardLineSql, ensureJobWork, loadWorkItems } from './work-items';
import { longDate } from '../i18n/long-date';
import { localeOf, translator, type Translate } from '../i18n/catalog';

interface JobRow {
  id: string;
  status: string;
  currency: string;
  walkthrough_on: string | null;
  accepted_on: string;
  today: string;
}

/** The job with the firm's today and its acceptance day, both in the firm's zone; 404 when another firm's or none. */
async function loadJob(tx: TenantTx, jobId: string, now: Date, lock: boolean): Promise<JobRow> {
  const { rows } = await tx.client.query<Omit<JobRow, 'today' | 'accepted_on'> & { time_zone: string; created_at: Date }>(
    `select j.id, j.status, j.currency, j.walkthrough_on::text as walkthrough_on, j.created_at, f.time_zone
       from jobs j join firms f on f.id = j.tenant_id where j.tenant_id = $1 and j.id = $2 ${lock ? 'for update of j' : ''}`,
    [tx.tenantId, jobId],
  );
  const row = rows[0];
  if (!row) throw notFound('job');
  return { ...row, accepted_on: localDate(row.time_zone, row.created_at), today: localDate(row.time_zone, now) };
}

/** The work to mark and how far it is, without money (crew read it). */
export async function loadProgress(tx: TenantTx, jobId: string, now: Date): Promise<JobProgressView> {
  const job = await loadJob(tx, jobId, now, false);
  await ensureJobWork(tx, jobId);
  return progressView(tx, job.id);
}

async function progressView(tx: TenantTx, jobId: string): Promise<JobProgressView> {
  const { rows: job } = await tx.client.query<{ walkthrough_on: string | null }>(
    `select walkthrough_on::text as walkthrough_on from jobs where tenant_id = $1 and id = $2`,
    [tx.tenantId, jobId],
  );
  const { rows: valueLines } = await tx.client.query<JobProgressView['valueLines'][number]>(
    `select id, position, label, trim_scale(percent_complete)::text as "percentComplete"
       from job_value_lines where tenant_id = $1 and job_id = $2 order by position, created_at`,
    [tx.tenantId, jobId],
  );
  return { workItems: await loadWorkItems(tx, jobId), walkthroughOn: job[0]?.walkthrough_on ?? null, valueLines };
}

/** Work billed so far on a value line: the sum of this-period work on the job's issued, not voided, progress invoices. */
async function billedWork(tx: TenantTx, jobId: string, valueLineId: string): Promise<string> {
  const { rows } = await tx.client.query<{ billed: string }>(
    `select coalesce(sum((l->>'thisPeriodWork')::numeric), 0)::text as billed
       from invoices i cross join lateral jsonb_array_elements(coalesce(i.progress->'lines', '[]'::jsonb)) l
      where i.tenant_id = $1 and i.job_id = $2 and i.kind = 'progress' and i.status in ('issued', 'part_paid', 'paid', 'refunded')
        and l->>'valueLineId' = $3`,
    [tx.tenantId, jobId, valueLineId],
  );
  return rows[0]?.billed ?? '0';
}

interface ValueLineRow {
  id: string;
  label: string;
  scheduled_value: string;
  percent_complete: string;
  stored_materials: string;
}

async function valueLine(tx: TenantTx, jobId: string, id: string): Promise<ValueLineRow> {
  const { rows } = await tx.client.query<ValueLineRow>(
    `select id, label, scheduled_value::text as scheduled_value, trim_scale(percent_complete)::text as percent_complete,
            stored_materials::text as stored_materials
       from job_value_lines where tenant_id = $1 and job_id = $2 and id = $3`,
    [tx.tenantId, jobId, id],
  );
  if (!rows[0]) throw badRequest([{ field: 'valueLineId', message: 'Choose a line of this job’s schedule of values.' }]);
  return rows[0];
}

async function workItem(tx: TenantTx, jobId: string, id: string): Promise<{ id: string }> {
  const { rows } = await tx.client.query<{ id: string }>(`select id from job_work_items where tenant_id = $1 and job_id = $2 and id = $3`, [
    tx.tenantId,
    jobId,
    id,
  ]);
  if (!rows[0]) throw badRequest([{ field: 'workItemId', message: 'Choose a layer on a surface of this job.' }]);
  return rows[0];
}

/**
 * A reading on a value line must leave the line billable: billed work never goes down (the percent
 * may not fall below what issued progress invoices billed), and work done plus materials stored
 * never passes the line's scheduled value (DOMAIN.md §2.10: G ≤ C; more is a change order).
 */
function checkValueLine(
  mark: ProgressMark,
  line: { scheduled_value: string; percent_complete: string; stored_materials: string },
  billed: string,
  currency: string,
  showsMoney: boolean,
): void {
  const digits = minorUnitDigits(currency);
  const scheduled = new Decimal(line.scheduled_value);
  const workAt = (percent: number | string) =>
    valueLineWork({ scheduledValue: line.scheduled_value, percentToDate: percent, previousWork: '0', currency });
  if (mark.kind === 'valuePercent') {
    try {
      valueLineWork({ scheduledValue: line.scheduled_value, percentToDate: mark.percentComplete, previousWork: billed, currency });
    } catch (error) {
      if (!(error instanceof DomainInputError)) throw error;
      // The crew may mark a percent but never read amounts: the domain's words name what is billed.
      const message = showsMoney ? error.message : 'This is less than is already billed on this line; billed work never goes down.';
      throw badRequest([{ field: 'percentComplete', message }]);
    }
    const stored = new Decimal(line.stored_materials);
    if (workAt(mark.percentComplete).plus(stored).greaterThan(scheduled)) {
      throw badRequest([
        {
          field: 'percentComplete',
          message: showsMoney
            ? `With ${stored.toFixed(digits)} of materials stored, work done and stored would pass the line's value ${scheduled.toFixed(digits)}: lower the stored materials first.`
            : "With the materials stored on this line, work done and stored would pass the line's value: the office lowers the stored materials first.",
        },
      ]);
    }
  } else if (mark.kind === 'storedMaterials') {
    if (!fitsCurrency(mark.amount, currency)) throw badRequest([{ field: 'amount', message: decimalsMessage(currency) }]);
    const room = scheduled.minus(workAt(line.percent_complete));
    if (new Decimal(mark.amount).greaterThan(room)) {
      throw badRequest([
        { field: 'amount', message: `At most ${room.toFixed(digits)} can be stored on this line: its value less the work done.` },
      ]);
    }
  }
}

/**
 * A layer whose stage payment is invoiced (issued, not voided) stays done: the invoice says the work
 * was done. The office voids the invoice first if it was not; the crew, who never read billing, ask
 * the office. A change order's layer approved after that invoice was made is not what it billed
 * (countsTowardLine). A draft is no bar: the billing check withdraws the queue's own.
 */
async function refuseReopeningBilled(tx: TenantTx, workItemId: string, isCrew: boolean, say: Words): Promise<void> {
  const { rows } = await tx.client.query<{ number_text: string }>(
    `select i.number_text
       from job_work_items w
       join payment_schedule_lines l on l.tenant_id = w.tenant_id and l.job_id = w.job_id
                                    and l.trigger->>'kind' = 'layerComplete' and l.trigger->>'layerId' = w.layer_id
       join invoices i on i.tenant_id = l.tenant_id and i.schedule_line_id = l.id and i.status not in ('draft', 'void')
      where w.tenant_id = $1 and w.id = $2 and ${countsTowardLineSql('w', 'l.id')}
      order by i.number limit 1`,
    [tx.tenantId, workItemId],
  );
  const invoice = rows[0]?.number_text;
  if (!invoice) return;
  const message = isCrew ? say.t('progress.billedForCrew') : say.t('progress.billed', { invoice });
  throw conflict(message, [{ field: 'workItemId', message }]);
}

/** Whether a mark for the same thing (a layer on a surface, a value line's percent or stored materials, the walkthrough) is dated after this one. */
async function isOlderThanRecorded(
  tx: TenantTx,
  jobId: string,
  mark: ProgressMark,
  target: { workItemId: string | null; valueLineId: string | null },
  progressId: string,
): Promise<boolean> {
  const same =
    mark.kind === 'layerDone' || mark.kind === 'layerReopened'
      ? { cond: `work_item_id = $4 and kind in ('layerDone', 'layerReopened')`, id: target.workItemId }
      : mark.kind === 'walkthrough'
        ? { cond: `job_id = $4 and kind = 'walkthrough'`, id: jobId }
        : { cond: `value_line_id = $4 and kind = '${mark.kind}'`, id: target.valueLineId };
  const { rowCount } = await tx.client.query(
    `select 1 from job_progress where tenant_id = $1 and id <> $2 and happened_on > $3::date and ${same.cond} limit 1`,
    [tx.tenantId, progressId, mark.on, same.id],
  );
  return (rowCount ?? 0) > 0;
}

/** The reader's words for what a crew member may be refused (their language, dates for the firm's country). */
export interface Words {
  readonly t: Translate;
  readonly locale: string;
}
const ENGLISH: Words = { t: translator('en'), locale: 'en-US' };

/** The words of the person marking: a crew member reading Spanish is refused in Spanish. */
export const wordsOf = (staff: { readonly language: Language; readonly country: string }): Words => ({
  t: translator(staff.language),
  locale: localeOf(staff.language, staff.country),
});

/**
 * Records one mark from the work and applies it: a layer done or reopened on a surface, a
 * percent complete or materials stored on a value line, the walkthrough held. The history row,
 * the change and the request to check billing triggers commit together. A mark sent again with
 * the same `clientKey` (a phone back online) changes nothing and answers the same.
 */
export async function recordProgress(
  tx: TenantTx,
  queue: JobQueue,
  actor: Actor,
  jobId: string,
  mark: ProgressMark,
  now: Date,
  say: Words = ENGLISH,
): Promise<JobProgressView> {
  const job = await loadJob(tx, jobId, now, true);
  const isCrew = actor.kind === 'staff' && actor.role === 'crew';
  if (isCrew && mark.kind === 'storedMaterials') {
    throw forbidden('Stored materials are an amount of money: the office records them.');
  }
  // The walkthrough is the office's: it may draft the final invoice, and the crew sheet does not offer it.
  if (isCrew && mark.kind === 'walkthrough') throw forbidden('The office records the final walkthrough.');
  if (mark.clientKey !== undefined) {
    // Sent again (a phone back online): the first one counted; answer the same, whatever changed since.
    // The job's row lock above makes a second copy wait here until the first has committed.
    const { rows: seen } = await tx.client.query<{ job_id: string }>(
      `select job_id from job_progress where tenant_id = $1 and client_key = $2`,
      [tx.tenantId, mark.clientKey],
    );
    if (seen[0] && seen[0].job_id !== jobId) {
      throw conflict('This mark’s key was already used for another job.', [
        { field: 'clientKey', message: 'Use a new key for each mark.' },
      ]);
    }
    if (seen[0]) return progressView(tx, jobId);
  }
  if (job.status === 'cancelled') throw conflict(say.t('progress.cancelled'));
  // Finished means the work is done: layers and percents stay as they are until the office reopens the job.
  // The walkthrough comes after finishing, and stored materials may still need taking down to nothing.
  if (job.status === 'complete' && (mark.kind === 'layerDone' || mark.kind === 'layerReopened' || mark.kind === 'valuePercent')) {
    throw conflict(say.t('progress.finished'));
  }
  const latest = addDays(job.today, 1);
  const earliest = yearBefore(job.accepted_on);
  if (mark.on > latest) throw badRequest([{ field: 'on', message: say.t('progress.tooLate', { day: longDate(latest, say.locale) }) }]);
  if (mark.on < earliest) throw badRequest([{ field: 'on', message: say.t('progress.tooEarly', { day: longDate(earliest, say.locale) }) }]);
  await ensureJobWork(tx, jobId);

  const line = mark.kind === 'valuePercent' || mark.kind === 'storedMaterials' ? await valueLine(tx, jobId, mark.valueLineId) : null;
  const target = {
    workItemId: mark.kind === 'layerDone' || mark.kind === 'layerReopened' ? (await workItem(tx, jobId, mark.workItemId)).id : null,
    valueLineId: line?.id ?? null,
  };
  if (mark.kind === 'layerReopened' && target.workItemId) await refuseReopeningBilled(tx, target.workItemId, isCrew, say);
  const value = mark.kind === 'valuePercent' ? String(mark.percentComplete) : mark.kind === 'storedMaterials' ? mark.amount : null;

  if (line) {
    const showsMoney = !(actor.kind === 'staff' && actor.role === 'crew');
    checkValueLine(mark, line, await billedWork(tx, jobId, line.id), job.currency, showsMoney);
  }

  // The history row first: a repeated client key stops here, having changed nothing.
  const inserted = await tx.client.query<{ id: string }>(
    `insert into job_progress (tenant_id, job_id, kind, work_item_id, value_line_id, value, happened_on, actor_user_id, note, client_key)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10)
     on conflict (tenant_id, client_key) where client_key is not null do nothing returning id`,
    [
      tx.tenantId,
      jobId,
      mark.kind,
      target.workItemId,
      target.valueLineId,
      value,
      mark.on,
      actor.kind === 'staff' ? actor.userId : null,
      mark.note ?? '',
      mark.clientKey ?? null,
    ],
  );
  if (!inserted.rows[0]) return progressView(tx, jobId);
  // Marks kept on a phone without a signal arrive late and out of order: one dated before a mark
  // already recorded for the same thing stays in the history but does not change where it stands
  // (an older 30 % after a newer 60 %, a done before a later reopening).
  if (await isOlderThanRecorded(tx, jobId, mark, target, inserted.rows[0].id)) return progressView(tx, jobId);
  // The first layer done means the work has started: a scheduled job is now under way.
  if (mark.kind === 'layerDone') {
    await tx.client.query(
      `update jobs set status = 'in_progress', updated_at = $3 where tenant_id = $1 and id = $2 and status = 'scheduled'`,
      [tx.tenantId, jobId, now],
    );
  }

  switch (mark.kind) {
    case 'layerDone':
      // Done already (a second phone, the same day): the first to mark it keeps it.
      await tx.client.query(`update job_work_items set done_on = $3, done_by = $4 where tenant_id = $1 and id = $2 and done_on is null`, [
        tx.tenantId,
        target.workItemId,
        mark.on,
        actor.kind === 'staff' ? actor.userId : null,
      ]);
      break;
    case 'layerReopened':
      await tx.client.query(`update job_work_items set done_on = null, done_by = null where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        target.workItemId,
      ]);
      break;
    case 'valuePercent':
      await tx.client.query(`update job_value_lines set percent_complete = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        target.valueLineId,
        value,
        now,
      ]);
      break;
    case 'storedMaterials':
      await tx.client.query(`update job_value_lines set stored_materials = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        target.valueLineId,
        value,
        now,
      ]);
      break;
    case 'walkthrough':
      await tx.client.query(`update jobs set walkthrough_on = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        jobId,
        mark.on,
        now,
      ]);
      break;
  }
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'progress.marked',
    entity: 'job',
    entityId: jobId,
    data: { progressId: inserted.rows[0].id, kind: mark.kind, on: mark.on, ...target, ...(value !== null ? { value } : {}) },
  });
  await enqueueBillingCheck(tx, queue, jobId, { progressMarked: mark.kind === 'valuePercent' || mark.kind === 'storedMaterials' });
  return progressView(tx, jobId);
}
