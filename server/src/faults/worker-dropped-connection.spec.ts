import { randomUUID } from 'node:crypto';
import net from 'node:net';
import { Pool } from 'pg';
import { enqueueMail } from '../mail/outbox';
import { ensureStopped, startObjectStore, startServerProcess, type ServerProcess } from '../faults/processes';
import { openFaultDb, type FaultDb } from '../faults/fault-db';
import { testDatabaseUrls } from '../testing/test-env';

// A mail send holds its connection in an open transaction while it talks to the SMTP server. If PostgreSQL
// drops that connection then (a restart, a failover, an administrator's terminate), the worker process
// logs it and carries on: the pool and each of its clients have an 'error' listener (db-connections.ts).

let db: FaultDb;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let smtp: net.Server;
let worker: ServerProcess | undefined;
const sockets = new Set<net.Socket>();

beforeAll(async () => {
  db = await openFaultDb(testDatabaseUrls());
  s3 = await startObjectStore();
  // An SMTP server that accepts the connection and never greets: nodemailer waits (greetingTimeout 30 s).
  smtp = net.createServer((socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
  });
  await new Promise<void>((resolve) => smtp.listen(0, '127.0.0.1', () => resolve()));
}, 60_000);

afterAll(async () => {
  await ensureStopped(worker);
  for (const s of sockets) s.destroy();
  await new Promise<void>((resolve) => smtp.close(() => resolve()));
  await db.close();
  await s3.stop();
});

async function waitFor<T>(what: string, probe: () => Promise<T | undefined>, timeoutMs = 30_000): Promise<T> {
  for (const deadline = Date.now() + timeoutMs; Date.now() < deadline; await new Promise((r) => setTimeout(r, 100))) {
    const v = await probe();
    if (v !== undefined) return v;
  }
  throw new Error(`timed out waiting for ${what}`);
}

it('a worker survives PostgreSQL dropping the connection a mail send holds', async () => {
  const port = (smtp.address() as net.AddressInfo).port;
  worker = startServerProcess('worker', { ...testDatabaseUrls(), SMTP_PORT: String(port), S3_ENDPOINT: s3.endpoint });
  await worker.logged('Layerbook worker started');

  // One mail in the outbox, as any service writes it (row + job in one transaction).
  const client = await db.jobs.connect();
  try {
    await client.query('begin');
    await enqueueMail({ client } as never, db.queue, {
      purposeKey: `dropped-connection:${randomUUID()}`,
      tenantId: randomUUID(),
      to: 'someone@example.test',
      subject: 'Hello',
      html: '<p>Hello</p>',
      text: 'Hello',
    });
    await client.query('commit');
  } finally {
    client.release();
  }

  // The mail-send handler now holds its row lock in an open transaction while SMTP says nothing.
  const pids = new Pool({ connectionString: testDatabaseUrls().DATABASE_JOBS_URL, max: 1 });
  try {
    const pid = await waitFor('a worker idle in a transaction', async () => {
      const { rows } = await pids.query<{ pid: number }>(
        `select pid from pg_stat_activity where application_name = 'layerbook-worker' and state = 'idle in transaction'`,
      );
      return rows[0]?.pid;
    });
    await pids.query('select pg_terminate_backend($1)', [pid]);
  } finally {
    await pids.end();
  }

  // The process should log the lost connection and carry on; it must not exit.
  const ended = await Promise.race([worker.exited, new Promise<'alive'>((r) => setTimeout(() => r('alive'), 3_000))]);
  const why =
    ended === 'alive'
      ? ''
      : worker
          .stderr()
          .split('\n')
          .filter((l) => /Error|error|at /.test(l))
          .slice(0, 4)
          .join('\n');
  expect({ ended, why }).toEqual({ ended: 'alive', why: '' });
}, 90_000);
