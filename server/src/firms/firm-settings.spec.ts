import { COUNTRIES } from '@layerbook/contracts';
import { sentProposal } from '../proposals/portal-fixtures';
import { firmWithPricedEstimate } from '../proposals/proposal-fixtures';
import { issuedInvoice } from '../payments/refund-fixtures';
import { type Agent, signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('firm country (ISO 3166-1 alpha-2)', () => {
  // About 500 requests one after another: seconds on a quiet machine, several times that on a busy one.
  it('round-trips every listed country and refuses "UN", which is no country', async () => {
    const o = await signUpFirm(t.app);
    const base = (await o.agent.get('/api/firm')).body as Record<string, unknown>;
    const { id: _id, slug: _slug, updatedAt: _updatedAt, logoUrl: _logo, ...settings } = base;
    for (const { code } of COUNTRIES) {
      const saved = await o.agent
        .patch('/api/firm')
        .set('x-csrf-token', o.csrf())
        .send({ ...settings, country: code });
      expect([code, saved.status]).toEqual([code, 200]);
      expect((await o.agent.get('/api/firm')).body.country).toBe(code);
    }
    const un = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...settings, country: 'UN' });
    expect(un.status).toBe(400);
    expect(un.body.errors.map((e: { field: string }) => e.field)).toEqual(['country']);
    expect((await o.agent.get('/api/firm')).body.country).toBe(COUNTRIES[COUNTRIES.length - 1].code);
  }, 180_000);
});

describe('firm currency', () => {
  const settingsOf = async (agent: Agent) => {
    const {
      id: _id,
      slug: _slug,
      updatedAt: _updatedAt,
      logoUrl: _logo,
      ...settings
    } = (await agent.get('/api/firm')).body as Record<string, unknown>;
    return settings;
  };

  it('is one with at most two decimals: KWD (three, ISO 4217) is refused naming the field; JPY (none) is taken', async () => {
    const fresh = await signUpFirm(t.app);
    const settings = await settingsOf(fresh.agent);
    const kwd = await fresh.agent
      .patch('/api/firm')
      .set('x-csrf-token', fresh.csrf())
      .send({ ...settings, currency: 'KWD' });
    expect([kwd.status, kwd.body.errors?.map((e: { field: string }) => e.field)]).toEqual([400, ['currency']]);
    const jpy = await fresh.agent
      .patch('/api/firm')
      .set('x-csrf-token', fresh.csrf())
      .send({ ...settings, currency: 'JPY' });
    expect([jpy.status, jpy.body.currency]).toEqual([200, 'JPY']);
  });

  it('changes while the firm sets up, and stays once an invoice is issued (409 naming it, nothing changed)', async () => {
    const fresh = await signUpFirm(t.app);
    const changed = await fresh.agent
      .patch('/api/firm')
      .set('x-csrf-token', fresh.csrf())
      .send({ ...(await settingsOf(fresh.agent)), currency: 'CAD' });
    expect([changed.status, changed.body.currency]).toEqual([200, 'CAD']);

    const billed = await issuedInvoice(t, 'Kept Currency Lime');
    const refused = await billed.agent
      .patch('/api/firm')
      .set('x-csrf-token', billed.csrf())
      .send({ ...(await settingsOf(billed.agent)), currency: 'EUR', name: 'Renamed Lime' });
    expect(refused.status).toBe(409);
    expect(refused.body.errors).toEqual([
      { field: 'currency', message: "Proposals, jobs and invoices are already in USD: the firm's currency can no longer change." },
    ]);
    expect((await billed.agent.get('/api/firm')).body).toMatchObject({ currency: 'USD', name: 'Kept Currency Lime' });
  });

  it('may change while proposals are only drafts, however many (a second version supersedes the first unsent)', async () => {
    const f = await firmWithPricedEstimate(t, 'Two Drafts Lime');
    for (let i = 0; i < 2; i++) {
      const made = await f.agent
        .post('/api/proposals')
        .set('x-csrf-token', f.csrf())
        .send({ estimateId: f.estimateId, expiresOn: '2026-12-31' });
      expect(made.status).toBe(201);
    }
    const changed = await f.agent
      .patch('/api/firm')
      .set('x-csrf-token', f.csrf())
      .send({ ...(await settingsOf(f.agent)), currency: 'CAD' });
    expect([changed.status, changed.body.currency]).toEqual([200, 'CAD']);
  });

  it('stays once a proposal went to a client: its job, invoices and payments would be in the old currency', async () => {
    const sent = await sentProposal(t, 'Sent Currency Lime');
    const refused = await sent.agent
      .patch('/api/firm')
      .set('x-csrf-token', sent.csrf())
      .send({ ...(await settingsOf(sent.agent)), currency: 'JPY' });
    expect([refused.status, refused.body.errors?.[0]?.field]).toEqual([409, 'currency']);
    expect((await sent.agent.get('/api/firm')).body.currency).toBe('USD');
  });
});
