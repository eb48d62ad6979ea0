import { withTenant } from '@layerbook/db';
import type { ClientSummary, JobBillingView } from '@layerbook/contracts';
import { billingJob } from '../billing/billing-fixtures';
import { CLIENT_TABLES } from './merge';
import { addClient } from './client-fixtures';
import { signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

async function inquiry(o: Owner, body: Record<string, unknown>): Promise<string> {
  const res = await o.agent
    .post('/api/inquiries')
    .set('x-csrf-token', o.csrf())
    .send({ source: 'phone', ...body });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe('duplicate clients', () => {
  it('offers the clients with the same e-mail, phone or name, and links the inquiry to the one chosen', async () => {
    const o = await signUpFirm(t.app, 'Match Plaster');
    const email = uniqueEmail('hattie');
    const same = await addClient(o, { name: 'Hattie Brambleton', email, phone: '(555) 010-0199' });
    const samePhone = await addClient(o, { name: 'H. B. Holdings', phone: '555.010.0199' });
    await addClient(o, { name: 'Someone Else', email: uniqueEmail('else'), phone: '555-010-0000' });
    const id = await inquiry(o, { contactName: 'hattie  brambleton', email: email.toUpperCase(), phone: '555 010 0199' });

    const matches = await o.agent.get(`/api/inquiries/${id}/client-matches`);
    expect(matches.status).toBe(200);
    expect(matches.body.items.map((m: { id: string; matchedOn: string[] }) => [m.id, m.matchedOn])).toEqual([
      [same, ['email', 'phone', 'name']],
      [samePhone, ['phone']],
    ]);

    const linked = await o.agent.post(`/api/inquiries/${id}/convert`).set('x-csrf-token', o.csrf()).send({ clientId: same });
    expect(linked.status).toBe(200);
    expect(linked.body.clientId).toBe(same);
    const list = await o.agent.get('/api/clients?limit=50');
    expect(list.body.items).toHaveLength(3);
  });

  it('a stage that files the client by itself joins the client with the same e-mail; "new client" still makes one', async () => {
    const o = await signUpFirm(t.app, 'Auto File Plaster');
    const email = uniqueEmail('nell');
    const existing = await addClient(o, { name: 'Nell Ashdown', email });
    const id = await inquiry(o, { contactName: 'Nell Ashdown', email: ` ${email.toUpperCase()}` });
    const moved = await o.agent.post(`/api/inquiries/${id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'visit_booked' });
    expect(moved.body.clientId).toBe(existing);
    const other = await inquiry(o, { contactName: 'Nell Ashdown', email });
    const fresh = await o.agent
      .post(`/api/inquiries/${other}/convert`)
      .set('x-csrf-token', o.csrf())
      .send({ client: { kind: 'homeowner', isCompany: false, name: 'Nell Ashdown', email, phone: '', notes: '' } });
    expect(fresh.body.clientId).not.toBe(existing);
    expect((await o.agent.get('/api/clients?limit=50')).body.items).toHaveLength(2);
  });

  it('merges a duplicate into the client kept: everything moves in one transaction, audited, and the duplicate is gone', async () => {
    const o = await signUpFirm(t.app, 'Merge Plaster');
    const email = uniqueEmail('ida');
    const kept = await addClient(o, { name: 'Ida Marsh', email });
    const dup = await addClient(o, { name: 'Ida Marsh', email });
    await o.agent
      .post(`/api/clients/${dup}/contacts`)
      .set('x-csrf-token', o.csrf())
      .send({ name: 'Ivo Marsh', email: '', phone: '', roleTitle: '' });
    await o.agent.post(`/api/clients/${dup}/sites`).set('x-csrf-token', o.csrf()).send({
      label: 'Cottage',
      addressLine1: '4 Weir Lane',
      addressLine2: '',
      city: 'Ashbury',
      region: 'VT',
      postalCode: '05001',
      country: 'US',
      yearBuilt: 1990,
      accessNotes: '',
    });
    const inq = await inquiry(o, { contactName: 'Ida Marsh', email });
    await o.agent.post(`/api/inquiries/${inq}/convert`).set('x-csrf-token', o.csrf()).send({ clientId: dup });
    await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(`insert into portal_users (tenant_id, client_id, email, name) values ($1, $2, $3, 'Ida Marsh')`, [
        tx.tenantId,
        dup,
        email,
      ]),
    );

    const offered = await o.agent.get(`/api/clients/${dup}/matches`);
    expect(offered.body.items.map((m: { id: string }) => m.id)).toEqual([kept]);

    const merged = await o.agent.post(`/api/clients/${dup}/merge`).set('x-csrf-token', o.csrf()).send({ intoClientId: kept });
    expect(merged.status).toBe(200);
    expect(merged.body).toMatchObject({ id: kept, name: 'Ida Marsh' });
    expect(merged.body.contacts.map((c: { name: string }) => c.name)).toEqual(['Ivo Marsh']);
    expect(merged.body.sites.map((s: { label: string }) => s.label)).toEqual(['Cottage']);
    expect(merged.body.inquiries.map((i: { id: string }) => i.id)).toEqual([inq]);
    expect((await o.agent.get(`/api/clients/${dup}`)).status).toBe(404);

    const after = await withTenant(t.ctx.pool, o.firmId, async (tx) => ({
      portal: (await tx.client.query(`select client_id from portal_users where email = $1`, [email])).rows,
      left: (
        await tx.client.query(
          `select (select count(*) from client_contacts where client_id = $1) + (select count(*) from sites where client_id = $1)
                + (select count(*) from inquiries where client_id = $1) + (select count(*) from estimates where client_id = $1)
                + (select count(*) from jobs where client_id = $1) + (select count(*) from sample_boards where client_id = $1)
                + (select count(*) from portal_users where client_id = $1) as n`,
          [dup],
        )
      ).rows[0].n,
      audit: (await tx.client.query(`select entity_id, data from audit_log where action = 'client.merged'`)).rows,
    }));
    expect(after.portal).toEqual([{ client_id: kept }]);
    expect(Number(after.left)).toBe(0);
    expect(after.audit).toEqual([
      {
        entity_id: kept,
        data: {
          mergedClientId: dup,
          mergedName: 'Ida Marsh',
          moved: {
            client_contacts: 1,
            sites: 1,
            inquiries: 1,
            estimates: 0,
            jobs: 0,
            sample_boards: 0,
            portal_users: 1,
            invoices: 0,
            payments: 0,
            refunds: 0,
            client_credits: 0,
            checkout_sessions: 0,
          },
          // both records had the same name and e-mail, and nothing else: nothing to take
          taken: {},
        },
      },
    ]);
  });

  it('moves a billed client whole: its job, invoices and what the cash figures owe by client go to the kept one', async () => {
    const f = await billingJob(t, 'Merge Billed Plaster');
    const started = await f.send('post', `/api/jobs/${f.jobId}/billing/start`);
    expect(started.status).toBe(200);
    const deposit = await f.lineDraft((started.body as JobBillingView).lines[0].id);
    await f.issue(deposit, { send: false, issuedOn: '2026-12-01' });
    const kept = (
      await f.agent
        .post('/api/clients')
        .set('x-csrf-token', f.csrf())
        .send({ kind: 'homeowner', name: 'Edwina Marl', email: uniqueEmail('kept') })
    ).body as ClientSummary;
    const merged = await f.agent.post(`/api/clients/${f.clientId}/merge`).set('x-csrf-token', f.csrf()).send({ intoClientId: kept.id });
    expect(merged.status).toBe(200);
    const after = await withTenant(t.ctx.pool, f.firmId, async (tx) => ({
      invoices: (await tx.client.query(`select distinct client_id from invoices where tenant_id = $1`, [tx.tenantId])).rows,
      owed: (await tx.client.query(`select client_id from cash_open_clients where tenant_id = $1`, [tx.tenantId])).rows,
    }));
    expect(after).toEqual({ invoices: [{ client_id: kept.id }], owed: [{ client_id: kept.id }] });
  });

  it('knows every table that points at a client (the foreign keys to clients)', async () => {
    const { rows } = await t.ctx.pool.query<{ t: string }>(
      `select distinct conrelid::regclass::text as t from pg_constraint where confrelid = 'clients'::regclass and contype = 'f'`,
    );
    expect(rows.map((r) => r.t).sort()).toEqual([...CLIENT_TABLES].sort());
  });

  it('refuses a merge into itself or a bad id naming the field, and moves nothing', async () => {
    const o = await signUpFirm(t.app, 'Self Merge Plaster');
    const id = await addClient(o, { name: 'Only One' });
    const self = await o.agent.post(`/api/clients/${id}/merge`).set('x-csrf-token', o.csrf()).send({ intoClientId: id });
    expect(self.status).toBe(400);
    expect(self.body.errors.map((e: { field: string }) => e.field)).toEqual(['intoClientId']);
    const bad = await o.agent.post(`/api/clients/${id}/merge`).set('x-csrf-token', o.csrf()).send({ intoClientId: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(['intoClientId']);
    expect((await o.agent.get(`/api/clients/${id}`)).status).toBe(200);
  });

  it('answers another firm’s clients and inquiries with 404, and nothing moves', async () => {
    const a = await signUpFirm(t.app, 'Firm A Plaster');
    const b = await signUpFirm(t.app, 'Firm B Plaster');
    const email = uniqueEmail('shared');
    const aClient = await addClient(a, { name: 'Shared Name', email });
    const bClient = await addClient(b, { name: 'Shared Name', email });
    const bInq = await inquiry(b, { contactName: 'Shared Name', email });
    expect((await a.agent.get(`/api/inquiries/${bInq}/client-matches`)).status).toBe(404);
    expect((await a.agent.get(`/api/clients/${bClient}/matches`)).status).toBe(404);
    // B's own matches never list A's client with the same e-mail.
    expect((await b.agent.get(`/api/inquiries/${bInq}/client-matches`)).body.items.map((m: { id: string }) => m.id)).toEqual([bClient]);
    const into = await a.agent.post(`/api/clients/${aClient}/merge`).set('x-csrf-token', a.csrf()).send({ intoClientId: bClient });
    expect(into.status).toBe(404);
    const from = await a.agent.post(`/api/clients/${bClient}/merge`).set('x-csrf-token', a.csrf()).send({ intoClientId: aClient });
    expect(from.status).toBe(404);
    expect((await a.agent.get(`/api/clients/${aClient}`)).status).toBe(200);
    expect((await b.agent.get(`/api/clients/${bClient}`)).status).toBe(200);
  });
});
