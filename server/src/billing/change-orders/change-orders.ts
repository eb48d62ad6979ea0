import type { ChangeOrderCreate, ChangeOrderPricing, ChangeOrderUpdate, ChangeOrderView, JobStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { formatMoney } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../../audit/record';
import { createPortalLink } from '../../auth/portal-auth';
import type { AppContext } from '../../context';
import { localDate } from '../../firms/local-date';
import type { Actor } from '../../http/actor';
import { badRequest, conflict, notFound } from '../../http/problem';
import { enqueueMail } from '../../mail/outbox';
import { ensurePortalAccount } from '../../proposals/client-portal-account';
import { refuseCancelledJob } from '../billing-job';
import { changeOrderSentMail } from './change-order-mail';
import { whyNotApprovable } from './decide';
import { type PricedChangeOrder, priceChangeOrder, type PricingJob } from './pricing';
import { loadChangeOrder, toView } from './read';
import { localeOf } from '../../i18n/catalog';
import { clientReader } from '../../i18n/reader';

/** A change order e-mail may wait a few days to be read, like a proposal's. */
export const CHANGE_ORDER_LINK_DAYS = 3;

const auditedBy = (actor: Actor) => ({ actorUserId: actor.userId, actorKind: actor.kind });

interface JobRow {
  site_id: string;
  estimate_id: string;
  currency: string;
  start_date: string | null;
  client_id: string;
  title: string;
  contract_sum: string;
  contract_tax: string;
  status: JobStatus;
}

async function loadJob(tx: TenantTx, jobId: string, lock: boolean): Promise<JobRow> {
  const { rows } = await tx.client.query<JobRow>(
    `select site_id, estimate_id, currency, start_date::text as start_date, client_id, title, contract_sum::text as contract_sum,
            contract_tax::text as contract_tax, status
       from jobs where tenant_id = $1 and id = $2
      ${lock ? 'for update' : ''}`,
    [tx.tenantId, jobId],
  );
  if (!rows[0]) throw notFound('job');
  // A cancelled job's contract stays as it ended: no change order is written, changed or sent on it.
  refuseCancelledJob(rows[0]);
  return rows[0];
}

const pricingJob = (j: JobRow): PricingJob => ({
  siteId: j.site_id,
  estimateId: j.estimate_id,
  currency: j.currency,
  startDate: j.start_date,
  contractTax: j.contract_tax,
});

/**
 * A deduction that would leave the job's contract sum at nothing or below is refused as it is typed
 * (400 naming the price), not first when it is sent. (Against today's sum: a change order approved
 * later may still move it, and sending checks again.)
 */
function checkLeavesAContract(job: JobRow, priced: PricedChangeOrder): void {
  if (new Decimal(job.contract_sum).plus(priced.amount).greaterThan(0)) return;
  const sum = formatMoney(job.contract_sum, job.currency, 'en-US');
  throw badRequest([
    {
      field: priced.pricing === 'lumpSum' ? 'pricing.price' : 'pricing',
      message: `This takes off more than the contract sum of ${sum}: the job would be worth nothing.`,
    },
  ]);
}

async function firmToday(tx: TenantTx, now: Date): Promise<string> {
  const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
  return localDate(rows[0].time_zone, now);
}

/**
 * A new draft with the job's next number. The job row is locked first, so two offices adding at
 * once get 1 and 2, never 1 twice (the unique key would refuse it anyway).
 */
export async function createChangeOrder(
  tx: TenantTx,
  actor: Actor,
  jobId: string,
  parseBody: () => ChangeOrderCreate,
  now: Date,
): Promise<ChangeOrderView> {
  const job = await loadJob(tx, jobId, true);
  const input = parseBody();
  const priced = await priceChangeOrder(tx, pricingJob(job), input.pricing, await firmToday(tx, now));
  checkLeavesAContract(job, priced);
  const { rows } = await tx.client.query<{ id: string; number: number }>(
    `insert into change_orders (tenant_id, job_id, number, title, description, pricing, price, tax, amount, detail, created_by)
     values ($1, $2, (select coalesce(max(number), 0) + 1 from change_orders where tenant_id = $1 and job_id = $2), $3, $4, $5, $6, $7, $8, $9, $10)
     returning id, number`,
    [
      tx.tenantId,
      jobId,
      input.title,
      input.description,
      priced.pricing,
      priced.price,
      priced.tax,
      priced.amount,
      JSON.stringify(priced.detail),
      actor.kind === 'staff' ? actor.userId : null,
    ],
  );
  const made = rows[0];
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'change_order.created',
    entity: 'change_order',
    entityId: made.id,
    data: { jobId, number: made.number, pricing: priced.pricing, price: priced.price, tax: priced.tax, amount: priced.amount },
  });
  return toView(await loadChangeOrder(tx, made.id));
}

