import { signInRequest } from '@layerbook/contracts';
import { Pool } from 'pg';
import { withTenant } from '@layerbook/db';
import { pruneExpired } from '../queue/prune';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';
import { signIn } from './staff-auth';
import { FAILURES_PER_ACCOUNT_AND_ADDRESS } from './throttle';

let t: TestServer;
let owner: Pool;
let app: Pool;
let jobs: Pool;
beforeAll(async () => {
  t = await startTestServer();
  const urls = testDatabaseUrls();
  owner = new Pool({ connectionString: urls.DATABASE_OWNER_URL, max: 2 });
  app = new Pool({ connectionString: urls.DATABASE_URL, max: 2 });
  jobs = new Pool({ connectionString: urls.DATABASE_JOBS_URL, max: 2 });
});
afterAll(async () => {
  await Promise.all([owner.end(), app.end(), jobs.end()]);
  await t.stop();
});

const sessionRows = async () => Number((await owner.query<{ n: string }>('select count(*) as n from session')).rows[0].n);

describe('anonymous visitors write no session row', () => {
  it('answers N signed-out session calls (staff and portal) without adding a row, and keeps CSRF on writes', async () => {
    const before = await sessionRows();
    for (let i = 0; i < 5; i++) {
      const { agent, csrf } = await newAgent(t.app, i % 2 ? 'portal' : 'auth');
      expect(csrf()).toBeTruthy();
      expect((await agent.get('/api/auth/session')).status).toBe(200);
      expect((await agent.get('/api/portal/session')).status).toBe(200);
      // The anonymous token works on a write (401: wrong password, not 403)…
      const res = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email: uniqueEmail(), password: 'whatever-123' });
      expect(res.status).toBe(401);
    }
    expect(await sessionRows()).toBe(before);
  });

  it('refuses an anonymous write whose token is missing, not the cookie’s, or unsigned', async () => {
    const { agent, csrf } = await newAgent(t.app);
    const other = await newAgent(t.app);
    const body = { email: uniqueEmail(), password: 'whatever-123' };
    expect((await agent.post('/api/auth/signin').send(body)).status).toBe(403);
    expect((await agent.post('/api/auth/signin').set('x-csrf-token', other.csrf()).send(body)).status).toBe(403);
    const forged = 'abc.def';
    const res = await agent.post('/api/auth/signin').set('cookie', `lb.csrf=${forged}`).set('x-csrf-token', forged).send(body);
    expect(res.status).toBe(403);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(csrf()).not.toEqual(other.csrf());
  });

  it('writes a row on sign-in and deletes it on sign-out, writing none in its place', async () => {
    const before = await sessionRows();
    const { agent, csrf } = await signUpFirm(t.app);
    expect(await sessionRows()).toBe(before + 1);
    const out = await agent.post('/api/auth/signout').set('x-csrf-token', csrf()).send({});
    expect(out.status).toBe(200);
    expect(out.body.user).toBeNull();
    expect(await sessionRows()).toBe(before);
    await agent.get('/api/auth/session');
    expect(await sessionRows()).toBe(before);
  });
});

