import type { TenantTx } from '@layerbook/db';
import type { Config } from '../config';
import type { JobQueue } from '../queue/job-queue';

export type InvoiceMailPurpose =
  | { readonly kind: 'issued' }
  | { readonly kind: 'reminder'; readonly step: string }
  | { readonly kind: 'creditNote'; readonly creditNoteId: string };

/**
 * E-mails the client about an issued invoice (its PDF link and a portal link), a reminder step, or
 * a credit note, through the outbox in the caller's transaction. The purpose key makes each
 * (invoice, purpose) go once. OWNER: helper H5 (replaces this stub).
 */
export async function enqueueInvoiceMail(
  _tx: TenantTx,
  _queue: JobQueue,
  _config: Config,
  _invoiceId: string,
  _purpose: InvoiceMailPurpose,
): Promise<void> {
  throw new Error('enqueueInvoiceMail: not built yet');
}
