import { clientsExport } from './clients';
import { creditNotesExport, invoicesExport } from './documents';
import type { ExportKind } from './export-query';
import type { ExportSpec } from './export-spec';
import { paymentsExport, refundsExport } from './money-movements';

/** Every export by the name in its URL. */
export const EXPORTS: Readonly<Record<ExportKind, ExportSpec<never>>> = {
  invoices: invoicesExport,
  payments: paymentsExport,
  refunds: refundsExport,
  'credit-notes': creditNotesExport,
  clients: clientsExport,
};
