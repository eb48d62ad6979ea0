import {
  CASH_AGING_BUCKETS,
  CASH_AGING_BUCKET_LABELS,
  type CashAgingBucket,
  type CashReceivableInvoice,
  type CashReceivables,
} from '@layerbook/contracts/types';

/** What the owner drilled into: one age, one client, both or neither; kept in the address bar. */
export interface ReceivableDrill {
  readonly age: CashAgingBucket | null;
  readonly clientId: string | null;
  readonly asOf: string | null;
}

const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

export function drillFromParams(params: Readonly<Record<string, unknown>>): ReceivableDrill {
  const age = CASH_AGING_BUCKETS.find((bucket) => bucket === params['age']) ?? null;
  const client = params['client'];
  const asOf = params['asOf'];
  return {
    age,
    clientId: typeof client === 'string' && client !== '' ? client : null,
    asOf: typeof asOf === 'string' && ISO_DAY.test(asOf) ? asOf : null,
  };
}

export function drillToParams(drill: ReceivableDrill): Record<string, string | null> {
  return { age: drill.age, client: drill.clientId, asOf: drill.asOf };
}

/** The invoices behind the drill-down, most overdue first. */
export function drilledInvoices(receivables: CashReceivables, drill: ReceivableDrill): CashReceivableInvoice[] {
  return receivables.invoices
    .filter(
      (invoice) => (drill.age === null || invoice.bucket === drill.age) && (drill.clientId === null || invoice.clientId === drill.clientId),
    )
    .sort((a, b) => b.daysPastDue - a.daysPastDue || a.number.localeCompare(b.number));
}

/** The heading over the drilled invoices: "Invoices 31–60 days late for Ada Ward". */
export function drillHeading(receivables: CashReceivables, drill: ReceivableDrill): string {
  const client = drill.clientId === null ? null : receivables.clients.find((c) => c.clientId === drill.clientId);
  const age = drill.age === null ? 'Open invoices' : `Invoices ${CASH_AGING_BUCKET_LABELS[drill.age].toLowerCase()}`;
  return client ? `${age} for ${client.clientName}` : age;
}
