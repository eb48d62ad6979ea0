import { withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import { assertRlsBoundRole } from '../db-roles';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';
import { testDatabaseUrls } from '../testing/test-env';

// OWASP ASVS 5.0 8.4.1 and the PostgreSQL "Row Security Policies" chapter: the web role is bound
// by RLS on every firm-owned table, and one firm's ids never reach another firm's rows.
let t: TestServer;
let app: Pool;
beforeAll(async () => {
  t = await startTestServer();
  app = new Pool({ connectionString: testDatabaseUrls().DATABASE_URL, max: 2 });
});
afterAll(async () => {
  await app.end();
  await t.stop();
});

async function firmTables(): Promise<string[]> {
  const { rows } = await app.query(
    `select c.relname from pg_class c join pg_namespace n on n.oid = c.relnamespace
      where n.nspname = 'public' and c.relkind = 'r'
        and (exists (select 1 from pg_attribute a where a.attrelid = c.oid and a.attname = 'tenant_id' and not a.attisdropped) or c.relname = 'firms')
      order by 1`,
  );
  return rows.map((r) => r.relname as string);
}

describe('the login role', () => {
  it('is not superuser, not BYPASSRLS and owns no table', async () => {
    const { rows } = await app.query(`select rolsuper, rolbypassrls from pg_roles where rolname = current_user`);
    expect(rows[0]).toEqual({ rolsuper: false, rolbypassrls: false });
    await expect(assertRlsBoundRole(app)).resolves.toBeUndefined();
  });

  it('cannot create tables', async () => {
    await expect(app.query('create table sneaky (id int)')).rejects.toThrow(/permission denied/);
  });
});

describe('row-level security', () => {
  it('is enabled and forced on every firm-owned table', async () => {
    const tables = await firmTables();
    expect(tables).toEqual(expect.arrayContaining(['audit_log', 'firms', 'invitations', 'memberships', 'portal_links', 'portal_users']));
    const { rows } = await app.query(
      `select relname, relrowsecurity, relforcerowsecurity from pg_class where relname = any($1) and relnamespace = 'public'::regnamespace`,
      [tables],
    );
    for (const row of rows)
      expect({ table: row.relname, enabled: row.relrowsecurity, forced: row.relforcerowsecurity }).toEqual({
        table: row.relname,
        enabled: true,
        forced: true,
      });
  });

  it('returns zero rows from every firm table to a raw query with no firm set', async () => {
    await signUpFirm(t.app);
    const tables = await firmTables();
    for (const table of tables) {
      const { rows } = await app.query(`select count(*)::int as n from "${table}"`);
      expect({ table, n: rows[0].n }).toEqual({ table, n: 0 });
    }
  });

  it('refuses to write a row into another firm from inside a firm transaction', async () => {
    const a = await signUpFirm(t.app);
    const b = await signUpFirm(t.app);
    await expect(
      withTenant(t.ctx.pool, a.firmId, (tx) =>
        tx.client.query(`insert into audit_log (tenant_id, actor_kind, action, entity) values ($1, 'system', 'x', 'y')`, [b.firmId]),
      ),
    ).rejects.toThrow(/row-level security/);
  });

  it('the audit log is append-only for the web role', async () => {
    const a = await signUpFirm(t.app);
    await expect(withTenant(t.ctx.pool, a.firmId, (tx) => tx.client.query(`delete from audit_log`))).rejects.toThrow(/permission denied/);
  });

  it('the web role cannot read the mail outbox, whose bodies carry one-time links', async () => {
    await expect(app.query('select html from mail_outbox')).rejects.toThrow(/permission denied/);
  });
});

describe('firm A with firm B ids, through every route', () => {
  it('answers 404 and changes nothing', async () => {
    const a = await signUpFirm(t.app, 'Firm A Plaster');
    const b = await signUpFirm(t.app, 'Firm B Glazing');
    const invitee = uniqueEmail('b-crew');
    const invitation = await b.agent.post('/api/team/invitations').set('x-csrf-token', b.csrf()).send({ email: invitee, role: 'crew' });
    const bTeam = await b.agent.get('/api/team/members');
    const bMemberId = bTeam.body.items[0].id as string;

    expect((await a.agent.patch(`/api/team/members/${bMemberId}`).set('x-csrf-token', a.csrf()).send({ role: 'crew' })).status).toBe(404);
    expect((await a.agent.post(`/api/team/members/${bMemberId}/deactivate`).set('x-csrf-token', a.csrf()).send({})).status).toBe(404);
    expect((await a.agent.post(`/api/team/members/${bMemberId}/reactivate`).set('x-csrf-token', a.csrf()).send({})).status).toBe(404);
    expect((await a.agent.delete(`/api/team/invitations/${invitation.body.id}`).set('x-csrf-token', a.csrf())).status).toBe(404);

    for (const path of ['/api/team/members', '/api/team/invitations']) {
      const aTeam = await a.agent.get(path);
      expect(JSON.stringify(aTeam.body)).not.toContain(invitee);
      expect(JSON.stringify(aTeam.body)).not.toContain(b.email);
    }
    expect((await a.agent.get('/api/firm')).body.name).toBe('Firm A Plaster');

    expect((await b.agent.get('/api/team/members')).body.items[0]).toMatchObject({ role: 'owner', status: 'active' });
    expect((await b.agent.get('/api/team/invitations')).body.items[0]).toMatchObject({ email: invitee, status: 'pending' });
    // And B's invitation still works after A's attempts.
    const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(invitee)))).searchParams.get('token')!;
    expect((await (await newAgent(t.app)).agent.get(`/api/auth/invitations/${token}`)).body.firmName).toBe('Firm B Glazing');
  });
});
