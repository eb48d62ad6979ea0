/**
 * The open invoices as of a date, with the retainage still held on each progress-billed job (kept on
 * its last issued progress application, apart from what is due: held there less releases billed,
 * as billing's retainageHeld reads it). $1 tenant, $2 the as-of date.
 */
const LIVE = `('issued', 'part_paid', 'paid', 'refunded')`;
const OPEN = `('issued', 'part_paid', 'refunded')`;

const RETAINAGE = (issuedBy: string) => `held as (
    select j.id as job_id, h.id, h.retainage_held from jobs j
     cross join lateral (select i.id, i.retainage_held from invoices i
                          where i.tenant_id = $1 and i.job_id = j.id and i.kind = 'progress' and i.status in ${LIVE} ${issuedBy}
                          order by i.issued_at desc, i.number desc limit 1) h
     where j.tenant_id = $1 and j.billing_method = 'progress' and h.retainage_held > 0),
  released as (
    select i.job_id, sum(i.subtotal) as amount from held h
      join invoices i on i.tenant_id = $1 and i.job_id = h.job_id and i.kind = 'retainage' and i.status in ${LIVE} ${issuedBy}
     group by i.job_id),
  retainage as (
    select h.id, greatest(h.retainage_held - coalesce(r.amount, 0), 0) as amount from held h left join released r on r.job_id = h.job_id)`;

const COLUMNS = `i.id, i.number_text, i.client_id, c.name as client_name, i.job_id, j.title as job_title, i.due_on::text as due_on`;
const JOINS = `join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id`;

/** As of today or later: the invoices' own running figures (index on status and due date). */
export const RECEIVABLES_NOW = `with ${RETAINAGE('')}
  select ${COLUMNS}, (i.total - i.amount_paid - i.amount_credited)::text as owed, coalesce(r.amount, 0)::text as retainage
    from invoices i ${JOINS} left join retainage r on r.id = i.id
   where i.tenant_id = $1 and i.status in ${OPEN} and i.due_on is not null and $2::date is not null
     and (i.total - i.amount_paid - i.amount_credited > 0 or r.amount > 0)
  union all
  select ${COLUMNS}, '0', r.amount::text
    from retainage r join invoices i on i.tenant_id = $1 and i.id = r.id ${JOINS}
   where i.status not in ${OPEN} and i.due_on is not null and r.amount > 0`;

/**
 * As of a past date: invoices issued by then, less payments received by then, refunds given by then
 * (succeeded) and credit notes issued by then.
 */
export const RECEIVABLES_AS_OF = `with ${RETAINAGE('and i.issued_on <= $2::date')},
  paid as (select p.invoice_id, sum(p.amount_applied) as amount from payments p
            where p.tenant_id = $1 and p.received_on <= $2::date group by p.invoice_id),
  refunded as (select f.invoice_id, sum(f.amount) as amount from refunds f
            where f.tenant_id = $1 and f.status = 'succeeded' and f.refunded_on <= $2::date group by f.invoice_id),
  credited as (select n.invoice_id, sum(n.amount) as amount from credit_notes n
            where n.tenant_id = $1 and n.issued_on <= $2::date group by n.invoice_id),
  balances as (
    select i.id, i.total - greatest(coalesce(p.amount, 0) - coalesce(f.amount, 0), 0) - coalesce(n.amount, 0) as owed
      from invoices i left join paid p on p.invoice_id = i.id left join refunded f on f.invoice_id = i.id
      left join credited n on n.invoice_id = i.id
     where i.tenant_id = $1 and i.status <> 'draft' and i.issued_on <= $2::date)
  select ${COLUMNS}, b.owed::text as owed, coalesce(r.amount, 0)::text as retainage
    from balances b join invoices i on i.tenant_id = $1 and i.id = b.id ${JOINS}
    left join retainage r on r.id = i.id
   where i.due_on is not null and (b.owed > 0 or r.amount > 0)`;

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
