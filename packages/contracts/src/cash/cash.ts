import { z } from 'zod';
import { isoDate, uuid } from '../common/fields';
import { CASH_AGING_BUCKETS } from './cash-types';

/**
 * GET /api/cash/receivables: the aging date (absent = today in the firm's zone); which clients are
 * listed: those owing most (the default) or all.
 */
export const cashReceivablesQuery = z.strictObject({ asOf: isoDate.optional(), clients: z.enum(['top', 'all']).optional() });
export type CashReceivablesQuery = z.infer<typeof cashReceivablesQuery>;

/** GET /api/cash/receivables/invoices: the drill-down — one age, one client, both or neither. */
export const cashReceivableInvoicesQuery = z.strictObject({
  asOf: isoDate.optional(),
  age: z.enum(CASH_AGING_BUCKETS, { error: `An age is one of ${CASH_AGING_BUCKETS.join(', ')}.` }).optional(),
  client: uuid('client').optional(),
});
export type CashReceivableInvoicesQuery = z.infer<typeof cashReceivableInvoicesQuery>;

/** GET /api/cash/received, /forecast and /jobs take no query. */
export const cashEmptyQuery = z.strictObject({});
