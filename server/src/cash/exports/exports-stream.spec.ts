import { parse } from 'csv-parse/sync';
import Decimal from 'decimal.js';
import type { IncomingMessage } from 'node:http';
import { startTestServer, type TestServer } from '../../testing/harness';
import { Writable } from 'node:stream';
import { withTenant } from '@layerbook/db';
import { EXPORT_BATCH_ROWS, streamCsv } from './csv-stream';
import { EXPORTS } from './export-kinds';
import { eventually } from '../../payments/checkout-fixtures';
import { exportFirm } from './export-fixtures';

let t: TestServer;
let f: Awaited<ReturnType<typeof exportFirm>>;
const COUNT = 20_000;

beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-20T15:00:00Z'));
  f = await exportFirm(t, 'Big Batch Finishes');
  await f.manyPayments(await f.invoice(1, '2026-01-02', '2000000.00'), COUNT);
}, 120_000);
afterAll(() => t.stop());

/** The export's own transaction, seen from PostgreSQL while the download waits: its state and last statement. */
async function exportSession(): Promise<{ state: string; query: string } | undefined> {
  const { rows } = await t.ctx.pool.query<{ state: string; query: string }>(
    `select state, query from pg_stat_activity where query like 'fetch forward % from cash_export' and pid <> pg_backend_pid()`,
  );
  return rows[0];
}

describe('a large export is streamed', () => {
  it(`${COUNT} payments: sent in chunks while the reader is slow, fetched ${EXPORT_BATCH_ROWS} rows at a time, adding up to the table`, async () => {
    let whilePaused: { received: number; session: Awaited<ReturnType<typeof exportSession>> } | undefined;
    const res = await f.agent
      .get('/api/cash/exports/payments.csv?from=2026-01-01&to=2026-12-31')
      .buffer(true)
      .parse((response, done) => {
        // supertest hands the node response over as its own type: it is the IncomingMessage stream
        const stream = response as unknown as IncomingMessage;
        const chunks: Buffer[] = [];
        let received = 0;
        stream.on('data', (chunk: Buffer) => {
          chunks.push(chunk);
          received += chunk.length;
          if (whilePaused) return;
          // The reader stops after its first chunk: the server must come to wait for it, in the middle of its cursor
          // (a server that read everything first would commit instead, and never be found waiting).
          stream.pause();
          whilePaused = { received, session: undefined };
          // Seen mid-cursor once is the proof: the file is written as it is fetched. Looked for at once and without
          // pauses: loopback socket buffers can hold the rest of a 2 MB file, so the export may finish while the reader
          // sleeps, and a look 100 ms apart missed its last fetches once in CI. Fetching (active) or between two
          // fetches (idle in transaction) both show its cursor still open after the first chunk went out.
          void (async () => {
            const deadline = Date.now() + 15_000;
            while (Date.now() < deadline) {
              const session = await exportSession();
              if (session) return (whilePaused = { received, session });
            }
            return undefined; // the checks below then say what was missing
          })().finally(() => stream.resume());
        });
        stream.on('end', () => done(null, Buffer.concat(chunks)));
      });

    expect(res.status).toBe(200);
    // No length announced up front: the body is chunked as it is written (RFC 9112 §7.1)
    expect(res.headers['content-length']).toBeUndefined();
    expect(res.headers['transfer-encoding']).toBe('chunked');
    const text = (res.body as Buffer).toString('utf8');
    // When the reader had its first chunk, the export had sent only part of the file and still held its cursor open
    expect(whilePaused?.received).toBeLessThan(Buffer.byteLength(text) / 2);
    expect(whilePaused?.session?.query).toBe(`fetch forward ${EXPORT_BATCH_ROWS} from cash_export`);
    expect(['idle in transaction', 'active']).toContain(whilePaused?.session?.state);

    const rows = parse<Record<string, string>>(text, { columns: true, bom: true });
    expect(rows).toHaveLength(COUNT);
    const total = rows.reduce((s, r) => s.plus(r.Amount), new Decimal(0)).toFixed(2);
    expect(total).toBe(await f.dbSum('amount', 'payments', `received_on between '2026-01-01' and '2026-12-31'`));
    // Rows in date order, then receipt order
    expect(rows[0]['Received on']).toBe('2026-01-01');
    expect(rows[COUNT - 1]['Received on']).toBe('2026-12-31');
  });

  it('a reader that goes away mid-file ends the export: its transaction is rolled back and its connection is free again', async () => {
    const res = await f.agent
      .get('/api/cash/exports/payments.csv?from=2026-01-01&to=2026-12-31')
      .buffer(true)
      .parse((response, done) => {
        const stream = response as unknown as IncomingMessage;
        let received = 0;
        stream.on('data', (chunk: Buffer) => {
          received += chunk.length;
          // well into the rows (past the header): the export is reading its cursor
          if (received < 64 * 1024 || stream.destroyed) return;
          stream.destroy();
          done(null, Buffer.alloc(0));
        });
      });
    expect(res.status).toBe(200);
    const settled = async () => {
      const busy = t.ctx.pool.totalCount - t.ctx.pool.idleCount;
      const { rows } = await t.ctx.pool.query<{ n: number }>(
        `select count(*)::int as n from pg_stat_activity where datname = current_database() and usename = current_user
            and state like 'idle in transaction%'`,
      );
      return busy === 0 && rows[0].n === 0;
    };
    await eventually(settled, 'the export to let go of its connection');
    // and the next export runs to its end
    const again = await f.agent.get('/api/cash/exports/credit-notes.csv?from=2026-01-01&to=2026-12-31').buffer(true);
    expect(again.status).toBe(200);
  });
});

describe('a download that stops reading', () => {
  it('is cut off after a while, giving back its connection and transaction', async () => {
    // a reader that takes the first piece and never another (a laptop closed mid-download)
    const stalled = new Writable({ highWaterMark: 1, write: () => undefined });
    const started = Date.now();
    const outcome = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      streamCsv(tx, EXPORTS.payments, [tx.tenantId, '2026-01-01', '2026-12-31'], stalled, 300).then(
        () => 'finished',
        (e: Error) => e.message,
      ),
    );
    expect(outcome).toBe('The download took nothing for 300 ms: cut off.');
    expect(Date.now() - started).toBeLessThan(5_000);
    expect(stalled.destroyed).toBe(true);
    expect(await exportSession()).toBeUndefined();
  });

  it('is not cut off while it keeps taking bytes, however slowly (a slow link)', async () => {
    let taken = 0;
    // 4 KB every 40 ms (100 KB/s), as a socket drains: slower than a 300 ms cut-off per 1,000-row batch
    const slow = new Writable({
      highWaterMark: 16 * 1024,
      write(chunk: Buffer, _encoding, done) {
        const take = (left: number): void => {
          if (left <= 0) return done();
          taken += Math.min(4096, left);
          setTimeout(() => take(left - 4096), 40);
        };
        take(chunk.length);
      },
    });
    const outcome = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      streamCsv(tx, EXPORTS.payments, [tx.tenantId, '2026-01-01', '2026-03-31'], slow, 300).then(
        () => 'finished',
        (e: Error) => `${e.message} after ${taken} bytes`,
      ),
    );
    expect(outcome).toBe('finished');
    expect(taken).toBeGreaterThan(100_000);
  }, 60_000);
});
