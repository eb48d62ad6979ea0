import { Readable, type Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { TenantTx } from '@layerbook/db';
import { stringify } from 'csv-stringify';
import type { ExportSpec } from './export-spec';

/** Rows fetched per round trip: enough to keep the connection busy, few enough to hold (common practice, no source). */
export const EXPORT_BATCH_ROWS = 1000;

/**
 * The spec's rows, a batch at a time, through a server-side cursor in the caller's transaction.
 * A cursor rather than keyset pages because the whole file then reads one snapshot (taken at
 * DECLARE, PostgreSQL "DECLARE"): a payment recorded halfway through an export can neither appear
 * twice nor make the files disagree. Only one batch is held at a time, and the next is fetched only
 * when the reader has taken the last (the generator is pulled by the stream below).
 */
async function* cursorRows<R>(tx: TenantTx, spec: ExportSpec<R>, values: readonly unknown[]): AsyncGenerator<string[]> {
  await tx.client.query(`declare cash_export no scroll cursor for ${spec.sql}`, [...values]);
  for (;;) {
    const { rows } = await tx.client.query<R & object>(`fetch forward ${EXPORT_BATCH_ROWS} from cash_export`);
    for (const row of rows) yield spec.toCells(row);
    if (rows.length < EXPORT_BATCH_ROWS) return;
  }
}

/**
 * Writes the export to `out` as CSV (RFC 4180 quoting by csv-stringify, a header row first, CRLF
 * line ends as RFC 4180 asks) with back-pressure: a slow download slows the fetching, it never
 * piles rows up in memory. Resolves when the last row is written; rejects (and leaves `out`
 * destroyed) if the reader goes away or a query fails.
 */
export async function streamCsv<R>(
  tx: TenantTx,
  spec: ExportSpec<R>,
  values: readonly [tenantId: string, from: string, to: string],
  out: Writable,
): Promise<void> {
  // The byte-order mark tells spreadsheets the file is UTF-8, so accented names open right (common practice, no source).
  const csv = stringify({ header: true, columns: [...spec.header], record_delimiter: 'windows', bom: true });
  await pipeline(Readable.from(cursorRows(tx, spec, values)), csv, out);
}
