import type { EstimateInputs, EstimateView, EstimatingSettingsView, ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { startTestServer, type TestServer } from '../testing/harness';
import { ESTIMATE_NUMBERS_CHANGED } from './estimate-freshness';
import { firmWithPricedEstimate } from './proposal-fixtures';

/*
 * A proposal carries the estimate's saved numbers. When what they were worked out from changed since
 * the save (a surface measured again, the labour rate, the house's year), the version waits until the
 * estimate is saved again, so the client never reads old sizes or prices, and the lead-safe caution
 * of a house found to be older is never left out. A draft made before the estimate was re-priced is
 * not sent with its old price either.
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;

const makeVersion = (f: Firm) =>
  f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-20' });
const send = (f: Firm, id: string) => f.agent.post(`/api/proposals/${id}/send`).set('x-csrf-token', f.csrf()).send();

async function saveEstimate(f: Firm, change: Partial<EstimateInputs> = {}): Promise<EstimateView> {
  const { inputs } = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
  const saved = await f.agent
    .put(`/api/estimates/${f.estimateId}/inputs`)
    .set('x-csrf-token', f.csrf())
    .send({ ...inputs, ...change });
  expect(saved.status).toBe(200);
  return saved.body as EstimateView;
}

async function versionCount(f: Firm): Promise<number> {
  return ((await f.agent.get(`/api/proposals?estimateId=${f.estimateId}`)).body as { items: unknown[] }).items.length;
}

const REFUSAL = [{ field: 'estimateId', message: ESTIMATE_NUMBERS_CHANGED }];

describe('a proposal made after what the estimate was worked out from changed', () => {
  it('a surface measured again: 409 estimateId, nothing made; saved again, the version has the new size', async () => {
    const f = await firmWithPricedEstimate(t, 'Fresh Measure Plaster');
    const patched = await f.agent
      .patch(`/api/takeoff/surfaces/${f.surfaceId}`)
      .set('x-csrf-token', f.csrf())
      .send({ shape: { kind: 'roundWalls', radius: 18, height: 10, openings: [] } });
    expect(patched.status).toBe(200);

    const refused = await makeVersion(f);
    expect([refused.status, refused.body.errors]).toEqual([409, REFUSAL]);
    expect(await versionCount(f)).toBe(0);

    const saved = await saveEstimate(f);
    const made = await makeVersion(f);
    expect(made.status).toBe(201);
    const optionA = (made.body as ProposalVersionView).snapshot.options[0];
    expect(optionA.total).toBe(new Decimal(saved.result!.variants[0].result.price.total).toFixed(2));
  });

  it('the labour rate raised: 409 until the estimate is saved again at the new rate', async () => {
    const f = await firmWithPricedEstimate(t, 'Fresh Rate Plaster');
    const before = ((await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView).price;
    const estimating = ((await f.agent.get('/api/firm/estimating')).body as EstimatingSettingsView).settings;
    const put = await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...estimating, labourRate: '95.00' });
    expect(put.status).toBe(200);

    const refused = await makeVersion(f);
    expect([refused.status, refused.body.errors]).toEqual([409, REFUSAL]);
    expect(refused.body.detail).toBe(ESTIMATE_NUMBERS_CHANGED);

    const saved = await saveEstimate(f);
    expect(Number(saved.price)).toBeGreaterThan(Number(before));
    expect((await makeVersion(f)).status).toBe(201);
  });

  it('the year built corrected to 1950 with paint disturbed: 409; saved again, the lead-safe caution is in the version', async () => {
    const f = await firmWithPricedEstimate(t, 'Fresh Year Plaster');
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update surfaces set disturbed_painted_area = 40 where tenant_id = $1 and id = $2`, [tx.tenantId, f.surfaceId]),
    );
    await saveEstimate(f);
    const siteId = ((await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView).siteId;
    const patched = await f.agent.patch(`/api/sites/${siteId}`).set('x-csrf-token', f.csrf()).send({ yearBuilt: 1950 });
    expect(patched.status).toBe(200);

    const refused = await makeVersion(f);
    expect([refused.status, refused.body.errors]).toEqual([409, REFUSAL]);

    await saveEstimate(f);
    const made = await makeVersion(f);
    expect(made.status).toBe(201);
    const snapshot = (made.body as ProposalVersionView).snapshot;
    expect(snapshot.safety.cautions.map((c) => c.id)).toContain('lead-safe-work');
    expect(snapshot.leadNotice).not.toBeNull();
  });

  it('refuses a draft changed or sent after the rate changed, until the estimate is saved again', async () => {
    const f = await firmWithPricedEstimate(t, 'Fresh Draft Plaster');
    const draft = await makeVersion(f);
    expect(draft.status).toBe(201);
    const estimating = ((await f.agent.get('/api/firm/estimating')).body as EstimatingSettingsView).settings;
    await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...estimating, labourRate: '95.00' });

    const changed = await f.agent.patch(`/api/proposals/${draft.body.id}`).set('x-csrf-token', f.csrf()).send({ notes: 'Two weeks.' });
    expect([changed.status, changed.body.errors]).toEqual([409, REFUSAL]);
    const sent = await send(f, draft.body.id);
    expect([sent.status, sent.body.errors]).toEqual([409, REFUSAL]);
    expect(((await f.agent.get(`/api/proposals/${draft.body.id}`)).body as ProposalVersionView).status).toBe('draft');
  });
});

describe('sending a draft made before the estimate was re-priced', () => {
  it('is refused (409 estimateId, naming the version); the draft saved again takes the new price and sends', async () => {
    const f = await firmWithPricedEstimate(t, 'Stale Draft Plaster');
    const draft = await makeVersion(f);
    expect(draft.status).toBe(201);
    const saved = await saveEstimate(f, { equipment: [{ label: 'Scaffold', amount: '900.00' }] });

    const refused = await send(f, draft.body.id);
    expect(refused.status).toBe(409);
    expect(refused.body.errors.map((e: { field: string }) => e.field)).toEqual(['estimateId']);
    expect(refused.body.detail).toContain('Version 1 was made from the estimate');
    expect(refused.body.detail).toContain('"Edit"');
    expect(((await f.agent.get(`/api/proposals/${draft.body.id}`)).body as ProposalVersionView).status).toBe('draft');

    const refreshed = await f.agent.patch(`/api/proposals/${draft.body.id}`).set('x-csrf-token', f.csrf()).send({ notes: '' });
    expect(refreshed.status).toBe(200);
    const out = await send(f, draft.body.id);
    expect(out.status).toBe(200);
    expect((out.body as ProposalVersionView).snapshot.options[0].total).toBe(
      new Decimal(saved.result!.variants[0].result.price.total).toFixed(2),
    );
  });
});
