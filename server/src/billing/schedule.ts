import type {
  BillingScheduleUpdate,
  BillingTerms,
  BillingTrigger,
  FieldProblem,
  JobBillingView,
  ValueLinesUpdate,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import {
  addDays,
  checkBillingSchedule,
  checkDeposit,
  type DepositCapRule,
  minorUnitDigits,
  sumMoney,
  valueLineWork,
  yearBefore,
} from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import { longDate } from '../i18n/long-date';
import { type Actor, SYSTEM_ACTOR } from '../http/actor';
import { badRequest, conflict } from '../http/problem';
import { layerMilestones } from '../jobs/jobs';
import type { JobQueue } from '../queue/job-queue';
import { type BillingJob, firmToday, loadBillingJob, refuseCancelledJob } from './billing-job';
import { evaluateJobBilling } from './triggers/evaluate';
import { getJobBilling, loadScheduleLines, type ScheduleLineRow } from './job-billing';
import { decimalsMessage, fitsCurrency } from './money';
import { billedWorkByLine, loadValueLines, type ValueLineRow } from './progress-invoice';
import { billingTermsFor, loadBillingSettings, toDepositCapRule } from './settings';
import { enqueueBillingCheck } from './triggers/enqueue';

const BILLED = new Set(['ready', 'invoiced']);

/** The deposit rule a job's schedule answers to: the job's own cap in money once billing started, the firm's rule before. */
async function depositRuleOf(tx: TenantTx, job: BillingJob): Promise<DepositCapRule> {
  if (job.billing_terms)
    return job.billing_terms.depositCap === null ? { kind: 'none' } : { kind: 'amount', amount: job.billing_terms.depositCap };
  return toDepositCapRule((await loadBillingSettings(tx)).settings.depositCap);
}

/** Problems of a progress-billed job's schedule: it keeps at most one deposit line, within the cap and the contract sum. */
function progressScheduleProblems(body: BillingScheduleUpdate, job: BillingJob, rule: DepositCapRule): FieldProblem[] {
  const problems: FieldProblem[] = [];
  body.lines.forEach((l, i) => {
    if (l.role !== 'deposit') {
      problems.push({ field: `lines[${i}].role`, message: 'A job billed by progress keeps only its deposit on the schedule.' });
    }
  });
  if (body.lines.length > 1) problems.push({ field: 'lines', message: 'A job billed by progress has at most one deposit line.' });
  body.lines.forEach((l, i) => {
    if (l.role !== 'deposit') return;
    if (!fitsCurrency(l.amount, job.currency)) {
      problems.push({ field: `lines[${i}].amount`, message: decimalsMessage(job.currency) });
      return;
    }
    const check = checkDeposit(l.amount, rule, job.contract_sum, job.currency);
    if (!check.isWithinCap) {
      problems.push({ field: `lines[${i}].amount`, message: `The deposit is over the cap of ${check.cap?.toFixed(2)} for this contract.` });
    } else if (new Decimal(l.amount).greaterThan(job.contract_sum)) {
      problems.push({ field: `lines[${i}].amount`, message: 'The deposit is more than the contract sum.' });
    }
  });
  return problems;
}

/** The same trigger, whatever order jsonb gave its keys. */
function sameTrigger(a: BillingTrigger, b: BillingTrigger): boolean {
  const canonical = (t: BillingTrigger) => JSON.stringify(Object.entries(t).sort(([x], [y]) => x.localeCompare(y)));
  return canonical(a) === canonical(b);
}

/** Billed lines (a draft or an issued invoice exists) stay exactly as they are: 409 naming what changed or went. */
function billedLineChanges(body: BillingScheduleUpdate, existing: readonly ScheduleLineRow[]): FieldProblem[] {
  const problems: FieldProblem[] = [];
  for (const line of existing.filter((l) => BILLED.has(l.status))) {
    const i = body.lines.findIndex((l) => l.id === line.id);
    if (i < 0) {
      problems.push({ field: 'lines', message: `"${line.label}" is billed and cannot be removed.` });
      continue;
    }
    const next = body.lines[i];
    if (!new Decimal(next.amount).equals(line.amount))
      problems.push({ field: `lines[${i}].amount`, message: 'This line is billed and cannot change.' });
    if (next.role !== line.role) problems.push({ field: `lines[${i}].role`, message: 'This line is billed and cannot change.' });
    // its invoice carries the label (a draft's is frozen at issue): renamed here, the two would disagree
    if (next.label !== line.label) problems.push({ field: `lines[${i}].label`, message: 'This line is billed and cannot change.' });
    if (!sameTrigger(next.trigger, line.trigger)) {
      problems.push({ field: `lines[${i}].trigger`, message: 'This line is billed and cannot change.' });
    }
  }
  return problems;
}

/** How far ahead a billing date may be set: five years (common practice, no source: longer than any finish job runs). */
const DATE_TRIGGER_DAYS_AHEAD = 5 * 365;

/**
 * PUT /api/jobs/:id/billing/schedule: the whole schedule. Lines add up to the contract sum exactly
 * and the deposit keeps within the cap (schedule method: the domain's checkBillingSchedule); a
 * progress-billed job keeps at most its deposit line. Billed lines never change (409). Expected
 * dates: a date trigger's date, a layer's date from the accepted option's schedule, the walkthrough
 * at the job's finish date.
 */
export async function updateBillingSchedule(
  tx: TenantTx,
  queue: JobQueue,
  actor: Actor,
  jobId: string,
  body: BillingScheduleUpdate,
  now: Date,
): Promise<JobBillingView> {
  const job = await loadBillingJob(tx, jobId, true);
  refuseCancelledJob(job);
  const existing = await loadScheduleLines(tx, job.id);
  const byId = new Map(existing.map((l) => [l.id, l]));
  const unknown: FieldProblem[] = body.lines.flatMap((l, i) =>
    l.id !== undefined && !byId.has(l.id) ? [{ field: `lines[${i}].id`, message: 'No such line on this job.' }] : [],
  );
  const ids = body.lines.map((l) => l.id).filter((id) => id !== undefined);
  if (new Set(ids).size !== ids.length) unknown.push({ field: 'lines', message: 'A line is listed twice.' });
  const milestones = await layerMilestones(tx, job.proposal_version_id, job.accepted_variant_id);
  const layers = new Set([
    ...milestones.keys(),
    ...(
      await tx.client.query<{ layer_id: string }>(`select distinct layer_id from job_work_items where tenant_id = $1 and job_id = $2`, [
        tx.tenantId,
        job.id,
      ])
    ).rows.map((r) => r.layer_id),
  ]);
  const today = firmToday(job, now);
  const [earliest, latest] = [yearBefore(today), addDays(today, DATE_TRIGGER_DAYS_AHEAD)];
  body.lines.forEach((l, i) => {
    if (l.trigger.kind === 'layerComplete' && !layers.has(l.trigger.layerId)) {
      unknown.push({ field: `lines[${i}].trigger.layerId`, message: 'This job has no such layer.' });
    }
    // A billing date the office sets or moves lies within a year back and five years ahead (a line
    // kept as it was keeps its date, however old).
    const before = l.id !== undefined ? byId.get(l.id)?.trigger : undefined;
    const isKept = before?.kind === 'date' && l.trigger.kind === 'date' && before.date === l.trigger.date;
    if (l.trigger.kind === 'date' && !isKept && (l.trigger.date < earliest || l.trigger.date > latest)) {
      unknown.push({
        field: `lines[${i}].trigger.date`,
        message: `Choose a billing date from ${longDate(earliest)} to ${longDate(latest)}.`,
      });
    }
  });
  if (unknown.length) throw badRequest(unknown);

  const billedChanges = billedLineChanges(body, existing);
  if (billedChanges.length) throw conflict('Billed lines cannot change.', billedChanges);
  if (body.method !== job.billing_method) {
    const live = await tx.client.query(
      `select 1 from invoices where tenant_id = $1 and job_id = $2 and status <> 'void' and kind <> 'deposit' limit 1`,
      [tx.tenantId, job.id],
    );
    if (live.rowCount)
      throw conflict('This job already has invoices; its billing method stays.', [{ field: 'method', message: 'Keep the method.' }]);
  }

  const rule = await depositRuleOf(tx, job);
  const problems =
    body.method === 'schedule'
      ? checkBillingSchedule({
          lines: body.lines.map((l) => {
            const before = l.id !== undefined ? byId.get(l.id) : undefined;
            const isBilled = before !== undefined && BILLED.has(before.status);
            return { amount: l.amount, role: l.role, isBilled, ...(isBilled && before ? { originalAmount: before.amount } : {}) };
          }),
          contractSum: job.contract_sum,
          currency: job.currency,
          depositRule: rule,
        })
      : progressScheduleProblems(body, job, rule);
  if (problems.length) throw badRequest(problems);

  const removed = existing.filter((l) => !body.lines.some((n) => n.id === l.id));
  if (removed.length) {
    const used = await tx.client.query(`select 1 from invoices where tenant_id = $1 and schedule_line_id = any($2::uuid[]) limit 1`, [
      tx.tenantId,
      removed.map((l) => l.id),
    ]);
    if (used.rowCount)
      throw conflict('A line with a voided invoice stays on the schedule.', [{ field: 'lines', message: 'Keep that line.' }]);
    await tx.client.query(`delete from payment_schedule_lines where tenant_id = $1 and id = any($2::uuid[])`, [
      tx.tenantId,
      removed.map((l) => l.id),
    ]);
  }
  const expectedOn = (l: BillingScheduleUpdate['lines'][number]): string | null => {
    switch (l.trigger.kind) {
      case 'date':
        return l.trigger.date;
      case 'layerComplete':
        return milestones.get(l.trigger.layerId)?.date ?? null;
      case 'walkthrough':
        return job.finish_date;
      case 'acceptance':
        return null;
    }
  };
  const fresh = job.billing_started_at ? 'scheduled' : 'draft';
  for (const [i, l] of body.lines.entries()) {
    const values = [tx.tenantId, i + 1, l.label, l.role, JSON.stringify(l.trigger), l.amount, expectedOn(l), now];
    if (l.id !== undefined) {
      // a percent asked for at acceptance no longer describes an edited amount
      await tx.client.query(
        `update payment_schedule_lines set position = $2, label = $3, role = $4, trigger = $5, amount = $6, expected_on = $7, updated_at = $8,
                percent = case when amount = $6::numeric then percent else null end
          where tenant_id = $1 and id = $9`,
        [...values, l.id],
      );
    } else {
      await tx.client.query(
        `insert into payment_schedule_lines (tenant_id, position, label, role, trigger, amount, expected_on, updated_at, job_id, status)
         values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10)`,
        [...values, job.id, fresh],
      );
    }
  }
  await tx.client.query(`update jobs set billing_method = $3, updated_at = $4 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    job.id,
    body.method,
    now,
  ]);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'billing.schedule_updated',
    entity: 'job',
    entityId: job.id,
    data: {
      method: body.method,
      lines: body.lines.map((l) => ({ label: l.label, role: l.role, amount: l.amount, trigger: l.trigger.kind })),
    },
  });
  if (job.billing_started_at) await enqueueBillingCheck(tx, queue, job.id);
  return getJobBilling(tx, job.id, now);
}

/**
 * POST /api/jobs/:id/billing/start: the office confirms the schedule. The firm's settings are
 * copied to the job (the deposit cap in money for this contract), lines become scheduled, and the
 * triggers already met are drafted at once (a deposit on acceptance). Twice is 409.
 */
export async function startBilling(
  tx: TenantTx,
  queue: JobQueue,
  actor: Actor,
  jobId: string,
  now: Date,
  options: { draftNow?: boolean } = {},
): Promise<JobBillingView> {
  const job = await loadBillingJob(tx, jobId, true);
  refuseCancelledJob(job);
  if (job.billing_started_at) throw conflict('Billing has already started for this job.');
  const { settings } = await loadBillingSettings(tx);
  const terms: BillingTerms = billingTermsFor(settings, job.contract_sum, job.currency);
  const lines = await loadScheduleLines(tx, job.id);
  const rule = toDepositCapRule(settings.depositCap);
  const problems =
    job.billing_method === 'schedule'
      ? checkBillingSchedule({
          lines: lines.map((l) => ({ amount: l.amount, role: l.role, isBilled: false })),
          contractSum: job.contract_sum,
          currency: job.currency,
          depositRule: rule,
        })
      : progressScheduleProblems({ method: 'progress', lines: lines.map((l) => ({ ...l, id: l.id })) }, job, rule);
  if (job.billing_method === 'progress') {
    const values = await loadValueLines(tx, job.id);
    const sum = sumMoney(values.map((v) => new Decimal(v.scheduled_value)));
    if (!values.length || !sum.equals(job.contract_sum)) {
      problems.push({ field: 'valueLines', message: `The schedule of values must add up to the contract sum ${job.contract_sum}.` });
    }
  }
  if (problems.length) throw conflict('Fix the schedule before billing starts.', problems);
  await tx.client.query(`update jobs set billing_terms = $3, billing_started_at = $4, updated_at = $4 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    job.id,
    JSON.stringify(terms),
    now,
  ]);
  await tx.client.query(
    `update payment_schedule_lines set status = 'scheduled', updated_at = $3 where tenant_id = $1 and job_id = $2 and status = 'draft'`,
    [tx.tenantId, job.id, now],
  );
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'billing.started',
    entity: 'job',
    entityId: job.id,
    data: { terms, method: job.billing_method },
  });
  // The triggers met already (a deposit on acceptance, a date passed) are drafted now, in this
  // transaction, so the office sees them on the answer; later ones are the queue's. Without
  // `draftNow` (acceptance issuing the deposit itself) the queue checks them after commit.
  if (options.draftNow === false) await enqueueBillingCheck(tx, queue, job.id);
  else await evaluateJobBilling(tx, job.id, firmToday(job, now), SYSTEM_ACTOR);
  return getJobBilling(tx, job.id, now);
}