describe('prune-expired queue job', () => {
  it('deletes only expired sessions, old used form stamps and spent throttle windows', async () => {
    const now = new Date('2031-05-01T12:00:00Z');
    const tag = `prune-${Date.now()}`;
    await owner.query(
      `insert into session (sid, sess, expire) values ($1, '{}', $3::timestamptz - interval '1 minute'), ($2, '{}', $3::timestamptz + interval '1 minute')`,
      [`${tag}-old`, `${tag}-live`, now.toISOString()],
    );
    await owner.query(
      `insert into used_form_stamps (nonce, used_at) values ($1, $3::timestamptz - interval '25 hours'), ($2, $3::timestamptz - interval '1 hour')`,
      [`${tag}-old`, `${tag}-live`, now.toISOString()],
    );
    await owner.query(
      `insert into sign_in_throttle (key, failures, window_started_at) values ($1, 9, $3::timestamptz - interval '16 minutes'), ($2, 9, $3::timestamptz - interval '1 minute')`,
      [`${tag}-old`, `${tag}-live`, now.toISOString()],
    );
    const result = await pruneExpired(jobs, now);
    expect(result.sessions).toBeGreaterThanOrEqual(1);
    const left = async (table: string, column: string) =>
      (await owner.query<{ k: string }>(`select ${column} as k from ${table} where ${column} like $1 order by 1`, [`${tag}%`])).rows.map(
        (r) => r.k,
      );
    expect(await left('session', 'sid')).toEqual([`${tag}-live`]);
    expect(await left('used_form_stamps', 'nonce')).toEqual([`${tag}-live`]);
    expect(await left('sign_in_throttle', 'key')).toEqual([`${tag}-live`]);
  });

  it('deletes sign-up links used or expired more than a day ago, and keeps the rest', async () => {
    const now = new Date('2031-05-02T12:00:00Z');
    const tag = `prune-signup-${Date.now()}`;
    const rows: [string, string, string | null][] = [
      // [token hash suffix, expires_at offset, used_at offset]
      ['expired-old', "- interval '25 hours'", null],
      ['used-old', "+ interval '1 hour'", "- interval '25 hours'"],
      ['expired-recent', "- interval '1 hour'", null],
      ['used-recent', "+ interval '1 hour'", "- interval '2 hours'"],
      ['open', "+ interval '23 hours'", null],
    ];
    for (const [suffix, expires, used] of rows) {
      await owner.query(
        `insert into pending_sign_ups (token_hash, firm_id, email, name, firm_name, password_hash, expires_at, used_at)
         values ($1, gen_random_uuid(), $1 || '@example.test', 'Prune Test', 'Prune Firm', 'x',
                 $2::timestamptz ${expires}, ${used ? `$2::timestamptz ${used}` : 'null'})`,
        [`${tag}-${suffix}`, now.toISOString()],
      );
    }
    const result = await pruneExpired(jobs, now);
    expect(result.pendingSignUps).toBeGreaterThanOrEqual(2);
    const left = await owner.query<{ k: string }>(`select token_hash as k from pending_sign_ups where token_hash like $1 order by 1`, [
      `${tag}%`,
    ]);
    expect(left.rows.map((r) => r.k)).toEqual([`${tag}-expired-recent`, `${tag}-open`, `${tag}-used-recent`]);
  });

  it('deletes reset and portal sign-in links used or expired a day ago, and blanks the bodies of mail sent a month ago', async () => {
    const now = new Date('2031-06-02T12:00:00Z');
    const tag = `prune-links-${Date.now()}`;
    const firm = await signUpFirm(t.app, 'Prune Links Plaster');
    const at = now.toISOString();
    const { rows: users } = await owner.query<{ id: string }>(`select id from users where email = $1`, [firm.email]);
    const inFirm = (text: string, values: unknown[]) =>
      withTenant(t.ctx.pool, firm.firmId, (tx) => tx.client.query<{ id: string }>(text, values));
    const { rows: clients } = await inFirm(
      `insert into portal_users (tenant_id, email, name) values ($1, $2, 'Prune Client') returning id`,
      [firm.firmId, `${tag}@example.test`],
    );
    const links: [string, string, string | null][] = [
      ['expired-old', "- interval '25 hours'", null],
      ['used-old', "+ interval '9 days'", "- interval '25 hours'"],
      ['expired-recent', "- interval '1 hour'", null],
      ['open', "+ interval '9 days'", null],
    ];
    for (const [suffix, expires, used] of links) {
      const values = [`${tag}-${suffix}`, at];
      const times = `$2::timestamptz ${expires}, ${used ? `$2::timestamptz ${used}` : 'null'}`;
      await owner.query(
        `insert into password_resets (user_id, token_hash, expires_at, used_at) values ('${users[0].id}', $1, ${times})`,
        values,
      );
      await inFirm(
        `insert into portal_links (tenant_id, portal_user_id, token_hash, expires_at, used_at) values ('${firm.firmId}', '${clients[0].id}', $1, ${times})`,
        values,
      );
    }
    await inFirm(
      `insert into mail_outbox (tenant_id, purpose_key, to_address, subject, html, text, status, sent_at)
       values ($1, $2 || '-old', 'a@example.test', 'Old', '<p>link</p>', 'link', 'sent', $3::timestamptz - interval '31 days'),
              ($1, $2 || '-new', 'a@example.test', 'New', '<p>link</p>', 'link', 'sent', $3::timestamptz - interval '29 days'),
              ($1, $2 || '-pending', 'a@example.test', 'Pending', '<p>link</p>', 'link', 'pending', null)`,
      [firm.firmId, tag, at],
    );
    const result = await pruneExpired(jobs, now);
    expect(result).toMatchObject({ passwordResets: expect.any(Number), portalLinks: expect.any(Number) });
    const kept = async (table: string) =>
      (await owner.query<{ k: string }>(`select token_hash as k from ${table} where token_hash like $1 order by 1`, [`${tag}%`])).rows.map(
        (r) => r.k,
      );
    expect(await kept('password_resets')).toEqual([`${tag}-expired-recent`, `${tag}-open`]);
    const linksLeft = await inFirm(`select token_hash as id from portal_links where token_hash like $1 order by 1`, [`${tag}%`]);
    expect(linksLeft.rows.map((r) => r.id)).toEqual([`${tag}-expired-recent`, `${tag}-open`]);
    const mail = await jobs.query<{ purpose_key: string; html: string; text: string }>(
      `select purpose_key, html, text from mail_outbox where purpose_key like $1 order by 1`,
      [`${tag}%`],
    );
    expect(mail.rows.map((r) => [r.purpose_key.slice(tag.length), r.html, r.text])).toEqual([
      ['-new', '<p>link</p>', 'link'],
      ['-old', '', ''],
      ['-pending', '<p>link</p>', 'link'],
    ]);
  });

  it('is scheduled', async () => {
    const schedules = await t.queue.boss.getSchedules();
    expect(schedules.map((s) => s.name)).toContain('prune-expired');
  });
});

