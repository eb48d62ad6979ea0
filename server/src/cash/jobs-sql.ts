/** Each job's money, newest first, with the accepted option's stored price breakdown; $1 tenant, $2 row limit. */
export const JOB_MONEY = `with listed as (select * from jobs where tenant_id = $1 order by created_at desc, id desc limit $2),
  -- each estimate's option read once, however many jobs share it
  prices as (
    select p.estimate_id, p.variant_id,
           (select x.v -> 'result' -> 'price' from estimates e cross join jsonb_array_elements(e.result -> 'variants') as x(v)
             where e.tenant_id = $1 and e.id = p.estimate_id and x.v ->> 'id' = p.variant_id limit 1) as price
      from (select distinct estimate_id, accepted_variant_id as variant_id from listed) p)
  select j.id, j.title, j.client_id, c.name as client_name, j.status, j.original_contract_sum::text as original,
         coalesce(co.amount, 0)::text as change_orders, coalesce(inv.issued, 0)::text as issued,
         coalesce(inv.credited, 0)::text as credited, coalesce(inv.paid, 0)::text as paid, pr.price
    from listed j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
    cross join lateral (select sum(i.total) as issued, sum(i.amount_credited) as credited, sum(i.amount_paid) as paid from invoices i
                         where i.tenant_id = $1 and i.job_id = j.id and i.status <> 'draft') inv
    cross join lateral (select sum(o.amount) as amount from change_orders o
                         where o.tenant_id = $1 and o.job_id = j.id and o.status = 'approved') co
    left join prices pr on pr.estimate_id = j.estimate_id and pr.variant_id = j.accepted_variant_id
   order by j.created_at desc, j.id desc`;

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
