import { clientInvoice } from '../../server/src/payments/checkout-fixtures';
import { QUEUES } from '../../server/src/queue/queues';
import { startTestServer } from '../../server/src/testing/harness';
import { queueDrained } from '../../server/src/faults/databases';
import { type DbDownResult, stopDatabaseUnderLoad } from '../../server/src/faults/db-down';
import { openFaultDb } from '../../server/src/faults/fault-db';
import { type KillMailResult, killWorkerSendingMail, MAIL_WORKERS_PER_PROCESS } from '../../server/src/faults/kill-mail';
import { type KillPaymentResult, killWorkerApplyingPayment } from '../../server/src/faults/kill-payment';
import { startMailCatcher } from '../../server/src/faults/mail-catcher';
import { startOwnCluster } from '../../server/src/faults/own-cluster';
import { ensureStopped, startObjectStore, startServerProcess } from '../../server/src/faults/processes';
import { type ShutdownResult, shutdownWithWorkInFlight } from '../../server/src/faults/shutdown';
import { signUpOver } from '../../server/src/faults/signed-in';

/** scenario, check, what was measured, and whether it is what the check expects */
export type Row = readonly [string, string, string, boolean];

const seconds = (ms: number | null) => (ms === null ? 'never' : `${(ms / 1000).toFixed(1)} s`);

export function mailRows(r: KillMailResult, bound: number, clock: string): Row[] {
  const s = 'kill -9 mid-send';
  return [
    [s, 'messages queued / sent after restart (nothing lost)', `${r.queued} / ${r.sent}`, r.sent === r.queued],
    [s, `in flight at the kill (SMTP 250, row not yet sent; bound ${bound})`, String(r.inFlightAtKill), r.inFlightAtKill <= bound],
    [
      s,
      'duplicates (only messages in flight, same Message-ID)',
      String(r.duplicates),
      r.duplicates <= r.inFlightAtKill && r.duplicatesWereInFlight,
    ],
    [s, `restart to every row sent (${clock})`, seconds(r.recoveryMs), true],
    [s, 'restarted worker exits 0 on SIGTERM', String(r.exitCode), r.exitCode === 0],
  ];
}

export function paymentRows(r: KillPaymentResult, clock: string): Row[] {
  const s = 'kill -9 mid-payment';
  return [
    [
      s,
      'payment written when killed / visible after the kill',
      `${r.paymentWrittenAtKill ? 'yes' : 'no'} / ${r.paymentsAfterKill}`,
      r.paymentWrittenAtKill && r.paymentsAfterKill === 0,
    ],
    [s, 'payments after restart and a second application', String(r.payments), r.payments === 1],
    [
      s,
      'receipt numbers / invoice status',
      `${r.receiptNumbers.join(', ')} / ${r.invoiceStatus}`,
      r.receiptNumbers.join() === '1' && r.invoiceStatus === 'paid',
    ],
    [s, 'receipt e-mails', String(r.receiptMails), r.receiptMails === 1],
    [s, `restart to event applied (${clock})`, seconds(r.recoveryMs), true],
  ];
}

export function dbDownRows(r: DbDownResult, what: string): Row[] {
  const s = `PostgreSQL down ${seconds(r.outageMs)}, ${what}`;
  const during = Object.entries(r.duringOutage)
    .map(([status, n]) => `${n}×${status}`)
    .join(', ');
  return [
    [s, 'requests during the outage', during || 'none', Object.keys(r.duringOutage).join() === '503'],
    [s, 'answers other than 200/201/503 (of all requests)', `${r.unexpected.length} of ${r.requests}`, r.unexpected.length === 0],
    [s, '503s: problem+json, Retry-After 5, clear title', r.clear503s ? 'yes' : 'no', r.clear503s],
    [s, 'slowest 503', `${r.slowest503Ms} ms`, r.slowest503Ms < 2_000],
    [s, 'PostgreSQL back to first success', seconds(r.recoveredMs), r.recoveredMs !== null],
    [s, 'writes answered 201 / rows written', `${r.writesAnswered201} / ${r.rowsWritten}`, r.writesMatchRows],
    [s, 'e-mail queued after the outage delivered in', seconds(r.queueResumedMs), r.queueResumedMs !== null],
  ];
}

export function shutdownRows(r: ShutdownResult): Row[] {
  const s = 'SIGTERM with work under way';
  return [
    [s, 'new connections refused', r.refusedNewConnections ? 'yes' : 'no', r.refusedNewConnections],
    [s, 'request under way finished', String(r.inFlightStatus), r.waitedForRequest && r.inFlightStatus === 200],
    [
      s,
      'job under way finished (e-mail once, row sent)',
      `${r.jobMailDeliveries} / ${r.jobRowSent ? 'sent' : 'not sent'}`,
      r.waitedForJob && r.jobMailDeliveries === 1 && r.jobRowSent,
    ],
    [s, 'exit code / SIGTERM to exit', `${r.exitCode} / ${seconds(r.shutdownMs)}`, r.exitCode === 0],
  ];
}

