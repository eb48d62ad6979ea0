import Decimal from 'decimal.js';
import { AGING_BUCKETS, type AgedReceivable, type AgingBucket } from './aging';

export interface ClientAging {
  clientId: string;
  buckets: Record<AgingBucket, Decimal>;
  /** Σ buckets, retainage excluded */
  total: Decimal;
  retainage: Decimal;
  invoiceCount: number;
}

/**
 * Rolls aged invoices up per client (the aging report's customer rows; common practice, no
 * source), largest total first, then by client id for a stable order.
 */
export function agingByClient(aged: readonly AgedReceivable[], clientOf: (invoiceId: string) => string): ClientAging[] {
  const byClient = new Map<string, ClientAging>();
  for (const inv of aged) {
    const clientId = clientOf(inv.id);
    let row = byClient.get(clientId);
    if (!row) {
      const buckets = Object.fromEntries(AGING_BUCKETS.map((b) => [b, new Decimal(0)])) as Record<AgingBucket, Decimal>;
      row = { clientId, buckets, total: new Decimal(0), retainage: new Decimal(0), invoiceCount: 0 };
      byClient.set(clientId, row);
    }
    row.buckets[inv.bucket] = row.buckets[inv.bucket].plus(inv.open);
    row.total = row.total.plus(inv.open);
    row.retainage = row.retainage.plus(inv.retainage);
    row.invoiceCount += inv.invoiceCount;
  }
  return [...byClient.values()].sort(
    (a, b) => b.total.comparedTo(a.total) || (a.clientId < b.clientId ? -1 : a.clientId > b.clientId ? 1 : 0),
  );
}
