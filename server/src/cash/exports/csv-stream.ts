import { Readable, type Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { TenantTx } from '@layerbook/db';
import { stringify, type Options } from 'csv-stringify/sync';
import type { ExportSpec } from './export-spec';

/** Rows fetched per round trip: enough to keep the connection busy, few enough to hold (common practice, no source). */
export const EXPORT_BATCH_ROWS = 1000;

/** RFC 4180 §2: CRLF after each record; csv-stringify quotes a cell holding a comma, a quote or a line break. */
const CSV: Options = { record_delimiter: 'windows' };

/** The byte-order mark tells spreadsheets the file is UTF-8, so accented names open right (common practice, no source). */
const BOM = '\uFEFF';

/**
 * The file, a piece at a time: the BOM and header row, then each batch of rows as CSV text. The
 * rows come through a server-side cursor in the caller's transaction rather than keyset pages, so
 * the whole file reads one snapshot (taken at DECLARE, PostgreSQL "DECLARE"): a payment recorded
 * halfway through an export can neither appear twice nor make the files disagree. One batch is
 * held at a time, and the next is fetched only when the reader has taken the last.
 */
async function* csvPieces<R>(tx: TenantTx, spec: ExportSpec<R>, values: readonly unknown[]): AsyncGenerator<string> {
  yield BOM + stringify([[...spec.header]], CSV);
  await tx.client.query(`declare cash_export no scroll cursor for ${spec.sql}`, [...values]);
  for (;;) {
    const { rows } = await tx.client.query<R & object>(`fetch forward ${EXPORT_BATCH_ROWS} from cash_export`);
    if (rows.length > 0) yield stringify(rows.map(spec.toCells), CSV);
    if (rows.length < EXPORT_BATCH_ROWS) return;
  }
}

/**
 * Writes the export to `out` as CSV with back-pressure: a slow download slows the fetching, it
 * never piles rows up in memory (at most one batch waits beside the one being written). Resolves
 * when the last row is written; rejects (and leaves `out` destroyed) if the reader goes away or a
 * query fails.
 */
export async function streamCsv<R>(
  tx: TenantTx,
  spec: ExportSpec<R>,
  values: readonly [tenantId: string, from: string, to: string],
  out: Writable,
): Promise<void> {
  await pipeline(Readable.from(csvPieces(tx, spec, values), { objectMode: true, highWaterMark: 1 }), out);
}
