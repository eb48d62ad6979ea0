/**
 * The open invoices as of a date, with the retainage still held on each progress-billed job (kept on
 * its last issued progress application, apart from what is due: held there less releases billed,
 * as billing's retainageHeld reads it). Each query below starts from `owed_rows` (id, client_id,
 * job_id, due_on, owed ≥ 0, retainage ≥ 0): $1 tenant, $2 the as-of date.
 */
const LIVE = `('issued', 'part_paid', 'paid', 'refunded')`;
const OPEN = `('issued', 'part_paid', 'refunded')`;

/** Live on the as-of date $2: issued, and not voided by then (a credit note dated later leaves it live that day). */
const LIVE_AS_OF = `i.status <> 'draft' and not exists (select 1 from credit_notes n
                     where n.tenant_id = i.tenant_id and n.invoice_id = i.id and n.issued_on <= $2::date)`;

const RETAINAGE = (issuedBy: string, live = `i.status in ${LIVE}`) => `held as (
    select j.id as job_id, h.id, h.retainage_held from jobs j
     cross join lateral (select i.id, i.retainage_held from invoices i
                          where i.tenant_id = $1 and i.job_id = j.id and i.kind = 'progress' and ${live} ${issuedBy}
                          order by i.issued_at desc, i.number desc limit 1) h
     where j.tenant_id = $1 and j.billing_method = 'progress' and h.retainage_held > 0),
  released as (
    select i.job_id, sum(i.subtotal) as amount from held h
      join invoices i on i.tenant_id = $1 and i.job_id = h.job_id and i.kind = 'retainage' and ${live} ${issuedBy}
     group by i.job_id),
  retainage as (
    select h.id, greatest(h.retainage_held - coalesce(r.amount, 0), 0) as amount from held h left join released r on r.job_id = h.job_id)`;

/** As of today or later: the invoices' own running figures (index on status and due date). */
const OWED_NOW = `with ${RETAINAGE('')},
  owed_rows as (
    select i.id, i.client_id, i.job_id, i.due_on, greatest(i.total - i.amount_paid - i.amount_credited, 0) as owed,
           coalesce(r.amount, 0) as retainage
      from invoices i left join retainage r on r.id = i.id
     where i.tenant_id = $1 and i.status in ${OPEN} and i.due_on is not null and $2::date is not null
       and (i.total - i.amount_paid - i.amount_credited > 0 or r.amount > 0)
    union all
    select i.id, i.client_id, i.job_id, i.due_on, 0, r.amount
      from retainage r join invoices i on i.tenant_id = $1 and i.id = r.id
     where i.status not in ${OPEN} and i.due_on is not null and r.amount > 0)`;

/**
 * As of a past date: invoices issued by then, less payments received by then, refunds given by then
 * (succeeded; only the part that came off the invoice — the part taken from the client's credit, its
 * negative client_credits row, was never the invoice's) and credit notes issued by then.
 */
const OWED_AS_OF = `with ${RETAINAGE('and i.issued_on <= $2::date', LIVE_AS_OF)},
  paid as (select p.invoice_id, sum(p.amount_applied) as amount from payments p
            where p.tenant_id = $1 and p.received_on <= $2::date group by p.invoice_id),
  refunded as (select f.invoice_id, sum(f.amount + coalesce(c.amount, 0)) as amount from refunds f
              left join lateral (select sum(c.amount) as amount from client_credits c
                                  where c.tenant_id = f.tenant_id and c.payment_id = f.payment_id and c.meta->>'refundId' = f.id::text) c on true
            where f.tenant_id = $1 and f.status = 'succeeded' and f.refunded_on <= $2::date group by f.invoice_id),
  credited as (select n.invoice_id, sum(n.amount) as amount from credit_notes n
            where n.tenant_id = $1 and n.issued_on <= $2::date group by n.invoice_id),
  balances as (
    select i.id, i.client_id, i.job_id, i.due_on,
           i.total - greatest(coalesce(p.amount, 0) - coalesce(f.amount, 0), 0) - coalesce(n.amount, 0) as owed
      from invoices i left join paid p on p.invoice_id = i.id left join refunded f on f.invoice_id = i.id
      left join credited n on n.invoice_id = i.id
     where i.tenant_id = $1 and i.status <> 'draft' and i.issued_on <= $2::date and i.due_on is not null),
  owed_rows as (
    select b.id, b.client_id, b.job_id, b.due_on, greatest(b.owed, 0) as owed, coalesce(r.amount, 0) as retainage
      from balances b left join retainage r on r.id = b.id
     where b.owed > 0 or r.amount > 0)`;

const owed = (past: boolean) => (past ? OWED_AS_OF : OWED_NOW);

/** The age of a due date: $3–$6 the first due date of the ages 'current', '1-30', '31-60' and '61-90'; anything older is '90+'. */
const AGE = (due: string) =>
  `case when ${due} >= $3::date then 0 when ${due} >= $4::date then 1 when ${due} >= $5::date then 2 when ${due} >= $6::date then 3 else 4 end`;

/**
 * The answer from `owed_rows` (`count`: how many invoices one of its rows stands for): the firm's sums
 * per age (part 'f', with how many clients owe anything), then the sums per age of the $7 clients
 * owing most (part 'c'; largest total, retainage apart, then client id, as packages/domain's
 * agingByClient orders them; $7 null: every client). The latest due date in each sum stands for it
 * (every date in one age ages the same). Only the chosen clients' rows are split by age and named.
 */
