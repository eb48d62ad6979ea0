import type { JobDetail, JobSummary, PaymentScheduleLineView } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { notFound } from '../http/problem';

const SUMMARY = `j.id, j.title, j.client_id, c.name as client_name, j.option_label, j.contract_sum::text as contract_sum, j.currency, j.status,
  j.start_date::text as start_date, j.finish_date::text as finish_date, j.created_at`;

type Row = Record<string, unknown>;

const toSummary = (r: Row): JobSummary => ({
  id: r['id'] as string,
  title: r['title'] as string,
  clientId: r['client_id'] as string,
  clientName: r['client_name'] as string,
  optionLabel: r['option_label'] as string,
  contractSum: r['contract_sum'] as string,
  currency: r['currency'] as string,
  status: r['status'] as JobSummary['status'],
  startDate: (r['start_date'] as string | null) ?? null,
  finishDate: (r['finish_date'] as string | null) ?? null,
  createdAt: (r['created_at'] as Date).toISOString(),
});

/** Newest first. A firm of this size has tens of jobs a year; 200 is a page nobody reaches yet. */
export async function listJobs(tx: TenantTx): Promise<JobSummary[]> {
  const { rows } = await tx.client.query<Row>(
    `select ${SUMMARY} from jobs j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
      where j.tenant_id = $1 order by j.created_at desc, j.id desc limit 200`,
    [tx.tenantId],
  );
  return rows.map(toSummary);
}

export async function getJob(tx: TenantTx, id: string): Promise<JobDetail> {
  const { rows } = await tx.client.query<Row>(
    `select ${SUMMARY}, j.estimate_id, j.proposal_version_id, j.site_id, j.inquiry_id, j.accepted_variant_id,
            concat_ws(', ', nullif(s.address_line1, ''), nullif(s.city, '')) as site_address
       from jobs j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
       join sites s on s.tenant_id = j.tenant_id and s.id = j.site_id
      where j.tenant_id = $1 and j.id = $2`,
    [tx.tenantId, id],
  );
  const r = rows[0];
  if (!r) throw notFound('job');
  const lines = await tx.client.query<Row>(
    `select id, position, label, role, trigger, percent::text as percent, amount::text as amount, expected_on::text as expected_on, status
       from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position`,
    [tx.tenantId, id],
  );
  return {
    ...toSummary(r),
    estimateId: r['estimate_id'] as string,
    proposalVersionId: r['proposal_version_id'] as string,
    siteId: r['site_id'] as string,
    siteAddress: (r['site_address'] as string | null) ?? '',
    inquiryId: (r['inquiry_id'] as string | null) ?? null,
    acceptedVariantId: r['accepted_variant_id'] as string,
    paymentSchedule: lines.rows.map(
      (l): PaymentScheduleLineView => ({
        id: l['id'] as string,
        position: l['position'] as number,
        label: l['label'] as string,
        role: l['role'] as PaymentScheduleLineView['role'],
        trigger: l['trigger'] as PaymentScheduleLineView['trigger'],
        percent: (l['percent'] as string | null) ?? null,
        amount: l['amount'] as string,
        expectedOn: (l['expected_on'] as string | null) ?? null,
        status: l['status'] as PaymentScheduleLineView['status'],
      }),
    ),
  };
}
