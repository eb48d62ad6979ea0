import type { TenantTx } from '@layerbook/db';
import { documentNumber } from '@layerbook/domain';

/** Digits a document number is padded to ("INV-0007"). */
const NUMBER_WIDTH = 4;

export type DocumentSeries = 'invoice' | 'credit_note' | 'receipt';

/**
 * The next number of one of the firm's document series (1, 2, 3 …), taken in the caller's
 * transaction: the counter row stays locked until it commits, so concurrent issuers wait their
 * turn, and a rollback gives the number back — no gap, no duplicate (a sequence would leave gaps).
 */
export async function nextDocumentNumber(tx: TenantTx, series: DocumentSeries): Promise<number> {
  const { rows } = await tx.client.query<{ n: number }>(
    `insert into document_counters (tenant_id, series, next_no) values ($1, $2, 2)
     on conflict (tenant_id, series) do update set next_no = document_counters.next_no + 1
     returning next_no - 1 as n`,
    [tx.tenantId, series],
  );
  return rows[0].n;
}

/** What issuing sets in the same statement as the number: the columns the firm's kept cash figures read. */
export interface IssuedState {
  readonly status: 'issued' | 'paid';
  readonly dueOn: string;
  readonly total: string;
}

/**
 * Issuing's last write before its audit entry: takes the next invoice number AND stamps it on the
 * invoice with its issued state in one statement, so the counter row — which every issuer of the
 * firm waits on until commit — and the kept figures' rows the invoice's triggers update (cash) are
 * held for as short a time as possible (the heavy document write happens before).
 * The text is made in SQL from the prefix's head and checked against documentNumber().
 */
export async function takeInvoiceNumber(
  tx: TenantTx,
  invoiceId: string,
  prefix: string,
  state: IssuedState,
): Promise<{ n: number; text: string }> {
  const head = documentNumber(prefix, 1, 1).slice(0, -1);
  const { rows } = await tx.client.query<{ n: number; text: string }>(
    `with counter as (
       insert into document_counters (tenant_id, series, next_no) values ($1, 'invoice', 2)
       on conflict (tenant_id, series) do update set next_no = document_counters.next_no + 1
       returning next_no - 1 as n)
     update invoices i set number = counter.n, number_text = $3 || lpad(counter.n::text, greatest($4, length(counter.n::text)), '0'),
            status = $5, due_on = $6, total = $7
       from counter where i.tenant_id = $1 and i.id = $2
     returning counter.n as n, i.number_text as text`,
    [tx.tenantId, invoiceId, head, NUMBER_WIDTH, state.status, state.dueOn, state.total],
  );
  const taken = rows[0];
  if (!taken || taken.text !== documentNumber(prefix, taken.n, NUMBER_WIDTH))
    throw new Error('The invoice number was not taken as printed.');
  return taken;
}
