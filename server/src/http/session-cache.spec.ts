import { Pool } from 'pg';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

let t: TestServer;
let owner: Pool;
beforeAll(async () => {
  t = await startTestServer();
  owner = new Pool({ connectionString: testDatabaseUrls().DATABASE_OWNER_URL, max: 1 });
});
afterAll(async () => {
  await owner.end();
  await t.stop();
});

/** Ends every session of this person in the database, as a sign-out on another server (or an expiry) would. */
async function endSessionsElsewhere(email: string): Promise<number> {
  const { rowCount } = await owner.query(
    `delete from session where sess->'passport'->'user'->>'id' = (select id::text from users where email = $1)`,
    [email],
  );
  return rowCount ?? 0;
}

describe('sessions read from the process copy on safe requests', () => {
  it('honours nothing the database has ended: the next read answers 401, the session answer says signed out', async () => {
    const { agent, email } = await signUpFirm(t.app);
    // Read twice: the second GET is answered from this process's copy of the session.
    expect((await agent.get('/api/invoices')).status).toBe(200);
    expect((await agent.get('/api/invoices')).status).toBe(200);
    expect(await endSessionsElsewhere(email)).toBe(1);
    const after = await agent.get('/api/invoices');
    expect(after.status).toBe(401);
    expect((await agent.get('/api/auth/session')).body.user).toBeNull();
  });

  it('a session that ended while cached does not come back for the session answer either', async () => {
    const { agent, email } = await signUpFirm(t.app);
    expect((await agent.get('/api/auth/session')).body.user).toMatchObject({ email });
    await endSessionsElsewhere(email);
    expect((await agent.get('/api/auth/session')).body.user).toBeNull();
  });
});