/**
 * A line's new value must still hold what it records (DOMAIN.md §2.10: G ≤ C), or every later
 * application is refused: work to date — its recorded percent of the new value, never below the work
 * billed, as progressFigures figures it — plus the materials stored on it. The words of the progress
 * mark's own check.
 */
function passedByWorkAndStored(line: ValueLineRow, scheduledValue: string, billed: Decimal, currency: string): string | null {
  const digits = minorUnitDigits(currency);
  const atPercent = valueLineWork({ scheduledValue, percentToDate: line.percent_complete, previousWork: '0', currency });
  const work = Decimal.max(atPercent, billed);
  const stored = new Decimal(line.stored_materials);
  if (!work.plus(stored).greaterThan(scheduledValue)) return null;
  return `With ${work.toFixed(digits)} of work done and ${stored.toFixed(digits)} of materials stored, work done and stored would pass the line's value ${new Decimal(scheduledValue).toFixed(digits)}: keep the value higher, or lower the stored materials first.`;
}

/**
 * PUT /api/jobs/:id/billing/value-lines: the whole schedule of values, adding up to the contract
 * sum to date exactly; a line never drops below the work already billed on it, and a line with
 * billed work or marks in the job's history stays.
 */
export async function updateValueLines(
  tx: TenantTx,
  queue: JobQueue,
  actor: Actor,
  jobId: string,
  body: ValueLinesUpdate,
  now: Date,
): Promise<JobBillingView> {
  const job = await loadBillingJob(tx, jobId, true);
  refuseCancelledJob(job);
  const existing = await loadValueLines(tx, job.id);
  const byId = new Map(existing.map((l) => [l.id, l]));
  const billed = await billedWorkByLine(tx, job.id);
  const problems: FieldProblem[] = [];
  body.lines.forEach((l, i) => {
    if (!fitsCurrency(l.scheduledValue, job.currency)) {
      problems.push({
        field: `lines[${i}].scheduledValue`,
        message: decimalsMessage(job.currency),
      });
    }
    if (l.id === undefined) return;
    if (!byId.has(l.id)) problems.push({ field: `lines[${i}].id`, message: 'No such line on this job.' });
    const line = byId.get(l.id);
    const done = billed.get(l.id);
    if (done && new Decimal(l.scheduledValue).lessThan(done)) {
      problems.push({
        field: `lines[${i}].scheduledValue`,
        message: `${done.toFixed(2)} is already billed on this line; it cannot be less.`,
      });
    } else if (line && fitsCurrency(l.scheduledValue, job.currency)) {
      const message = passedByWorkAndStored(line, l.scheduledValue, done ?? new Decimal(0), job.currency);
      if (message) problems.push({ field: `lines[${i}].scheduledValue`, message });
    }
  });
  const ids = body.lines.map((l) => l.id).filter((id) => id !== undefined);
  if (new Set(ids).size !== ids.length) problems.push({ field: 'lines', message: 'A line is listed twice.' });
  const sum = sumMoney(body.lines.map((l) => new Decimal(l.scheduledValue)));
  if (!sum.equals(job.contract_sum)) {
    const gap = sum.minus(job.contract_sum);
    problems.push({
      field: 'lines',
      message: `The lines add up to ${sum.toFixed(2)}, ${gap.abs().toFixed(2)} ${gap.isNegative() ? 'short of' : 'over'} the contract sum ${job.contract_sum}.`,
    });
  }
  if (problems.length) throw badRequest(problems);
  const removed = existing.filter((l) => !body.lines.some((n) => n.id === l.id));
  if (removed.length) {
    const ids = removed.map((l) => l.id);
    const used =
      removed.some((l) => billed.has(l.id)) ||
      ((
        await tx.client.query(`select 1 from job_progress where tenant_id = $1 and value_line_id = any($2::uuid[]) limit 1`, [
          tx.tenantId,
          ids,
        ])
      ).rowCount ?? 0) > 0;
    if (used)
      throw conflict('A line with billed work or marked progress stays in the schedule of values.', [
        { field: 'lines', message: 'Keep that line.' },
      ]);
    await tx.client.query(`delete from job_value_lines where tenant_id = $1 and id = any($2::uuid[])`, [tx.tenantId, ids]);
  }
  for (const [i, l] of body.lines.entries()) {
    if (l.id !== undefined) {
      await tx.client.query(
        `update job_value_lines set position = $3, label = $4, scheduled_value = $5, updated_at = $6 where tenant_id = $1 and id = $2`,
        [tx.tenantId, l.id, i + 1, l.label, l.scheduledValue, now],
      );
    } else {
      await tx.client.query(
        `insert into job_value_lines (tenant_id, job_id, position, label, scheduled_value, updated_at) values ($1, $2, $3, $4, $5, $6)`,
        [tx.tenantId, job.id, i + 1, l.label, l.scheduledValue, now],
      );
    }
  }
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'billing.value_lines_updated',
    entity: 'job',
    entityId: job.id,
    data: { lines: body.lines.map((l) => ({ label: l.label, scheduledValue: l.scheduledValue })) },
  });
  // The open progress application is refigured on the new lines once this commits (and again at issue).
  if (job.billing_method === 'progress') await enqueueBillingCheck(tx, queue, job.id, { refreshDraft: true });
  return getJobBilling(tx, job.id, now);
}
