import { z } from 'zod';
import { isoDate, moneyAmount, pageQuery, requiredText, text, uuid } from '../common/fields';
import { SEARCH_MAX_LENGTH } from '../common/lists';
import { requestSchema } from '../common/schema-check';
import { BILLING_LINES_MAX } from './schedule';
import {
  INVOICE_LIMITS as L,
  INVOICE_LIST_FILTERS,
  type InvoiceDraftCreate,
  type InvoiceDraftUpdate,
  type InvoiceIssue,
  type InvoiceVoid,
  type OfflinePaymentCreate,
} from './invoice-types';

/** POST /api/jobs/:id/invoices */
export const invoiceDraftCreate = requestSchema<InvoiceDraftCreate>()(
  z.discriminatedUnion(
    'kind',
    [
      z.strictObject({ kind: z.literal('progress'), periodEnd: isoDate }),
      z.strictObject({ kind: z.literal('retainage') }),
      z.strictObject({ kind: z.literal('line'), scheduleLineId: uuid('schedule line id') }),
    ],
    { error: 'Ask for a progress invoice, a retainage release or a schedule line.' },
  ),
);

const percentToDate = z
  .number({ error: 'Enter the percent complete to date.' })
  .min(0, { error: 'Use 0 to 100.' })
  .max(100, { error: 'Use 0 to 100.' })
  .refine((n) => Number.isInteger(Math.round(n * 10_000)) && Math.abs(n * 10_000 - Math.round(n * 10_000)) < 1e-6, {
    error: 'Use at most four decimals.',
  });

/** PATCH /api/invoices/:id (drafts only); no defaults, so an absent field stays as it is. */
export const invoiceDraftUpdate = requestSchema<InvoiceDraftUpdate>()(
  z
    .strictObject({
      notes: text(L.notesMaxLength, 'The notes'),
      progressLines: z
        .array(
          z.strictObject({
            valueLineId: uuid('value line id'),
            workToDate: z.union([z.strictObject({ percent: percentToDate }), z.strictObject({ amount: moneyAmount })], {
              error: 'Give the work to date as { percent } or { amount }.',
            }),
            storedMaterials: moneyAmount,
          }),
          { error: 'Send the lines as a list.' },
        )
        .max(BILLING_LINES_MAX, { error: `At most ${BILLING_LINES_MAX} lines.` })
        .readonly(),
      periodEnd: isoDate,
    })
    .partial(),
);

/** POST /api/invoices/:id/issue */
export const invoiceIssue = requestSchema<InvoiceIssue>()(
  z.strictObject({
    issuedOn: isoDate.optional(),
    send: z.boolean({ error: 'Say whether to e-mail the invoice (send: true or false).' }),
    expectedTotal: moneyAmount.optional(),
  }),
);

/** POST /api/invoices/:id/void */
export const invoiceVoid = requestSchema<InvoiceVoid>()(
  z.strictObject({ reason: requiredText(L.reasonMaxLength, 'Say why the invoice is void.') }),
);

/** POST /api/invoices/:id/payments: an offline payment. */
export const offlinePaymentCreate = requestSchema<OfflinePaymentCreate>()(
  z.strictObject({
    method: z.enum(['cheque', 'transfer', 'cash'], { error: 'Choose cheque, transfer or cash.' }),
    amount: moneyAmount,
    receivedOn: isoDate,
    reference: text(L.referenceMaxLength, 'The reference'),
    clientKey: z
      .string({ error: 'The payment key must be text.' })
      .min(1, { error: 'The payment key cannot be empty.' })
      .max(L.clientKeyMaxLength, { error: `Use at most ${L.clientKeyMaxLength} characters.` })
      .optional(),
  }),
);

/** GET /api/invoices?filter=&q=&after=&limit= */
export const invoiceListQuery = z.strictObject({
  filter: z.enum(INVOICE_LIST_FILTERS, { error: 'Unknown filter.' }).default('all'),
  q: z
    .string()
    .trim()
    .max(SEARCH_MAX_LENGTH, { error: `Search with at most ${SEARCH_MAX_LENGTH} characters.` })
    .optional(),
  ...pageQuery,
});

export type InvoiceListQuery = z.infer<typeof invoiceListQuery>;
