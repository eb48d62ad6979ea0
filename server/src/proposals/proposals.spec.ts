import { STANDING_LINE } from '@layerbook/domain';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { linkIn } from '../testing/inbox';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { firmWithPricedEstimate, joinAs } from './proposal-fixtures';
import { pdfText } from './pdf/pdf-text';
import { snapshotHash } from './snapshot-hash';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  // 10:00 in New York (the firms' default zone): "today" is 2026-12-01 for every expiry rule below.
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;
const post = (f: Firm, url: string, body: object = {}) => f.agent.post(url).set('x-csrf-token', f.csrf()).send(body);
const propose = (f: Firm, body: object = {}) => post(f, '/api/proposals', { estimateId: f.estimateId, expiresOn: '2026-12-31', ...body });
const sum = (amounts: string[]) => amounts.reduce((a, b) => a.plus(b), new Decimal(0)).toFixed(2);

describe('proposal versions', () => {
  it('makes numbered drafts from the saved estimate, superseding the older draft, with a stable recorded hash', async () => {
    const f = await firmWithPricedEstimate(t, 'Kiln Lane Plaster');
    const v1 = await propose(f, {
      exclusions: ['Repairing cracked plaster', 'Moving furniture'],
      notes: 'Colours as on the approved sample board.',
    });
    expect(v1.status).toBe(201);
    expect(v1.body).toMatchObject({
      version: 1,
      status: 'draft',
      estimateId: f.estimateId,
      title: 'Dining room plaster',
      expiresOn: '2026-12-31',
      sentAt: null,
    });
    expect(v1.body.snapshotHash).toBe(snapshotHash(v1.body.snapshot));
    expect(v1.body.snapshotHash).toMatch(/^[0-9a-f]{64}$/);

    const s = v1.body.snapshot;
    expect(s).toMatchObject({
      title: 'Dining room plaster',
      issuedOn: '2026-12-01',
      expiresOn: '2026-12-31',
      currency: 'USD',
      locale: 'en-US',
      lengthUnit: 'ft',
      firm: { name: 'Kiln Lane Plaster', addressLines: ['12 Kiln Lane', 'Ochreford, VT 05999'], phone: '+1 802 555 0142' },
      client: { name: 'Edwina Marl', email: f.clientEmail },
      site: { addressLines: ['1 Round Row', 'Ochreford'], yearBuilt: 1990 },
      exclusions: ['Repairing cracked plaster', 'Moving furniture'],
      notes: 'Colours as on the approved sample board.',
      terms: { depositPercent: 30, progressPercent: 40, text: '' },
    });
    // DOMAIN.md §2.2: 2π·9·10 − 61 = 504.49 ft² of round walls.
    expect(s.scope).toEqual([
      {
        id: expect.any(String),
        name: 'Dining room',
        surfaces: [
          {
            id: f.surfaceId,
            name: 'Walls',
            measure: 'area',
            quantity: 504.5,
            unit: 'ft²',
            finishes: [
              { optionId: 'A', finish: 'Polished lime plaster' },
              { optionId: 'B', finish: 'Primed walls' },
            ],
          },
        ],
      },
    ]);
    // Option prices are the saved estimate's, at cents.
    const estimate = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body;
    for (const [i, option] of s.options.entries()) {
      const price = estimate.result.variants[i].result.price;
      expect(option).toMatchObject({
        id: estimate.result.variants[i].id,
        price: new Decimal(price.price).toFixed(2),
        tax: new Decimal(price.tax).toFixed(2),
        total: new Decimal(price.total).toFixed(2),
      });
      expect(new Decimal(option.tax).isZero()).toBe(false);
      // The payment schedule adds up to the option's total to the cent.
      expect(sum(option.payments.map((p: { amount: string }) => p.amount))).toBe(option.total);
    }
    const [a, b] = s.options;
    expect(a.payments.map((p: { id: string; percent: number | null }) => [p.id, p.percent])).toEqual([
      ['deposit', 30],
      ['progress', 40],
      ['final', null],
    ]);
    expect(a.payments[1]).toMatchObject({
      // named from its trigger, the layer the schedule waits for (not a "base coats" the terms guessed)
      label: 'Progress payment when Primer is finished on every surface',
      trigger: { kind: 'layerComplete', layerId: 'prime' },
    });
    // 30 % and 40 % of the total, split to the cent by largest remainder (the domain's rule).
    expect(new Decimal(a.payments[0].amount).minus(new Decimal(a.total).times(0.3)).abs().lte('0.01')).toBe(true);
    expect(new Decimal(a.payments[0].amount).plus(a.payments[1].amount).toFixed(2)).toBe(
      new Decimal(a.total).times(0.7).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2),
    );
    // A one-layer option has no base-layer milestone before completion: deposit, then the rest.
    expect(b.payments.map((p: { id: string }) => p.id)).toEqual(['deposit', 'final']);
    expect(a.schedule).toMatchObject({ startDate: '2026-12-07', workingDays: expect.any(Number) });
    expect(a.schedule.milestones.map((m: { id: string }) => m.id)).toEqual(['layer:prime', 'layer:lime', 'job']);
    expect(a.payments[2].expectedOn).toBe(a.schedule.finishDate);
    expect(s.addOns).toEqual([expect.objectContaining({ id: 'stencil', label: 'Stencilled border' })]);
    expect(s.safety.standing).toBe(STANDING_LINE);
    expect(s.safety.cautions.map((c: { id: string }) => c.id)).toContain('lime-alkali');

    const v2 = await propose(f, {
      exclusions: ['Repairing cracked plaster', 'Moving furniture'],
      notes: 'Colours as on the approved sample board.',
    });
    expect(v2.body.version).toBe(2);
    // Same content, same day: the same hash, whatever order jsonb returns the keys in.
    expect(v2.body.snapshotHash).toBe(v1.body.snapshotHash);
    const list = await f.agent.get(`/api/proposals?estimateId=${f.estimateId}`);
    expect(list.body.items.map((v: { version: number; status: string }) => [v.version, v.status])).toEqual([
      [2, 'draft'],
      [1, 'superseded'],
    ]);
    const v3 = await propose(f, { terms: { depositPercent: 50, progressPercent: 0 } });
    expect(v3.body.snapshotHash).not.toBe(v2.body.snapshotHash);
    expect(v3.body.snapshot.options[0].payments.map((p: { id: string }) => p.id)).toEqual(['deposit', 'final']);

    const audit = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select data from audit_log where tenant_id = $1 and action = 'proposal.created' and entity_id = $2`, [
        tx.tenantId,
        v1.body.id,
      ]),
    );
    expect(audit.rows[0].data).toMatchObject({ version: 1, snapshotHash: v1.body.snapshotHash });
  });

  it('refuses an estimate without saved prices (409), a past or present expiry (400 expiresOn) and terms over 100 %', async () => {
    const unsaved = await firmWithPricedEstimate(t, 'Unsaved Plaster', { save: false });
    const none = await propose(unsaved);
    expect(none.status).toBe(409);
    expect(none.headers['content-type']).toContain('application/problem+json');

    const f = await firmWithPricedEstimate(t, 'Expiry Plaster');
    for (const expiresOn of ['2026-11-30', '2026-12-01', '2028-01-01', '2026-02-30']) {
      const res = await propose(f, { expiresOn });
      expect(res.status).toBe(400);
      expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(['expiresOn']);
    }
    const over = await propose(f, { terms: { depositPercent: 70, progressPercent: 40 } });
    expect(over.status).toBe(400);
    expect(over.body.errors[0].field).toBe('terms.progressPercent');
    // exactly 100 % before completion would leave a final payment of 0.00, which nothing could bill
    const nothingLeft = await propose(f, { terms: { depositPercent: 60, progressPercent: 40 } });
    expect([nothingLeft.status, nothingLeft.body.errors[0].field]).toEqual([400, 'terms.progressPercent']);
    const unknown = await propose(f, { price: '1.00' });
    expect(unknown.body.errors[0].field).toBe('price');
  });

  it('draws the PDF from the snapshot: firm, title, prices, payments, safety line and reference', async () => {
    const f = await firmWithPricedEstimate(t, 'Verdigris & Umber Finishes');
    const v = (await propose(f, { exclusions: ['Repairing cracked plaster'], terms: { text: 'Invoices are due on receipt.' } })).body;
    const res = await f.agent
      .get(`/api/proposals/${v.id}/pdf`)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="proposal-dining-room-plaster-v1.pdf"');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    const text = pdfText(res.body as Buffer).replace(/\s+/g, ' ');
    const usd = (s: string) => new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(s as unknown as number);
    expect(text).toContain('Verdigris & Umber Finishes');
    expect(text).toContain('Dining room plaster');
    for (const o of v.snapshot.options) {
      expect(text).toContain(o.label);
      expect(text).toContain(usd(o.price));
      expect(text).toContain(usd(o.total));
      for (const p of o.payments) expect(text).toContain(usd(p.amount));
    }
    expect(text).toContain('Repairing cracked plaster');
    expect(text).toContain('Invoices are due on receipt.');
    expect(text).toContain(v.snapshot.safety.cautions[0].title);
    expect(text).toContain(STANDING_LINE);
    expect(text).toContain(`Version 1 · reference ${v.snapshotHash.slice(0, 12)}`);
  });
});

describe('sending a proposal', () => {
  it('freezes the version, opens a portal account and e-mails a one-time link once, even if the job runs twice', async () => {
    const f = await firmWithPricedEstimate(t, 'Lime Lantern Studio');
    const v = (await propose(f)).body;
    const edited = await f.agent
      .patch(`/api/proposals/${v.id}`)
      .set('x-csrf-token', f.csrf())
      .send({ expiresOn: '2027-01-15', exclusions: ['Moving furniture'] });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({
      version: 1,
      expiresOn: '2027-01-15',
      snapshot: { expiresOn: '2027-01-15', exclusions: ['Moving furniture'] },
    });
    expect(edited.body.snapshotHash).toBe(snapshotHash(edited.body.snapshot));

    const sent = await post(f, `/api/proposals/${v.id}/send`);
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({ status: 'sent', sentAt: '2026-12-01T15:00:00.000Z', snapshotHash: edited.body.snapshotHash });
    expect((await f.agent.get(`/api/estimates/${f.estimateId}`)).body.status).toBe('proposed');

    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail));
    expect(mail.subject).toBe('Lime Lantern Studio sent you a proposal: Dining room plaster');
    const url = new URL(linkIn(mail));
    expect(url.origin + url.pathname).toBe('http://localhost:4300/portal/sign-in/link');
    expect(url.searchParams.get('next')).toBe(`/portal/proposals/${v.id}`);
    expect(mail.text).toContain('January 15, 2027');

    // The link signs the client in to this firm's portal as this client.
    const c = await newAgent(t.app, 'portal');
    const signedIn = await c.agent
      .post('/api/portal/auth/redeem')
      .set('x-csrf-token', c.csrf())
      .send({ token: url.searchParams.get('token') });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.client).toMatchObject({ email: f.clientEmail, firmName: 'Lime Lantern Studio' });
    const account = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select client_id from portal_users where tenant_id = $1 and email = $2`, [tx.tenantId, f.clientEmail]),
    );
    expect(account.rows).toEqual([{ client_id: f.clientId }]);

    // The mail job runs again: the outbox row is already sent, nothing goes out twice.
    const { rows } = await t.queue.boss.getDb().executeSql(`select id from mail_outbox where purpose_key = $1`, [`proposal-sent:${v.id}`]);
    expect(rows).toHaveLength(1);
    await t.queue.boss.send('mail-send', { outboxId: rows[0].id });
    const marker = await firmWithPricedEstimate(t, 'Marker Plaster');
    await post(marker, `/api/proposals/${(await propose(marker)).body.id}/send`);
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker.clientEmail));
    expect(t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(f.clientEmail))).toHaveLength(1);

    // Frozen: no edit, no second send; a change is a new version.
    const patch = await f.agent.patch(`/api/proposals/${v.id}`).set('x-csrf-token', f.csrf()).send({ notes: 'changed' });
    expect(patch.status).toBe(409);
    expect((await post(f, `/api/proposals/${v.id}/send`)).status).toBe(409);
    const after = (await f.agent.get(`/api/proposals/${v.id}`)).body;
    expect(after.snapshot).toEqual(sent.body.snapshot);
    expect(after.snapshotHash).toBe(snapshotHash(after.snapshot));

    // Sending version 2 supersedes the sent version 1: only the newest can be accepted.
    const v2 = (await propose(f)).body;
    expect((await post(f, `/api/proposals/${v2.id}/send`)).status).toBe(200);
    const list = (await f.agent.get(`/api/proposals?estimateId=${f.estimateId}`)).body.items;
    expect(list.map((x: { version: number; status: string }) => [x.version, x.status])).toEqual([
      [2, 'sent'],
      [1, 'superseded'],
    ]);

    const audit = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`select data from audit_log where tenant_id = $1 and action = 'proposal.sent' and entity_id = $2`, [
        tx.tenantId,
        v.id,
      ]),
    );
    expect(audit.rows[0].data).toMatchObject({ version: 1, snapshotHash: edited.body.snapshotHash, to: f.clientEmail });
  });

  it('needs the client e-mail (400 client.email) and leaves the draft unsent', async () => {
    const f = await firmWithPricedEstimate(t, 'No Mail Plaster', { clientEmail: '' });
    const v = (await propose(f)).body;
    const res = await post(f, `/api/proposals/${v.id}/send`);
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ field: 'client.email', message: expect.any(String) }]);
    expect((await f.agent.get(`/api/proposals/${v.id}`)).body.status).toBe('draft');
  });
});

