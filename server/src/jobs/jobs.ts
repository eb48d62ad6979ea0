import type {
  ItemList,
  JobDetail,
  JobStatus,
  JobSummary,
  PaymentLineRole,
  PaymentLineStatus,
  PaymentScheduleLineView,
  SnapshotPaymentTrigger,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { notFound } from '../http/problem';

const SUMMARY = `j.id, j.title, j.client_id, c.name as client_name, j.option_label, j.contract_sum::text as contract_sum, j.currency, j.status,
  j.start_date::text as start_date, j.finish_date::text as finish_date, j.created_at`;

/** The columns SUMMARY selects, as PostgreSQL hands them over (numeric and dates as text). */
interface SummaryRow {
  id: string;
  title: string;
  client_id: string;
  client_name: string;
  option_label: string;
  contract_sum: string;
  currency: string;
  status: JobStatus;
  start_date: string | null;
  finish_date: string | null;
  created_at: Date;
}

interface DetailRow extends SummaryRow {
  estimate_id: string;
  proposal_version_id: string;
  site_id: string;
  inquiry_id: string | null;
  accepted_variant_id: string;
  site_address: string | null;
}

interface LineRow {
  id: string;
  position: number;
  label: string;
  role: PaymentLineRole;
  trigger: SnapshotPaymentTrigger;
  percent: string | null;
  amount: string;
  expected_on: string | null;
  status: PaymentLineStatus;
}

const toSummary = (r: SummaryRow): JobSummary => ({
  id: r.id,
  title: r.title,
  clientId: r.client_id,
  clientName: r.client_name,
  optionLabel: r.option_label,
  contractSum: r.contract_sum,
  currency: r.currency,
  status: r.status,
  startDate: r.start_date,
  finishDate: r.finish_date,
  createdAt: r.created_at.toISOString(),
});

/** Layer names by layer id, from the accepted option's schedule milestones (`layer:<id>`). */
type LayerNames = ReadonlyMap<string, string>;

const toLine = (l: LineRow, layers: LayerNames): PaymentScheduleLineView => ({
  id: l.id,
  position: l.position,
  label: l.label,
  role: l.role,
  trigger: l.trigger,
  layerName: l.trigger.kind === 'layerComplete' ? (layers.get(l.trigger.layerId) ?? null) : null,
  percent: l.percent,
  amount: l.amount,
  expectedOn: l.expected_on,
  status: l.status,
});

/**
 * The accepted option's layer milestones by layer id (`layer:<id>` in its schedule): the layer's
 * name and the day the engine expects it done. Billing reuses it for its lines' names and dates.
 */
export async function layerMilestones(
  tx: TenantTx,
  proposalVersionId: string,
  variantId: string,
): Promise<ReadonlyMap<string, { label: string; date: string | null }>> {
  const { rows } = await tx.client.query<{ id: string; label: string; date: string | null }>(
    `select m->>'id' as id, m->>'label' as label, m->>'date' as date
       from proposal_versions v,
            jsonb_array_elements(v.snapshot->'options') o,
            jsonb_array_elements(coalesce(o->'schedule'->'milestones', '[]'::jsonb)) m
      where v.tenant_id = $1 and v.id = $2 and o->>'id' = $3 and m->>'id' like 'layer:%'`,
    [tx.tenantId, proposalVersionId, variantId],
  );
  return new Map(rows.map((m) => [m.id.slice('layer:'.length), { label: m.label, date: m.date }]));
}

/** Newest first. A firm of this size has tens of jobs a year; 200 is a page nobody reaches yet. */
export async function listJobs(tx: TenantTx): Promise<ItemList<JobSummary>> {
  const { rows } = await tx.client.query<SummaryRow>(
    `select ${SUMMARY} from jobs j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
      where j.tenant_id = $1 order by j.created_at desc, j.id desc limit 200`,
    [tx.tenantId],
  );
  return { items: rows.map(toSummary) };
}

export async function getJob(tx: TenantTx, id: string): Promise<JobDetail> {
  const { rows } = await tx.client.query<DetailRow>(
    `select ${SUMMARY}, j.estimate_id, j.proposal_version_id, j.site_id, j.inquiry_id, j.accepted_variant_id,
            concat_ws(', ', nullif(s.address_line1, ''), nullif(s.city, '')) as site_address
       from jobs j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
       join sites s on s.tenant_id = j.tenant_id and s.id = j.site_id
      where j.tenant_id = $1 and j.id = $2`,
    [tx.tenantId, id],
  );
  const r = rows[0];
  if (!r) throw notFound('job');
  // percent::text of 30.00 is "30.00"; trimmed to "30" so the apps print what was asked for.
  const lines = await tx.client.query<LineRow>(
    `select id, position, label, role, trigger, trim_scale(percent)::text as percent, amount::text as amount, expected_on::text as expected_on, status
       from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position`,
    [tx.tenantId, id],
  );
  const milestones = await layerMilestones(tx, r.proposal_version_id, r.accepted_variant_id);
  const layers: LayerNames = new Map([...milestones].map(([id, m]) => [id, m.label]));
  return {
    ...toSummary(r),
    estimateId: r.estimate_id,
    proposalVersionId: r.proposal_version_id,
    siteId: r.site_id,
    siteAddress: r.site_address ?? '',
    inquiryId: r.inquiry_id,
    acceptedVariantId: r.accepted_variant_id,
    paymentSchedule: lines.rows.map((l) => toLine(l, layers)),
  };
}
