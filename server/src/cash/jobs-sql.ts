/** The newest jobs listed (a page of them: the jobs list holds them all); the win rate and average cover every job. */
export const JOBS_LISTED = 50;

/**
 * Each job's money, the JOBS_LISTED newest first, with the accepted option's stored price breakdown;
 * $1 tenant. The limit is written into the text (a constant): as a parameter it would keep
 * PostgreSQL from settling on one plan for the prepared statement. Invoiced, credited, paid and approved change orders come from the totals the database keeps
 * per job (cash_job_totals, by triggers on invoices and change orders).
 */
export const JOB_MONEY = `with listed as materialized (select * from jobs where tenant_id = $1 order by created_at desc, id desc limit ${JOBS_LISTED}),
  -- the signed version's option, read once however many jobs share it (the estimate's result for versions made before versions kept theirs)
  prices as materialized (
    select p.version_id, p.variant_id, x.v -> 'result' -> 'price' as price
      from (select distinct proposal_version_id as version_id, accepted_variant_id as variant_id from listed) p
      join proposal_versions pv on pv.tenant_id = $1 and pv.id = p.version_id
      join estimates e on e.tenant_id = $1 and e.id = pv.estimate_id
     cross join lateral (select v from jsonb_array_elements(coalesce(pv.result, e.result) -> 'variants') as x(v)
                          where x.v ->> 'id' = p.variant_id limit 1) x)
  select j.id, j.title, j.client_id, c.name as client_name, j.status, j.original_contract_sum::text as original,
         coalesce(t.change_orders, 0)::text as change_orders, coalesce(t.issued, 0)::text as issued,
         coalesce(t.credited, 0)::text as credited, coalesce(t.paid, 0)::text as paid, pr.price
    from listed j join clients c on c.tenant_id = j.tenant_id and c.id = j.client_id
    left join cash_job_totals t on t.tenant_id = $1 and t.job_id = j.id
    left join prices pr on pr.version_id = j.proposal_version_id and pr.variant_id = j.accepted_variant_id
   order by j.created_at desc, j.id desc`;

/**
 * Σ and count of the contract sums of the jobs not cancelled (for the average), and the estimates
 * the client decided: won or declined as the estimate stands, so a first version declined and its
 * revision accepted is one estimate won, not a win and a loss.
 */
export const JOB_TOTALS = `select j.contracted_sum, j.contracted_count, e.accepted, e.declined
    from (select coalesce(sum(contract_sum), 0)::text as contracted_sum, count(*)::int as contracted_count
            from jobs where tenant_id = $1 and status <> 'cancelled') j,
         (select count(*) filter (where status = 'accepted')::int as accepted, count(*) filter (where status = 'declined')::int as declined
            from estimates where tenant_id = $1 and status in ('accepted', 'declined')) e`;

export interface JobTotalsRow {
  contracted_sum: string;
  contracted_count: number;
  accepted: number;
  declined: number;
}

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
