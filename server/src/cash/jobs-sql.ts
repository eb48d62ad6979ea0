/** Each job's money, newest first, with the accepted option's stored price breakdown; $1 tenant, $2 row limit. */
export const JOB_MONEY = `with inv as (
    select job_id, sum(total) as issued, sum(amount_credited) as credited, sum(amount_paid) as paid from invoices
     where tenant_id = $1 and status <> 'draft' group by job_id),
  co as (select job_id, sum(amount) as amount from change_orders where tenant_id = $1 and status = 'approved' group by job_id)
  select j.id, j.title, j.client_id, c.name as client_name, j.status, j.original_contract_sum::text as original,
         coalesce(co.amount, 0)::text as change_orders, coalesce(inv.issued, 0)::text as issued,
         coalesce(inv.credited, 0)::text as credited, coalesce(inv.paid, 0)::text as paid,
         (select x.v -> 'result' -> 'price' from jsonb_array_elements(e.result -> 'variants') as x(v)
           where x.v ->> 'id' = j.accepted_variant_id limit 1) as price
    from jobs j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
    left join inv on inv.job_id = j.id left join co on co.job_id = j.id
    left join estimates e on e.tenant_id = j.tenant_id and e.id = j.estimate_id
   where j.tenant_id = $1
   order by j.created_at desc, j.id limit $2`;

/** Σ contract sums of the jobs not cancelled (for the average), and the decided proposals. */
export const JOB_TOTALS = `select
    (select coalesce(array_agg(contract_sum::text), '{}') from jobs where tenant_id = $1 and status <> 'cancelled') as contracted,
    (select count(*)::int from proposal_versions where tenant_id = $1 and status = 'accepted') as accepted,
    (select count(*)::int from proposal_versions where tenant_id = $1 and status = 'declined') as declined`;

/** The stored estimate's price breakdown (decimal strings). */
export interface StoredPrice {
  price?: string;
  total?: string;
  labour?: string;
  materialsCost?: string;
  equipment?: string;
  subcontracts?: string;
  sundries?: string;
}

export interface JobMoneyRow {
  id: string;
  title: string;
  client_id: string;
  client_name: string;
  status: string;
  original: string;
  change_orders: string;
  issued: string;
  credited: string;
  paid: string;
  price: StoredPrice | null;
}
