import { moneyOut } from '../../billing/money';
import { type ExportSpec, firmDate } from './export-spec';
import { neutralise } from './neutralise';

interface ClientRow {
  name: string;
  kind: string;
  email: string;
  phone: string;
  added_on: string;
  currency: string;
  invoiced: string;
  credited: string;
  received: string;
  refunded: string;
  net_received: string;
  amount_due: string;
}

/**
 * The clients the range concerns — added in it, or invoiced, credited, paid or refunded in it —
 * one row per client and currency, with the range's totals on the same rules as the other files
 * (so each column adds up to that file's column): invoiced = invoices issued, credited = credit
 * notes issued, received = payments received, refunded = succeeded refunds, net received =
 * received − refunded (negative when more went back than came in). Amount due is today's, on
 * every open invoice of the client whenever issued.
 */
export const clientsExport: ExportSpec<ClientRow> = {
  header: [
    'Client',
    'Kind',
    'Email',
    'Phone',
    'Added on',
    'Currency',
    'Invoiced',
    'Credited',
    'Received',
    'Refunded',
    'Net received',
    'Amount due today',
  ],
  sql: `with inv as (
      select client_id, currency, sum(total) as invoiced from invoices
       where tenant_id = $1 and issued_on between $2::date and $3::date group by client_id, currency),
    cn as (
      select i.client_id, cn.currency, sum(cn.amount) as credited from credit_notes cn
        join invoices i on i.tenant_id = cn.tenant_id and i.id = cn.invoice_id
       where cn.tenant_id = $1 and cn.issued_on between $2::date and $3::date group by i.client_id, cn.currency),
    pay as (
      select client_id, currency, sum(amount) as received from payments
       where tenant_id = $1 and received_on between $2::date and $3::date group by client_id, currency),
    ref as (
      select client_id, currency, sum(amount) as refunded from refunds
       where tenant_id = $1 and status = 'succeeded' and refunded_on between $2::date and $3::date group by client_id, currency),
    added as (
      select c.id as client_id, f.currency from clients c join firms f on f.id = c.tenant_id
       where c.tenant_id = $1 and ${firmDate('c.created_at')} between $2::date and $3::date),
    keys as (
      select client_id, currency from inv union select client_id, currency from cn union select client_id, currency from pay
      union select client_id, currency from ref union select client_id, currency from added),
    due as (
      select client_id, currency, sum(total - amount_paid - amount_credited) as amount_due from invoices
       where tenant_id = $1 and status not in ('draft', 'void') and client_id in (select client_id from keys)
       group by client_id, currency)
    select c.name, c.kind, c.email, c.phone, ${firmDate('c.created_at')}::text as added_on, k.currency,
      coalesce(inv.invoiced, 0)::text as invoiced, coalesce(cn.credited, 0)::text as credited,
      coalesce(pay.received, 0)::text as received, coalesce(ref.refunded, 0)::text as refunded,
      (coalesce(pay.received, 0) - coalesce(ref.refunded, 0))::text as net_received, coalesce(due.amount_due, 0)::text as amount_due
    from keys k
    join clients c on c.tenant_id = $1 and c.id = k.client_id
    left join inv on inv.client_id = k.client_id and inv.currency = k.currency
    left join cn on cn.client_id = k.client_id and cn.currency = k.currency
    left join pay on pay.client_id = k.client_id and pay.currency = k.currency
    left join ref on ref.client_id = k.client_id and ref.currency = k.currency
    left join due on due.client_id = k.client_id and due.currency = k.currency
    order by c.name, c.id, k.currency`,
  toCells: (r) => [
    neutralise(r.name),
    r.kind,
    neutralise(r.email),
    neutralise(r.phone),
    r.added_on,
    r.currency,
    moneyOut(r.invoiced, r.currency),
    moneyOut(r.credited, r.currency),
    moneyOut(r.received, r.currency),
    moneyOut(r.refunded, r.currency),
    moneyOut(r.net_received, r.currency),
    moneyOut(r.amount_due, r.currency),
  ],
};
