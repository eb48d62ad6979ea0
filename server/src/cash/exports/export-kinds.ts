import { clientsExport } from './clients';
import { creditNotesExport, invoicesExport } from './documents';
import type { ExportKind } from './export-query';
import type { ExportSpec } from './export-spec';
import { paymentsExport, refundsExport } from './money-movements';

/**
 * Every export by the name in its URL. Each spec's rows only ever go back to its own `toCells`, so
 * the table forgets the row types (`never`: any spec fits) rather than widening them to unknown.
 */
export const EXPORTS: Readonly<Record<ExportKind, ExportSpec<never>>> = {
  invoices: invoicesExport,
  payments: paymentsExport,
  refunds: refundsExport,
  'credit-notes': creditNotesExport,
  clients: clientsExport,
};
