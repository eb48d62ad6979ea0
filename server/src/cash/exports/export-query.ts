import { isoDate } from '@layerbook/contracts';
import { z } from 'zod';
import { badRequest } from '../../http/problem';
import { parse } from '../../http/validate';

export const EXPORT_KINDS = ['invoices', 'payments', 'refunds', 'credit-notes', 'clients'] as const;
export type ExportKind = (typeof EXPORT_KINDS)[number];

/** The longest range one export covers: five years (an accountant's look-back; common practice, no source). */
export const MAX_RANGE_YEARS = 5;

const kindParam = z.strictObject({
  kind: z.enum(EXPORT_KINDS, { error: `Choose one of: ${EXPORT_KINDS.join(', ')}.` }),
});

const rangeQuery = z.strictObject({ from: isoDate, to: isoDate });

export interface ExportRequest {
  kind: ExportKind;
  /** firm-local dates, both days included */
  from: string;
  to: string;
}

/** The same calendar day `years` later (29 February → 1 March when that year has none). */
function yearsLater(day: string, years: number): string {
  const d = new Date(`${day}T00:00:00Z`);
  d.setUTCFullYear(d.getUTCFullYear() + years);
  return d.toISOString().slice(0, 10);
}

/** GET /api/cash/exports/:kind.csv?from=&to= — 400 naming kind, from or to. */
export function parseExportRequest(params: unknown, query: unknown): ExportRequest {
  const { kind } = parse(kindParam, params);
  const { from, to } = parse(rangeQuery, query);
  if (to < from) throw badRequest([{ field: 'to', message: 'The end date is before the start date.' }]);
  if (to >= yearsLater(from, MAX_RANGE_YEARS)) {
    throw badRequest([{ field: 'to', message: `Export at most ${MAX_RANGE_YEARS} years at a time.` }]);
  }
  return { kind, from, to };
}
