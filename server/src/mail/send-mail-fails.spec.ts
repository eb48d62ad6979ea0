import { randomUUID } from 'node:crypto';
import type { Transporter } from 'nodemailer';
import { Pool } from 'pg';
import pino from 'pino';
import { sendOutboxMail } from '../mail/send-mail-job';
import { testDatabaseUrls } from '../testing/test-env';

// A failed send records its attempt on its own connection: the workers share one pool of four and run
// four mail-send handlers, so asking the pool for a second connection would deadlock once all four fail
// together (a backlog of mail, the SMTP server down) and stall every other job with them.

const logger = pino({ level: 'silent' });
let pool: Pool;
let setup: Pool;

beforeAll(() => {
  // The same pool the workers use (workers.ts: DATABASE_JOBS_URL, max 4).
  pool = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 4 });
  setup = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 2 });
});
afterAll(async () => {
  await setup.end();
  await pool.end();
});

async function outboxRow(): Promise<string> {
  const id = randomUUID();
  await setup.query(
    `insert into mail_outbox (id, tenant_id, purpose_key, to_address, subject, html, text) values ($1, $2, $3, 'a@example.test', 's', '<p>h</p>', 't')`,
    [id, randomUUID(), `send-fails:${id}`],
  );
  return id;
}

/** An SMTP server that is down: every send fails, once all four workers are mid-send (a backlog). */
function failingTransport(concurrent: number): Transporter {
  let waiting = 0;
  const release: Array<() => void> = [];
  return {
    sendMail: () =>
      new Promise((_resolve, reject) => {
        waiting++;
        release.push(() => reject(new Error('connect ECONNREFUSED 127.0.0.1:25')));
        if (waiting === concurrent) for (const r of release) r();
      }),
  } as unknown as Transporter;
}

const within = <T>(p: Promise<T>, ms: number) =>
  Promise.race([
    p.then(
      () => 'settled' as const,
      () => 'settled' as const,
    ),
    new Promise<'hung'>((r) => setTimeout(() => r('hung'), ms).unref()),
  ]);

it('four mail-send handlers failing together give their connections back (no pool deadlock)', async () => {
  const ids = await Promise.all([outboxRow(), outboxRow(), outboxRow(), outboxRow()]);
  const transport = failingTransport(4);
  const sends = ids.map((outboxId) => sendOutboxMail(pool, transport, 'Layerbook <no-reply@layerbook.local>', { outboxId }, logger));
  // Each failure should be recorded and rethrown (pg-boss retries) within moments.
  expect(await within(Promise.all(sends.map((s) => s.catch(() => undefined))), 5_000)).toBe('settled');
  // And the pool must still serve the other workers.
  expect(await within(pool.query('select 1'), 2_000)).toBe('settled');
  // Each attempt is on its row, with why it failed, for the next retry and the operator.
  const { rows } = await setup.query(`select status, attempts, last_error from mail_outbox where id = any($1::uuid[])`, [ids]);
  expect(rows).toEqual(ids.map(() => ({ status: 'pending', attempts: 1, last_error: 'Error: connect ECONNREFUSED 127.0.0.1:25' })));
});
