/**
 * The open invoices as of a date, with the retainage still held on each progress-billed job (kept on
 * its last issued progress application, apart from what is due). $1 tenant, $2 the as-of date.
 */
const LIVE = `('issued', 'part_paid', 'paid', 'refunded')`;

const RETAINAGE = (issuedBy: string) => `held as (
    select distinct on (i.job_id) i.job_id, i.id, i.retainage_held from invoices i
     where i.tenant_id = $1 and i.kind = 'progress' and i.status in ${LIVE} and i.retainage_held > 0 ${issuedBy}
     order by i.job_id, i.issued_at desc, i.number desc),
  released as (
    select i.job_id, sum(i.subtotal) as amount from invoices i
     where i.tenant_id = $1 and i.kind = 'retainage' and i.status in ${LIVE} ${issuedBy} group by i.job_id),
  retainage as (
    select h.id, greatest(h.retainage_held - coalesce(r.amount, 0), 0) as amount from held h left join released r on r.job_id = h.job_id)`;

const SELECT = `select i.id, i.number_text, i.client_id, c.name as client_name, i.job_id, j.title as job_title, i.due_on::text as due_on,
       b.owed::text as owed, coalesce(r.amount, 0)::text as retainage
  from balances b join invoices i on i.tenant_id = $1 and i.id = b.id
  join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id
  join clients c on c.tenant_id = i.tenant_id and c.id = i.client_id
  left join retainage r on r.id = i.id
 where i.due_on is not null and (b.owed > 0 or r.amount > 0)`;

/** As of today or later: the invoices' own running figures (index on status and due date). */
export const RECEIVABLES_NOW = `with ${RETAINAGE('')},
  balances as (
    select i.id, i.total - i.amount_paid - i.amount_credited as owed from invoices i
     where i.tenant_id = $1 and i.status in ('issued', 'part_paid', 'refunded')
    union
    select i.id, case when i.status in ('issued', 'part_paid', 'refunded') then i.total - i.amount_paid - i.amount_credited else 0 end
      from invoices i join retainage r on r.id = i.id where i.tenant_id = $1)
  ${SELECT} and $2::date is not null`;

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
  ${SELECT}`;

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
