import type { ChangeOrderDecision, ChangeOrderView, JobStatus, PortalChangeOrder } from '@layerbook/contracts';
import { eq, firms, type TenantTx } from '@layerbook/db';
import { DomainInputError, formatMoney, minorUnitDigits, respreadSchedule, staysOnRespread, type PaymentLine } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../../audit/record';
import type { AppContext } from '../../context';
import type { ClientPrincipal } from '../../http/principal';
import { conflict, HttpError, notFound } from '../../http/problem';
import { localeOf } from '../../i18n/catalog';
import { officeRecipients } from '../../mail/office-recipients';
import { enqueueMail } from '../../mail/outbox';
import { clientIdOf } from '../../proposals/client-proposals';
import { enqueueBillingCheck } from '../triggers/enqueue';
import { insertWorkItems } from '../work-items';
import { changeOrderAnsweredMail } from './change-order-mail';
import { MONEY_COLUMN_LIMIT } from '../money';
import type { StoredDetail } from './pricing';
import { loadChangeOrder, toView, type ChangeOrderRow } from './read';
import { changeValueLines, deductionFitsUntouched } from './value-lines';

/** A change order the client may read: one of their own jobs', sent or decided (never a draft); 404 otherwise. */
async function loadClientChangeOrder(tx: TenantTx, client: ClientPrincipal, id: string, lock = false): Promise<ChangeOrderRow> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) throw notFound('change order');
  const row = await loadChangeOrder(tx, id, lock);
  if (row.client_id !== clientId || row.status === 'draft') throw notFound('change order');
  return row;
}

export async function getClientChangeOrder(tx: TenantTx, client: ClientPrincipal, id: string): Promise<PortalChangeOrder> {
  return forPortal(tx, toView(await loadClientChangeOrder(tx, client, id)));
}

/** The client's view carries the firm's time zone, so the portal shows when it was answered as the firm's day and time. */
async function forPortal(tx: TenantTx, view: ChangeOrderView): Promise<PortalChangeOrder> {
  const firm = (await tx.db.select({ timeZone: firms.timeZone }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  if (!firm) throw notFound('firm');
  return { ...view, timeZone: firm.timeZone };
}

interface LineRow {
  id: string;
  position: number;
  label: string;
  role: PaymentLine['role'];
  trigger: PaymentLine['trigger'];
  amount: string;
  percent: string | null;
  status: 'draft' | 'scheduled' | 'ready' | 'invoiced';
}

/** Lines with a drafted or issued invoice are billed: a re-spread never touches them. */
const isBilled = (l: LineRow) => l.status === 'ready' || l.status === 'invoiced';

/**
 * The client approves (typed signature) or declines a sent change order. Approval moves the money
 * in one transaction: the job's contract sum and contained tax, the unbilled schedule lines spread
 * again to the new sum (a new line when every line is billed), a schedule-of-values line, the
 * change order's own record, the billing check, the audit row and the office's e-mail. A decline
 * only closes the change order. Answering twice is a 409.
 */
export async function decideChangeOrder(
  tx: TenantTx,
  ctx: AppContext,
  client: ClientPrincipal,
  id: string,
  parseBody: () => ChangeOrderDecision,
): Promise<PortalChangeOrder> {
  const row = await loadClientChangeOrder(tx, client, id, true);
  const input = parseBody();
  if (row.status !== 'sent') throw conflict(`You already ${row.status} this change order.`);
  const now = ctx.now();
  const comment = input.comment ?? '';
  if (input.decision === 'approve') {
    const sums = await applyApproval(tx, ctx, row, now).catch((error: unknown) => {
      // The job moved since it was sent (payments billed, work recorded): the refusal names the amount,
      // which the portal words as "cannot be approved as the job stands; ask the firm" — not "already answered".
      if (error instanceof HttpError && error.status === 409) {
        const why = error.detail ?? error.title;
        throw conflict(why, [{ field: 'amount', message: why }]);
      }
      throw error;
    });
    await tx.client.query(
      `update change_orders set status = 'approved', decided_at = $3, signed_name = $4, client_comment = $5, detail = detail || $6::jsonb, updated_at = $3
        where tenant_id = $1 and id = $2 and status = 'sent'`,
      [tx.tenantId, id, now, input.signedName, comment, JSON.stringify(sums satisfies StoredDetail)],
    );
  } else {
    await tx.client.query(
      `update change_orders set status = 'declined', decided_at = $3, client_comment = $4, updated_at = $3 where tenant_id = $1 and id = $2 and status = 'sent'`,
      [tx.tenantId, id, now, comment],
    );
  }
  const isApproved = input.decision === 'approve';
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'client',
    action: isApproved ? 'change_order.approved' : 'change_order.declined',
    entity: 'change_order',
    entityId: id,
    data: {
      number: row.number,
      amount: row.amount,
      jobId: row.job_id,
      comment,
      portalUserId: client.id,
      ...(isApproved ? { signedName: input.signedName } : {}),
    },
  });
  await mailOffice(tx, ctx, row, { isApproved, signedName: isApproved ? input.signedName : null, comment, clientName: client.name });
  return forPortal(tx, toView(await loadChangeOrder(tx, id)));
}