describe('who may see proposals', () => {
  it('keeps crew out (403: prices) and another firm out (404 on every route)', async () => {
    const f = await firmWithPricedEstimate(t, 'Guarded Plaster');
    const v = (await propose(f)).body;
    const crew = await joinAs(t, f, 'crew');
    const crewCalls = [
      crew.agent.get('/api/proposals'),
      crew.agent.get(`/api/proposals/${v.id}`),
      crew.agent.get(`/api/proposals/${v.id}/pdf`),
      crew.agent.post('/api/proposals').set('x-csrf-token', crew.csrf()).send({ nonsense: true }),
      crew.agent.patch(`/api/proposals/${v.id}`).set('x-csrf-token', crew.csrf()).send({}),
      crew.agent.post(`/api/proposals/${v.id}/send`).set('x-csrf-token', crew.csrf()).send({}),
    ];
    for (const res of await Promise.all(crewCalls)) expect(res.status).toBe(403);

    const other = await firmWithPricedEstimate(t, 'Nosy Plaster');
    expect((await other.agent.get(`/api/proposals/${v.id}`)).status).toBe(404);
    expect((await other.agent.get(`/api/proposals/${v.id}/pdf`)).status).toBe(404);
    expect((await other.agent.patch(`/api/proposals/${v.id}`).set('x-csrf-token', other.csrf()).send({ notes: 'x' })).status).toBe(404);
    expect((await post(other, `/api/proposals/${v.id}/send`)).status).toBe(404);
    expect((await post(other, '/api/proposals', { estimateId: f.estimateId, expiresOn: '2026-12-31' })).status).toBe(404);
    expect((await other.agent.get(`/api/proposals?estimateId=${f.estimateId}`)).body.items).toEqual([]);
    expect((await f.agent.get(`/api/proposals/${v.id}`)).body.status).toBe('draft');
  });
});