const failed = (scenario: string, error: unknown): Row => [scenario, 'ran', `failed: ${String(error).slice(0, 200)}`, false];

/** Runs every scenario on a cluster of its own and answers the table's rows. */
export async function runFaults(o: { pgPort: number; db: string; httpPorts: [number, number]; realTime: boolean }): Promise<Row[]> {
  const cluster = await startOwnCluster(o.pgPort, o.db);
  const urls = cluster.urls(o.db);
  const rows: Row[] = [];
  const db = await openFaultDb(urls);
  const t = await startTestServer(urls);
  const f = await clientInvoice(t, 'Fault Run Plaster');
  await queueDrained(db.jobs, QUEUES.mailSend);
  await t.stop();
  const catcher = await startMailCatcher();
  const s3 = await startObjectStore();
  const env = { ...urls, SMTP_PORT: String(catcher.port), S3_ENDPOINT: s3.endpoint };
  const clock = o.realTime ? 'real time' : 'expiry brought forward';
  const web = (port: number) => startServerProcess('web', { ...env, PORT: String(port) });
  try {
    try {
      const r = await killWorkerSendingMail(db, catcher, f.firmId, env, { count: 10, movedClock: !o.realTime });
      rows.push(...mailRows(r, MAIL_WORKERS_PER_PROCESS, clock));
    } catch (error) {
      rows.push(failed('kill -9 mid-send', error));
    }
    try {
      const r = await killWorkerApplyingPayment(db, catcher, { firmId: f.firmId, invoiceId: f.invoiceId, total: '250.00' }, env, {
        movedClock: !o.realTime,
      });
      rows.push(...paymentRows(r, clock));
    } catch (error) {
      rows.push(failed('kill -9 mid-payment', error));
    }
    const [downPort, shutdownPort] = o.httpPorts;
    const toStop = web(shutdownPort);
    try {
      await toStop.logged('Layerbook is listening');
      const owner = await signUpOver(`http://127.0.0.1:${shutdownPort}`, catcher, 'Shutdown Run Plaster');
      rows.push(...shutdownRows(await shutdownWithWorkInFlight(db, catcher, toStop, shutdownPort, owner)));
    } catch (error) {
      rows.push(failed('SIGTERM with work under way', error));
    } finally {
      await ensureStopped(toStop);
    }
    // A web node alone (RUN_WORKERS=false): a worker process sends the sign-up e-mail, then stops; another sends what is queued after.
    const node = startServerProcess('web', { ...env, PORT: String(downPort), RUN_WORKERS: 'false' });
    const helpers: Array<ReturnType<typeof startServerProcess>> = [];
    const worker = async () => {
      const w = startServerProcess('worker', env);
      helpers.push(w);
      await w.logged('Layerbook worker started');
      return w;
    };
    try {
      await node.logged('Layerbook is listening');
      const first = await worker();
      const owner = await signUpOver(`http://127.0.0.1:${downPort}`, catcher, 'Outage Node Run Plaster');
      first.signal('SIGTERM');
      await first.exited;
      const r = await stopDatabaseUnderLoad(cluster, db.app, owner, catcher, {
        connections: 8,
        outageMs: 10_000,
        jobBeforeStop: false,
        beforeQueueCheck: () => worker().then(() => undefined),
      });
      rows.push(...dbDownRows(r, 'web node'));
      rows.push(['PostgreSQL down, web node', 'web process still running', node.alive() ? 'yes' : 'no', node.alive()]);
    } catch (error) {
      rows.push(failed('PostgreSQL down, web node', error));
    } finally {
      for (const p of [node, ...helpers]) await ensureStopped(p);
    }
    // A web process with its workers, a job run just before the stop (its workers' pool holds a connection).
    const server = web(downPort);
    try {
      await server.logged('Layerbook is listening');
      const owner = await signUpOver(`http://127.0.0.1:${downPort}`, catcher, 'Outage Run Plaster');
      const r = await stopDatabaseUnderLoad(cluster, db.app, owner, catcher, { connections: 8, outageMs: 10_000, jobBeforeStop: true });
      rows.push(...dbDownRows(r, 'web with workers'));
      rows.push(['PostgreSQL down, web with workers', 'process still running', server.alive() ? 'yes' : 'no', server.alive()]);
    } catch (error) {
      rows.push(failed('PostgreSQL down, web with workers', error));
    } finally {
      server.signal('SIGTERM');
      await Promise.race([server.exited, new Promise((resolve) => setTimeout(resolve, 30_000))]);
      await ensureStopped(server);
    }
  } finally {
    await db.close();
    await catcher.close();
    await s3.stop();
    await cluster.destroy();
  }
  return rows;
}
