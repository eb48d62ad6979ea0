import { CASH_AGING_BUCKETS, CASH_AGING_BUCKET_LABELS, type CashAgingBucket, type CashReceivables } from '@layerbook/contracts/types';

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

export const RECEIVABLE_INVOICES_URL = '/api/cash/receivables/invoices';

/**
 * The server's list of the invoices behind the drill-down. Written out with URLSearchParams: Angular's
 * HttpParams leaves a "+" as it is, which a server reads as a space (the age "90+").
 */
export function drillUrl(drill: ReceivableDrill): string {
  const query = new URLSearchParams();
  if (drill.asOf) query.set('asOf', drill.asOf);
  if (drill.age) query.set('age', drill.age);
  if (drill.clientId) query.set('client', drill.clientId);
  const text = query.toString();
  return text ? `${RECEIVABLE_INVOICES_URL}?${text}` : RECEIVABLE_INVOICES_URL;
}

/**
 * The heading over the drilled invoices: "Invoices 31–60 days late for Ada Ward". A client not among
 * those listed (a shared link) is named from the drilled invoices (`drilledName`).
 */
export function drillHeading(receivables: CashReceivables, drill: ReceivableDrill, drilledName?: string): string {
  const name = drill.clientId === null ? null : (receivables.clients.find((c) => c.clientId === drill.clientId)?.clientName ?? drilledName);
  const age = drill.age === null ? 'Open invoices' : `Invoices ${CASH_AGING_BUCKET_LABELS[drill.age].toLowerCase()}`;
  return name ? `${age} for ${name}` : age;
}
