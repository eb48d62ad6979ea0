import { Pool } from 'pg';
import { stopDatabaseUnderLoad } from './db-down';
import { type MailCatcher, startMailCatcher } from './mail-catcher';
import { type OwnCluster, startOwnCluster } from './own-cluster';
import { ensureStopped, type ServerProcess, startObjectStore, startServerProcess } from './processes';
import { signUpOver } from './signed-in';

// PostgreSQL stopped for 10 s under load (a cluster of this spec's own, port 55480; the server on
// 55481): requests fail fast with a 503 problem, nothing is half-written, and the same process
// serves again, and its queue runs again, once PostgreSQL is back.

const PG_PORT = 55480;
const HTTP_PORT = 55481;

let cluster: OwnCluster;
let catcher: MailCatcher;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let server: ServerProcess;
let app: Pool;
beforeAll(async () => {
  cluster = await startOwnCluster(PG_PORT, 'layerbook_faults');
  catcher = await startMailCatcher();
  s3 = await startObjectStore();
  app = new Pool({ connectionString: cluster.urls('layerbook_faults').DATABASE_URL, max: 2 });
  app.on('error', () => undefined);
  server = startServerProcess('web', {
    ...cluster.urls('layerbook_faults'),
    PORT: String(HTTP_PORT),
    SMTP_PORT: String(catcher.port),
    S3_ENDPOINT: s3.endpoint,
  });
  await server.logged('Layerbook is listening');
}, 90_000);
afterAll(async () => {
  await ensureStopped(server);
  await app?.end();
  await catcher?.close();
  await s3?.stop();
  await cluster?.destroy();
});

it('PostgreSQL down for 10 s under load: 503 problems at once, nothing half-written, the server recovers by itself', async () => {
  const owner = await signUpOver(`http://127.0.0.1:${HTTP_PORT}`, catcher, 'Outage Plaster');
  const r = await stopDatabaseUnderLoad(cluster, app, owner, catcher, { connections: 8, outageMs: 10_000 });
  // The process survived: connections PostgreSQL dropped (in use or idle in any pool) are errors it handles.
  // If it died, the lines of its last words that say why.
  const why = (server.alive() ? '' : server.stderr())
    .split('\n')
    .filter((line) => /Error|Emitted|server\/src/.test(line))
    .slice(0, 12);
  expect({ alive: server.alive(), why }).toEqual({ alive: true, why: [] });
  expect(r).toMatchObject({
    // Every request answered: 200/201 or 503, never a 500 or a hang; during the outage 503 only.
    unexpected: [],
    clear503s: true,
    // Each create is one transaction: a 201 has its row, a 503 has none.
    writesMatchRows: true,
  });
  expect(Object.keys(r.duringOutage)).toEqual(['503']);
  expect(r.duringOutage['503']).toBeGreaterThan(20);
  // Fail fast: a refused connection answers at once (two seconds is generous on a loaded machine).
  expect(r.slowest503Ms).toBeLessThan(2_000);
  // The pools reconnect on their own: requests succeed within seconds of PostgreSQL's return, and
  // pg-boss and the workers too: an e-mail queued afterwards is sent.
  expect(r.recoveredMs).not.toBeNull();
  expect(r.recoveredMs!).toBeLessThan(10_000);
  expect(r.queueResumedMs).not.toBeNull();
}, 120_000);