const FIRM_AND_CLIENTS = (count: string) => `owing as (select o.client_id, sum(o.owed) as total from owed_rows o group by o.client_id),
  chosen as (select client_id from owing order by total desc, client_id limit $7::int)
  select 'f' as part, null::uuid as client_id, null::text as client_name, max(o.due_on)::text as due_on, sum(o.owed)::text as owed,
         sum(o.retainage)::text as retainage, ${count} as invoice_count, (select count(*) from owing)::int as client_count
    from owed_rows o group by ${AGE('o.due_on')}
  union all
  select 'c', o.client_id, c.name, max(o.due_on)::text, sum(o.owed)::text, sum(o.retainage)::text, ${count}, null
    from owed_rows o join chosen h on h.client_id = o.client_id join clients c on c.tenant_id = $1 and c.id = o.client_id
   group by o.client_id, c.name, ${AGE('o.due_on')}`;

/** As of a past date, summed from the base tables ($3–$6 as in AGE: packages/domain's bucketDueDates; $7 as in FIRM_AND_CLIENTS). */
const RECEIVABLES_AS_OF = `${OWED_AS_OF},
  ${FIRM_AND_CLIENTS('count(*)::int')}`;

/**
 * As of today or later, the same answer from the open balances the database keeps (kept by a trigger
 * on invoices): the firm's ages from the sums per due date (cash_open_due_days), the clients owing
 * most from the sums per client (cash_open_clients), and only those clients' sums per due date
 * (cash_open_balances) split by age — plus the retainage still held, read from the progress jobs'
 * invoices as above. An invoice holding retainage that is also owed on is already counted in its
 * balance (same client and due date, so the same sum); only the others add to the count.
 */
const RECEIVABLES_KEPT = `with ${RETAINAGE('')},
  retained as (
    select i.client_id, i.due_on, r.amount,
           case when i.status in ${OPEN} and i.total - i.amount_paid - i.amount_credited > 0 then 0 else 1 end as extra
      from retainage r join invoices i on i.tenant_id = $1 and i.id = r.id
     where i.due_on is not null and r.amount > 0),
  owing as (
    select x.client_id, sum(x.owed) as total from (
        select o.client_id, o.owed from cash_open_clients o where o.tenant_id = $1 and $2::date is not null
        union all
        select r.client_id, 0 from retained r) x
     group by x.client_id),
  chosen as (select client_id from owing order by total desc, client_id limit $7::int)
  select 'f' as part, null::uuid as client_id, null::text as client_name, max(f.due_on)::text as due_on, sum(f.owed)::text as owed,
         sum(f.retainage)::text as retainage, sum(f.n)::int as invoice_count, (select count(*) from owing)::int as client_count
    from (select d.due_on, d.owed, 0 as retainage, d.invoice_count as n from cash_open_due_days d where d.tenant_id = $1
          union all
          select r.due_on, 0, r.amount, r.extra from retained r) f
   group by ${AGE('f.due_on')}
  union all
  select 'c', a.client_id, c.name, a.due_on::text, a.owed::text, a.retainage::text, a.n, null
    from (select o.client_id, max(o.due_on) as due_on, sum(o.owed) as owed, sum(o.retainage) as retainage, sum(o.n)::int as n
            from (select b.client_id, b.due_on, b.owed, 0 as retainage, b.invoice_count as n
                    from chosen h join cash_open_balances b on b.tenant_id = $1 and b.client_id = h.client_id
                  union all
                  select r.client_id, r.due_on, 0, r.amount, r.extra from retained r join chosen h on h.client_id = r.client_id) o
           group by o.client_id, ${AGE('o.due_on')}) a
    join clients c on c.tenant_id = $1 and c.id = a.client_id`;

/** The firm's and the chosen clients' sums per age ($1 tenant, $2 as-of date, $3–$6 as in AGE, $7 how many clients or null). */
export const receivablesByClientAge = (past: boolean) => (past ? RECEIVABLES_AS_OF : RECEIVABLES_KEPT);

/** One row per open invoice: $3 a client or null, $4–$5 due dates from and to (either null: no bound). */
export const receivableInvoices = (past: boolean) => `${owed(past)}
  select o.id, i.number_text, o.client_id, c.name as client_name, o.job_id, j.title as job_title, o.due_on::text as due_on,
         o.owed::text as owed, o.retainage::text as retainage
    from owed_rows o join invoices i on i.tenant_id = $1 and i.id = o.id
    join jobs j on j.tenant_id = $1 and j.id = o.job_id join clients c on c.tenant_id = $1 and c.id = o.client_id
   where ($3::uuid is null or o.client_id = $3::uuid) and ($4::date is null or o.due_on >= $4::date)
     and ($5::date is null or o.due_on <= $5::date)`;

export interface ReceivableSumRow {
  /** 'f': the firm's sum of one age; 'c': one chosen client's */
  part: 'f' | 'c';
  client_id: string | null;
  client_name: string | null;
  due_on: string;
  owed: string;
  retainage: string;
  invoice_count: number;
  /** on the firm's rows: how many clients owe anything (retainage included) */
  client_count: number | null;
}

export interface ReceivableRow {
  id: string;
  number_text: string;
  client_id: string;
  client_name: string;
  job_id: string;
  job_title: string;
  due_on: string;
  owed: string;
  retainage: string;
}
