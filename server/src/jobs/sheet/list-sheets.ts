import type { ItemList, JobSheetSummary, JobStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';

interface SheetRow {
  id: string;
  title: string;
  site_address: string;
  status: JobStatus;
  start_date: string | null;
  finish_date: string | null;
  layers_done: number;
  layers_total: number;
}

/**
 * The jobs a crew works on now (scheduled and in progress), soonest start first, each with how many
 * of its layers are done. A firm runs tens of jobs at a time at most; 200 is a page nobody reaches.
 */
export async function listSheets(tx: TenantTx): Promise<ItemList<JobSheetSummary>> {
  const { rows } = await tx.client.query<SheetRow>(
    `select j.id, j.title, concat_ws(', ', nullif(s.address_line1, ''), nullif(s.city, '')) as site_address, j.status,
            j.start_date::text as start_date, j.finish_date::text as finish_date,
            count(w.id) filter (where w.done_on is not null)::int as layers_done, count(w.id)::int as layers_total
       from jobs j
       join sites s on s.tenant_id = j.tenant_id and s.id = j.site_id
       left join job_work_items w on w.tenant_id = j.tenant_id and w.job_id = j.id
      where j.tenant_id = $1 and j.status in ('scheduled', 'in_progress')
      group by j.id, s.id
      order by j.start_date nulls last, j.created_at, j.id
      limit 200`,
    [tx.tenantId],
  );
  return {
    items: rows.map((r) => ({
      id: r.id,
      title: r.title,
      siteAddress: r.site_address,
      status: r.status,
      startDate: r.start_date,
      finishDate: r.finish_date,
      layersDone: r.layers_done,
      layersTotal: r.layers_total,
    })),
  };
}
