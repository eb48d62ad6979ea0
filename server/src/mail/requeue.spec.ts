import { randomUUID } from 'node:crypto';
import net from 'node:net';
import { Pool } from 'pg';
import { QUEUES } from '../queue/queues';
import { startTestServer, TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { enqueueMail } from './outbox';
import { requeueStrandedMail, resendFailedMail } from './requeue';

// mail-send retries 6 times from 15 s (about half an hour in all); after that its job is dead and, without this
// sweep, the outbox row stayed pending for ever: an SMTP outage of half an hour lost the mail written at its start.

let t: TestServer;
let jobs: Pool;
beforeAll(async () => {
  // an SMTP port where nothing listens: every send fails at once
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', () => resolve()));
  const closedPort = (probe.address() as net.AddressInfo).port;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  t = await startTestServer({ SMTP_PORT: String(closedPort) });
  jobs = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 2 });
});
afterAll(async () => {
  await jobs.end();
  await t.stop();
});

const liveJobs = async (outboxId: string) =>
  Number(
    (
      await jobs.query<{ n: string }>(
        `select count(*) as n from pgboss.job where name = $1 and data->>'outboxId' = $2 and state in ('created', 'retry', 'active')`,
        [QUEUES.mailSend, outboxId],
      )
    ).rows[0].n,
  );
const rowOf = async (id: string) =>
  (await jobs.query<{ status: string; attempts: number }>('select status, attempts from mail_outbox where id = $1', [id])).rows[0];

it('queues again an e-mail whose send job gave up, gives up after three days, and the operator can send failed ones again', async () => {
  const purposeKey = `stranded:${randomUUID()}`;
  const client = await jobs.connect();
  try {
    await client.query('begin');
    await enqueueMail({ client } as never, t.queue, {
      purposeKey,
      tenantId: randomUUID(),
      to: 'someone@example.test',
      subject: 'Your invoice',
      html: '<p>x</p>',
      text: 'x',
    });
    await client.query('commit');
  } finally {
    client.release();
  }
  const id = (await jobs.query<{ id: string }>('select id from mail_outbox where purpose_key = $1', [purposeKey])).rows[0].id;
  // its job dies (every retry at once rather than over half an hour)
  for (
    const deadline = Date.now() + 60_000;
    Date.now() < deadline && (await liveJobs(id)) > 0;
    await new Promise((r) => setTimeout(r, 200))
  ) {
    await jobs.query(`update pgboss.job set start_after = now() where name = $1 and state = 'retry' and data->>'outboxId' = $2`, [
      QUEUES.mailSend,
      id,
    ]);
  }
  expect(await liveJobs(id)).toBe(0);
  expect((await rowOf(id)).status).toBe('pending');

  const written = new Date();
  // a few minutes later nothing is done yet (its job may only be slow); ten minutes on, it is queued again, once
  // (the sweep reads the whole database, which other spec files share: only this row is looked at)
  await requeueStrandedMail(jobs, t.queue, new Date(written.getTime() + 5 * 60_000));
  expect(await liveJobs(id)).toBe(0);
  const later = new Date(written.getTime() + 11 * 60_000);
  await requeueStrandedMail(jobs, t.queue, later);
  expect(await liveJobs(id)).toBe(1);
  await requeueStrandedMail(jobs, t.queue, later);
  expect(await liveJobs(id)).toBe(1);

  // three days on it is marked failed, not tried for ever; the operator's resend queues it again
  await requeueStrandedMail(jobs, t.queue, new Date(written.getTime() + 4 * 86_400_000));
  expect((await rowOf(id)).status).toBe('failed');
  await resendFailedMail(jobs, t.queue);
  expect((await rowOf(id)).status).toBe('pending');
  expect(await liveJobs(id)).toBeGreaterThanOrEqual(1);
}, 120_000);

it('is scheduled', async () => {
  expect((await t.queue.boss.getSchedules()).map((s) => s.name)).toContain(QUEUES.mailRequeue);
});