describe('the web role and password hashes / sessions', () => {
  it('cannot read password hashes or session rows, yet sign-in still works', async () => {
    await expect(app.query('select password_hash from users')).rejects.toThrow(/permission denied/);
    await expect(app.query('select * from users')).rejects.toThrow(/permission denied/);
    await expect(app.query(`update users set password_hash = 'x'`)).rejects.toThrow(/permission denied/);
    await expect(app.query('select * from session')).rejects.toThrow(/permission denied/);
    await expect(app.query('delete from session')).rejects.toThrow(/permission denied/);
    const { email, password } = await signUpFirm(t.app);
    const { agent, csrf } = await newAgent(t.app);
    const res = await agent.post('/api/auth/signin').set('x-csrf-token', csrf()).send({ email, password });
    expect(res.status).toBe(200);
    expect((await agent.get('/api/auth/session')).body.user.email).toBe(email);
  });
});

describe('sign-in throttle per e-mail and address', () => {
  it('lets the right person in from another address while one address is throttled for their e-mail', async () => {
    const { email, password } = await signUpFirm(t.app);
    const wrong = signInRequest.parse({ email, password: 'not-it-at-all-1' });
    for (let i = 0; i < FAILURES_PER_ACCOUNT_AND_ADDRESS; i++) {
      await expect(signIn(t.ctx, wrong, '203.0.113.7')).rejects.toMatchObject({ status: 401 });
    }
    await expect(signIn(t.ctx, { email, password }, '203.0.113.7')).rejects.toMatchObject({ status: 429 });
    await expect(signIn(t.ctx, { email, password }, '198.51.100.2')).resolves.toMatchObject({ email });
  });
});
