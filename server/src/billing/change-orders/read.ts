import type { ChangeOrderStatus, ChangeOrderSummary, ChangeOrderTaxNote, ChangeOrderView, ItemList } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { notFound } from '../../http/problem';
import type { StoredDetail } from './pricing';

/** A change order row with its job's figures, numerics as text. */
export interface ChangeOrderRow {
  id: string;
  job_id: string;
  number: number;
  title: string;
  description: string;
  pricing: 'lumpSum' | 'engine';
  price: string;
  tax: string;
  amount: string;
  detail: StoredDetail;
  status: ChangeOrderStatus;
  sent_at: Date | null;
  decided_at: Date | null;
  signed_name: string | null;
  client_comment: string;
  currency: string;
  contract_sum: string;
  client_id: string;
  job_title: string;
}

const COLUMNS = `co.id, co.job_id, co.number, co.title, co.description, co.pricing, co.price::text as price, co.tax::text as tax,
  co.amount::text as amount, co.detail, co.status, co.sent_at, co.decided_at, co.signed_name, co.client_comment,
  j.currency, j.contract_sum::text as contract_sum, j.client_id, j.title as job_title`;
const FROM = `from change_orders co join jobs j on j.tenant_id = co.tenant_id and j.id = co.job_id`;

/** One change order of this firm (optionally locked with its job), or 404. */
export async function loadChangeOrder(tx: TenantTx, id: string, lock = false): Promise<ChangeOrderRow> {
  const { rows } = await tx.client.query<ChangeOrderRow>(
    `select ${COLUMNS} ${FROM} where co.tenant_id = $1 and co.id = $2 ${lock ? 'for update of co, j' : ''}`,
    [tx.tenantId, id],
  );
  if (!rows[0]) throw notFound('change order');
  return rows[0];
}

export function toSummary(r: ChangeOrderRow): ChangeOrderSummary {
  return {
    id: r.id,
    jobId: r.job_id,
    number: r.number,
    title: r.title,
    status: r.status,
    currency: r.currency,
    price: r.price,
    tax: r.tax,
    amount: r.amount,
    sentAt: r.sent_at?.toISOString() ?? null,
    decidedAt: r.decided_at?.toISOString() ?? null,
  };
}

/**
 * The full view. Before approval the sums are the job's contract sum today and that sum moved by
 * this change order; an approved one shows the sums frozen when the client signed.
 */
export function toView(r: ChangeOrderRow): ChangeOrderView {
  const d = r.detail;
  const digits = minorUnitDigits(r.currency);
  const isFrozen = r.status === 'approved' && d.contractSumBefore !== undefined && d.contractSumAfter !== undefined;
  const before = new Decimal(isFrozen ? d.contractSumBefore : r.contract_sum);
  const after = isFrozen ? new Decimal(d.contractSumAfter) : before.plus(r.amount);
  return {
    ...toSummary(r),
    jobTitle: r.job_title,
    description: r.description,
    pricingKind: r.pricing,
    pricing:
      r.pricing === 'lumpSum'
        ? { kind: 'lumpSum', price: r.price }
        : { kind: 'engine', surfaceIds: d.surfaceIds ?? [], finishSystemId: d.finishSystemId ?? '' },
    engine: d.engine ?? null,
    signedName: r.signed_name,
    clientComment: r.client_comment,
    contractSumBefore: before.toFixed(digits),
    contractSumAfter: after.toFixed(digits),
    taxNote: taxNote(r),
  };
}

function taxNote(r: ChangeOrderRow): ChangeOrderTaxNote | null {
  const mode = r.detail.taxMode;
  if (r.pricing !== 'lumpSum' || !mode || mode === 'wholeJob') return null;
  return mode === 'materials' ? 'materialsOnly' : 'noTax';
}

/** The job's change orders by number (404 for a job this firm does not have). */
export async function listChangeOrders(tx: TenantTx, jobId: string): Promise<ItemList<ChangeOrderSummary>> {
  const job = await tx.client.query(`select 1 from jobs where tenant_id = $1 and id = $2`, [tx.tenantId, jobId]);
  if (!job.rowCount) throw notFound('job');
  return { items: await changeOrderSummaries(tx, jobId) };
}

/** For the job's billing view (H2): the change orders of a job, by number. */
export async function changeOrderSummaries(tx: TenantTx, jobId: string): Promise<ChangeOrderSummary[]> {
  const { rows } = await tx.client.query<ChangeOrderRow>(
    `select ${COLUMNS} ${FROM} where co.tenant_id = $1 and co.job_id = $2 order by co.number`,
    [tx.tenantId, jobId],
  );
  return rows.map(toSummary);
}