export async function getChangeOrder(tx: TenantTx, id: string): Promise<ChangeOrderView> {
  return toView(await loadChangeOrder(tx, id));
}

/** Only a draft changes (409 once sent); a new `pricing` is priced again from today's settings. */
export async function updateChangeOrder(
  tx: TenantTx,
  actor: Actor,
  id: string,
  parseBody: () => ChangeOrderUpdate,
  now: Date,
): Promise<ChangeOrderView> {
  const row = await loadChangeOrder(tx, id, true);
  if (row.status !== 'draft') throw conflict(`Change order #${row.number} was sent to the client; only a draft can change.`);
  const input = parseBody();
  const pricing: ChangeOrderPricing | undefined = input.pricing;
  const job = await loadJob(tx, row.job_id, false);
  const priced = pricing ? await priceChangeOrder(tx, pricingJob(job), pricing, await firmToday(tx, now)) : null;
  if (priced) checkLeavesAContract(job, priced);
  await tx.client.query(
    `update change_orders set title = coalesce($3, title), description = coalesce($4, description),
            pricing = coalesce($5, pricing), price = coalesce($6, price), tax = coalesce($7, tax), amount = coalesce($8, amount),
            detail = coalesce($9, detail), updated_at = $10
      where tenant_id = $1 and id = $2`,
    [
      tx.tenantId,
      id,
      input.title ?? null,
      input.description ?? null,
      priced?.pricing ?? null,
      priced?.price ?? null,
      priced?.tax ?? null,
      priced?.amount ?? null,
      priced ? JSON.stringify(priced.detail) : null,
      now,
    ],
  );
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'change_order.updated',
    entity: 'change_order',
    entityId: id,
    data: {
      number: row.number,
      fields: Object.keys(input),
      ...(priced ? { price: priced.price, tax: priced.tax, amount: priced.amount } : {}),
    },
  });
  return toView(await loadChangeOrder(tx, id));
}

/**
 * Sends a draft to the client: from here it is frozen. The client gets a portal account if needed
 * and an e-mail with a one-time sign-in link to the change order, written in the same transaction.
 */
export async function sendChangeOrder(tx: TenantTx, ctx: AppContext, actor: Actor, id: string): Promise<ChangeOrderView> {
  const row = await loadChangeOrder(tx, id, true);
  if (row.status !== 'draft') throw conflict(`Change order #${row.number} was already sent.`);
  const blocked = await whyNotApprovable(tx, row);
  if (blocked)
    throw conflict(`Not sent: the client could not approve change order #${row.number}, as ${blocked}. Change its amount first.`);
  const job = await loadJob(tx, row.job_id, false);
  const client = (
    await tx.client.query<{ id: string; name: string; email: string }>(
      `select id, name, email from clients where tenant_id = $1 and id = $2`,
      [tx.tenantId, job.client_id],
    )
  ).rows[0];
  const account = await ensurePortalAccount(tx, client);
  const firm = (await tx.client.query<{ name: string; country: string }>(`select name, country from firms where id = $1`, [tx.tenantId]))
    .rows[0];
  const sentAt = ctx.now();
  await tx.client.query(`update change_orders set status = 'sent', sent_at = $3, updated_at = $3 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    id,
    sentAt,
  ]);
  const { token } = await createPortalLink(tx, account.id, sentAt, CHANGE_ORDER_LINK_DAYS * 24 * 60);
  const base = ctx.config.PUBLIC_URL;
  // In the client's language (theirs, else the firm's), the amount formatted for it in the firm's country.
  const reader = await clientReader(tx, client.id);
  await enqueueMail(tx, ctx.queue, {
    purposeKey: `change-order:${id}`,
    tenantId: tx.tenantId,
    to: account.email,
    sender: 'firm',
    ...changeOrderSentMail({
      firmName: firm.name,
      clientName: client.name,
      jobTitle: job.title,
      number: row.number,
      title: row.title,
      amount: formatMoney(row.amount, row.currency, localeOf(reader.language, firm.country)),
      url: `${base}/portal/sign-in/link?token=${token}&next=/portal/change-orders/${id}`,
      linkDays: CHANGE_ORDER_LINK_DAYS,
      portalUrl: `${base}/portal/sign-in`,
      language: reader.language,
    }),
  });
  await recordAudit(tx, {
    ...auditedBy(actor),
    action: 'change_order.sent',
    entity: 'change_order',
    entityId: id,
    data: { number: row.number, amount: row.amount, to: account.email },
  });
  return toView(await loadChangeOrder(tx, id));
}
