import { z } from 'zod';
import { isoDate } from '../common/fields';

/** GET /api/cash/receivables: the aging date; absent = today in the firm's zone. */
export const cashReceivablesQuery = z.strictObject({ asOf: isoDate.optional() });
export type CashReceivablesQuery = z.infer<typeof cashReceivablesQuery>;

/** GET /api/cash/received, /forecast and /jobs take no query. */
export const cashEmptyQuery = z.strictObject({});
