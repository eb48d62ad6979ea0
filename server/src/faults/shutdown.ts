import net from 'node:net';
import { awaitLockWaiters, holdTableLock } from './db-waits';
import type { FaultDb } from './fault-db';
import type { MailCatcher } from './mail-catcher';
import { type ServerProcess, sleep, until } from './processes';
import type { HttpAgent } from './signed-in';

export interface ShutdownResult {
  /** the request under way at SIGTERM: its status once it could finish */
  readonly inFlightStatus: number;
  /** a new connection after SIGTERM was refused (the server stopped accepting) */
  readonly refusedNewConnections: boolean;
  /** the process waited for the request and then for the job, instead of exiting with them unfinished */
  readonly waitedForRequest: boolean;
  readonly waitedForJob: boolean;
  /** the job under way at SIGTERM finished: its e-mail delivered once and its outbox row marked sent */
  readonly jobMailDeliveries: number;
  readonly jobRowSent: boolean;
  readonly exitCode: number | null;
  /** SIGTERM to exit, with the request and job held about a second each */
  readonly shutdownMs: number;
}

const refused = (port: number) =>
  new Promise<boolean>((resolve) => {
    const socket = net.connect(port, '127.0.0.1');
    socket.once('connect', () => (socket.destroy(), resolve(false)));
    socket.once('error', (error: NodeJS.ErrnoException) => resolve(error.code === 'ECONNREFUSED'));
  });

/**
 * SIGTERM a web process (with its workers) while a request and a job are under way, each held at a
 * known point: the request waits for a table lock the test holds (clients), the job's e-mail waits for
 * the SMTP catcher's answer. The process must stop accepting, let both finish, then exit 0.
 */
export async function shutdownWithWorkInFlight(
  db: FaultDb,
  catcher: MailCatcher,
  server: ServerProcess,
  port: number,
  owner: { agent: HttpAgent; csrf: () => string },
): Promise<ShutdownResult> {
  catcher.hold();
  const email = `fault.shutdown.${Date.now().toString(36)}@example.test`;
  const invited = await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role: 'crew' });
  if (invited.status !== 201) throw new Error(`invitation failed: ${invited.status}`);
  await until('the invitation e-mail held at the catcher', () => Promise.resolve(catcher.pending() === 1));

  const lock = await holdTableLock(db.owner, 'clients', 'ACCESS EXCLUSIVE');
  try {
    const inFlight = owner.agent.get('/api/clients').timeout(30_000);
    const answered = inFlight.then((res) => res.status);
    await awaitLockWaiters(db.app, 'layerbook-web', '', 1);

    const sigAt = Date.now();
    server.signal('SIGTERM');
    await server.logged('shutting down');
    const refusedNewConnections = await refused(port);
    await sleep(1_000);
    const waitedForRequest = server.alive();
    await lock.release();
    const inFlightStatus = await answered;
    await server.logged('requests under way finished');
    await sleep(1_000);
    const waitedForJob = server.alive() && catcher.pending() === 1;
    catcher.release();
    const { code } = await server.exited;
    const shutdownMs = Date.now() - sigAt;
    const { rows } = await db.jobs.query<{ id: string; status: string }>(`select id, status from mail_outbox where to_address = $1`, [
      email,
    ]);
    const ids = new Set(rows.map((r) => `<${r.id}@layerbook.local>`));
    return {
      inFlightStatus,
      refusedNewConnections,
      waitedForRequest,
      waitedForJob,
      jobMailDeliveries: catcher.delivered.filter((m) => ids.has(m.messageId)).length,
      jobRowSent: rows.length === 1 && rows[0].status === 'sent',
      exitCode: code,
      shutdownMs,
    };
  } finally {
    catcher.release();
    await lock.release();
  }
}
