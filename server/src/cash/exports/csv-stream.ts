import { Readable, type Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { TenantTx } from '@layerbook/db';
import { stringify, type Options } from 'csv-stringify/sync';
import type { ExportSpec } from './export-spec';

/** Rows fetched per round trip: enough to keep the connection busy, few enough to hold (common practice, no source). */
export const EXPORT_BATCH_ROWS = 1000;

/** RFC 4180 §2: CRLF after each record; csv-stringify quotes a cell holding a comma, a quote or a line break. */
const CSV: Options = { record_delimiter: 'windows' };

/**
 * A download that takes nothing for this long is cut off: it holds a pooled connection and an open
 * transaction while it waits, and a few stalled ones (a laptop closed mid-download) would take every
 * connection of the pool (common practice, no source).
 */
export const EXPORT_STALL_MS = 30_000;

/**
 * A batch's CSV text goes out in pieces of at most this many characters, and the cut-off counts from the
 * last piece taken: a slow link that keeps taking bytes (a 16 K piece at 1 KB/s is 16 s) is never cut off.
 */
const PIECE_CHARS = 16 * 1024;

/**
 * The database's own backstop, for a server that stopped minding the export: the transaction left idle
 * this long is ended there. Longer than a slow link takes to carry one batch (common practice, no source).
 */
const EXPORT_IDLE_BACKSTOP_MS = 10 * 60_000;

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
  await tx.client.query(`set local idle_in_transaction_session_timeout = ${EXPORT_IDLE_BACKSTOP_MS}`);
  await tx.client.query(`declare cash_export no scroll cursor for ${spec.sql}`, [...values]);
  for (;;) {
    const { rows } = await tx.client.query<R & object>(`fetch forward ${EXPORT_BATCH_ROWS} from cash_export`);
    if (rows.length > 0) {
      const text = stringify(rows.map(spec.toCells), CSV);
      for (let at = 0; at < text.length; at += PIECE_CHARS) yield text.slice(at, at + PIECE_CHARS);
    }
    if (rows.length < EXPORT_BATCH_ROWS) return;
  }
}

/**
 * The pieces, with a watchdog that cuts `out` off when the reader takes nothing for `stallMs` (checked
 * every `stallMs`, so it is cut within twice that): taking something is a piece pulled, `out` draining,
 * or what `out` holds waiting going down.
 */
async function* watched(pieces: AsyncGenerator<string>, out: Writable, stallMs: number): AsyncGenerator<string> {
  let moves = 0;
  const moved = () => void moves++;
  const mark = () => `${moves}/${out.writableLength}`;
  let seen = mark();
  const watchdog = setInterval(() => {
    const now = mark();
    if (now === seen) out.destroy(new Error(`The download took nothing for ${stallMs} ms: cut off.`));
    seen = now;
  }, stallMs);
  out.on('drain', moved);
  try {
    for await (const piece of pieces) {
      moved();
      yield piece;
    }
  } finally {
    clearInterval(watchdog);
    out.off('drain', moved);
  }
}

/**
 * Writes the export to `out` as CSV with back-pressure: a slow download slows the fetching, it
 * never piles rows up in memory (at most one batch waits beside the one being written). Resolves
 * when the last row is written; rejects (and leaves `out` destroyed) if the reader goes away, takes
 * nothing for `stallMs` (its connection and transaction are given back) or a query fails.
 */
export async function streamCsv<R>(
  tx: TenantTx,
  spec: ExportSpec<R>,
  values: readonly [tenantId: string, from: string, to: string],
  out: Writable,
  stallMs = EXPORT_STALL_MS,
): Promise<void> {
  await pipeline(Readable.from(watched(csvPieces(tx, spec, values), out, stallMs), { objectMode: true, highWaterMark: 1 }), out);
}