interface JobMoneyRow {
  contract_sum: string;
  contract_tax: string;
  currency: string;
  billing_method: 'schedule' | 'progress';
  billing_started_at: Date | null;
  finish_date: string | null;
  status: JobStatus;
}

/** The money side of an approval; answers the sums before and after, to freeze on the change order. */
async function applyApproval(tx: TenantTx, ctx: AppContext, row: ChangeOrderRow, now: Date): Promise<StoredDetail> {
  const job = (
    await tx.client.query<JobMoneyRow>(
      `select contract_sum::text as contract_sum, contract_tax::text as contract_tax, currency, billing_method, billing_started_at,
              finish_date::text as finish_date, status
         from jobs where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, row.job_id],
    )
  ).rows[0];
  if (job.status === 'cancelled') throw conflict('The firm has cancelled this job, so this change order can no longer be approved.');
  const digits = minorUnitDigits(job.currency);
  const before = new Decimal(job.contract_sum);
  const after = before.plus(row.amount);
  if (after.lessThanOrEqualTo(0)) throw conflict('This change would take the contract sum to zero or below; ask the firm.');
  if (new Decimal(job.contract_tax).plus(row.tax).isNegative())
    throw conflict('This change would take off more tax than the contract carries; ask the firm.');
  if (after.greaterThanOrEqualTo(MONEY_COLUMN_LIMIT))
    throw conflict('This change would take the contract sum past what can be recorded; ask the firm.');
  // Progress billing keeps only its deposit in the schedule; the work is billed from the schedule of values.
  if (job.billing_method === 'schedule') await respreadLines(tx, row, job, after, now);
  await tx.client.query(
    `update jobs set contract_sum = $3, contract_tax = contract_tax + $4::numeric, updated_at = $5 where tenant_id = $1 and id = $2`,
    [tx.tenantId, row.job_id, after.toFixed(digits), row.tax, now],
  );
  await addWorkItems(tx, row);
  await changeValueLines(
    tx,
    {
      id: row.id,
      jobId: row.job_id,
      label: lineLabel(row),
      amount: row.amount,
      currency: job.currency,
      isProgressBilled: job.billing_method === 'progress',
    },
    now,
  );
  // The open progress application is refigured on the new contract sum and lines (the schedule's lines are checked).
  await enqueueBillingCheck(tx, ctx.queue, row.job_id, { refreshDraft: job.billing_method === 'progress' });
  return { contractSumBefore: before.toFixed(digits), contractSumAfter: after.toFixed(digits) };
}

/**
 * The layers on the surfaces an engine-priced change order adds become the job's work, after the
 * work sold, as its own: the office and crew mark them, a redo of a surface already sold included,
 * and a payment due when a layer is done on every surface waits for them too when its amount grew
 * with the change order (not yet billed: countsTowardLine in work-items.ts).
 */
async function addWorkItems(tx: TenantTx, row: ChangeOrderRow): Promise<void> {
  const items = row.detail.workItems ?? [];
  if (!items.length) return;
  const { rows } = await tx.client.query<{ last: number }>(
    `select coalesce(max(position), 0)::int as last from job_work_items where tenant_id = $1 and job_id = $2`,
    [tx.tenantId, row.job_id],
  );
  await insertWorkItems(
    tx,
    row.job_id,
    items.map((item, k) => ({ ...item, position: rows[0].last + k + 1 })),
    row.id,
  );
}

const lineLabel = (row: ChangeOrderRow) => `Change order #${row.number}: ${row.title}`;

const LINES_SQL = `select id, position, label, role, trigger, amount::text as amount, trim_scale(percent)::text as percent, status
                     from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position`;

const toPaymentLine = (l: LineRow): PaymentLine => ({
  id: l.id,
  label: l.label,
  role: l.role,
  trigger: l.trigger,
  amount: new Decimal(l.amount),
  isBilled: isBilled(l),
});

/**
 * Why the client could not approve this change order as the job stands now — the checks approval
 * makes (applyApproval: the new contract sum, and the unbilled payments it is spread over), in the
 * office's words — or null when they could. Sending checks it, so a client is never asked to approve
 * what would be refused.
 */
export async function whyNotApprovable(tx: TenantTx, row: ChangeOrderRow): Promise<string | null> {
  const job = (
    await tx.client.query<Pick<JobMoneyRow, 'contract_sum' | 'contract_tax' | 'currency' | 'billing_method'>>(
      `select contract_sum::text as contract_sum, contract_tax::text as contract_tax, currency, billing_method from jobs
        where tenant_id = $1 and id = $2`,
      [tx.tenantId, row.job_id],
    )
  ).rows[0];
  const after = new Decimal(job.contract_sum).plus(row.amount);
  if (after.lessThanOrEqualTo(0)) return 'it would take the contract sum to zero or below';
  if (new Decimal(job.contract_tax).plus(row.tax).isNegative()) return 'it would take off more tax than the contract carries';
  if (after.greaterThanOrEqualTo(MONEY_COLUMN_LIMIT)) return 'it would take the contract sum past what can be recorded';
  if (job.billing_method !== 'schedule') {
    // Progress billing takes a deduction off the schedule-of-values lines no work has touched (changeValueLines).
    if (new Decimal(row.amount).isNegative() && !(await deductionFitsUntouched(tx, row.job_id, row.amount)))
      return 'it takes off more than the work not yet started on the schedule of values (credit the client instead)';
    return null;
  }
  const { rows: lines } = await tx.client.query<LineRow>(LINES_SQL, [tx.tenantId, row.job_id]);
  if (lines.length > 0 && lines.every((l) => staysOnRespread(toPaymentLine(l), new Decimal(row.amount).isPositive()))) {
    return new Decimal(row.amount).isNegative()
      ? 'every payment of this job but its deposit is already billed, so a deduction cannot be spread (void or credit instead)'
      : null;
  }
  try {
    respreadSchedule(lines.map(toPaymentLine), after, job.currency);
    return null;
  } catch (error) {
    if (error instanceof DomainInputError) return `it cannot be spread over the payments: ${error.message}`;
    throw error;
  }
}

/**
 * Spreads the new contract sum over the unbilled lines in proportion (billed lines and the deposit never
 * move); when every other line is billed, the change order becomes its own stage payment at the walkthrough,
 * placed before the final line so the final payment stays last.
 */
async function respreadLines(tx: TenantTx, row: ChangeOrderRow, job: JobMoneyRow, after: Decimal, now: Date): Promise<void> {
  const { rows: lines } = await tx.client.query<LineRow>(`${LINES_SQL} for update`, [tx.tenantId, row.job_id]);
  const digits = minorUnitDigits(job.currency);
  if (lines.length > 0 && lines.every((l) => staysOnRespread(toPaymentLine(l), new Decimal(row.amount).isPositive()))) {
    if (new Decimal(row.amount).isNegative())
      throw conflict(
        'Every payment of this job but its deposit is already billed, so a deduction cannot be spread; ask the firm for a credit.',
      );
    const final = lines.find((l) => l.role === 'final');
    const position = final ? final.position : Math.max(...lines.map((l) => l.position)) + 1;
    if (final)
      await tx.client.query(
        `update payment_schedule_lines set position = position + 1 where tenant_id = $1 and job_id = $2 and position >= $3`,
        [tx.tenantId, row.job_id, position],
      );
    await tx.client.query(
      `insert into payment_schedule_lines (tenant_id, job_id, position, label, role, trigger, amount, expected_on, status)
       values ($1, $2, $3, $4, 'milestone', '{"kind":"walkthrough"}', $5, $6, $7)`,
      [tx.tenantId, row.job_id, position, lineLabel(row), row.amount, job.finish_date, job.billing_started_at ? 'scheduled' : 'draft'],
    );
    return;
  }
  let spread: PaymentLine[];
  try {
    spread = respreadSchedule(lines.map(toPaymentLine), after, job.currency);
  } catch (error) {
    if (error instanceof DomainInputError) throw conflict(`This change cannot be spread over the payments: ${error.message}`);
    throw error;
  }
  for (const [i, line] of spread.entries()) {
    if (line.amount.equals(lines[i].amount)) continue;
    // A line asked for as a share of the contract shows its share of the new sum; "the rest" stays the rest.
    const percent = lines[i].percent === null ? null : line.amount.div(after).times(100).toDecimalPlaces(2).toFixed();
    await tx.client.query(`update payment_schedule_lines set amount = $3, percent = $4, updated_at = $5 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      line.id,
      line.amount.toFixed(digits),
      percent,
      now,
    ]);
  }
}

async function mailOffice(
  tx: TenantTx,
  ctx: AppContext,
  row: ChangeOrderRow,
  p: { isApproved: boolean; signedName: string | null; comment: string; clientName: string },
): Promise<void> {
  const firm = (await tx.client.query<{ name: string; country: string }>(`select name, country from firms where id = $1`, [tx.tenantId]))
    .rows[0];
  const job = (
    await tx.client.query<{ title: string }>(`select title from jobs where tenant_id = $1 and id = $2`, [tx.tenantId, row.job_id])
  ).rows[0];
  // Each in the language they read, the amount written for it in the firm's country.
  for (const person of await officeRecipients(tx))
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `change-order-answer:${row.id}:${person.id}`,
      tenantId: tx.tenantId,
      to: person.email,
      ...changeOrderAnsweredMail({
        firmName: firm.name,
        clientName: p.clientName,
        jobTitle: job.title,
        number: row.number,
        title: row.title,
        isApproved: p.isApproved,
        signedName: p.signedName,
        amount: formatMoney(row.amount, row.currency, localeOf(person.reader.language, person.reader.country)),
        comment: p.comment,
        url: `${ctx.config.PUBLIC_URL}/jobs/${row.job_id}`,
        language: person.reader.language,
      }),
    });
}
