import { freshTestDatabase } from './databases';
import { type FaultDb, openFaultDb } from './fault-db';
import { type MailCatcher, startMailCatcher } from './mail-catcher';
import { ensureStopped, type ServerProcess, startObjectStore, startServerProcess } from './processes';
import { shutdownWithWorkInFlight } from './shutdown';
import { signUpOver } from './signed-in';

// SIGTERM to a web process (with its workers, as `npm start` runs it) while a request and a job are
// under way: it stops accepting, lets both finish, then exits 0. Port 31482 (below the ephemeral
// range, as db-down.spec.ts says why), a database of its own.

const HTTP_PORT = 31482;

let database: Awaited<ReturnType<typeof freshTestDatabase>>;
let db: FaultDb;
let catcher: MailCatcher;
let s3: Awaited<ReturnType<typeof startObjectStore>>;
let server: ServerProcess;
beforeAll(async () => {
  database = await freshTestDatabase('shutdown');
  db = await openFaultDb(database.urls);
  catcher = await startMailCatcher();
  s3 = await startObjectStore();
  server = startServerProcess('web', {
    ...database.urls,
    PORT: String(HTTP_PORT),
    SMTP_PORT: String(catcher.port),
    S3_ENDPOINT: s3.endpoint,
  });
  await server.logged('Layerbook is listening');
}, 90_000);
afterAll(async () => {
  await ensureStopped(server);
  await db?.close();
  await database?.drop();
  await catcher?.close();
  await s3?.stop();
});

it('SIGTERM: new connections refused, the request and the job under way finish, then the process exits 0', async () => {
  const owner = await signUpOver(`http://127.0.0.1:${HTTP_PORT}`, catcher, 'Shutdown Plaster');
  const r = await shutdownWithWorkInFlight(db, catcher, server, HTTP_PORT, owner);
  expect(r).toMatchObject({
    refusedNewConnections: true,
    waitedForRequest: true,
    inFlightStatus: 200,
    waitedForJob: true,
    jobMailDeliveries: 1,
    jobRowSent: true,
    exitCode: 0,
  });
}, 90_000);
