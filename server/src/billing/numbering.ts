import type { TenantTx } from '@layerbook/db';

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
