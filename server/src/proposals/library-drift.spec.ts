import type { EstimateView, FinishSystemView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { startTestServer, type TestServer } from '../testing/harness';
import { firmWithPricedEstimate } from './proposal-fixtures';

/*
 * A proposal version keeps the finish systems and products beside the numbers the estimate's last save
 * worked out from them: one edited since that save is refused until the estimate is saved again.
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;

/** Prices the fixture's estimate at 15:00; later steps move the clock on, as an office's day does. */
async function pricedAt3pm(name: string): Promise<Firm> {
  t.setNow(new Date('2026-11-20T15:00:00Z'));
  return firmWithPricedEstimate(t, name);
}
const at = (time: string) => t.setNow(new Date(`2026-11-20T${time}:00Z`));

const makeVersion = (f: Firm) =>
  f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-20' });

async function saveEstimateAgain(f: Firm): Promise<void> {
  const { inputs } = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
  expect((await f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(inputs)).status).toBe(200);
}

/** The office edits the primed system for future work: a longer wait and a thinner primer. */
async function editPrimedSystem(f: Firm): Promise<void> {
  const priced = (await f.agent.get(`/api/library/systems/${f.simpleId}`)).body as FinishSystemView;
  const layers = priced.layers.map((l) => ({ ...l, waitHoursAfter: 48, dilution: { share: 0.5, convention: 'ofConcentrate' as const } }));
  expect((await f.agent.patch(`/api/library/systems/${f.simpleId}`).set('x-csrf-token', f.csrf()).send({ layers })).status).toBe(200);
}

async function keptWaits(f: Firm, versionId: string): Promise<number[]> {
  const { rows } = await withTenant(t.ctx.pool, f.firmId, (tx) =>
    tx.client.query<{ library: { finishSystems: Array<{ id: string; layers: Array<{ waitHoursAfter: number }> }> } }>(
      `select library from proposal_versions where tenant_id = $1 and id = $2`,
      [tx.tenantId, versionId],
    ),
  );
  return rows[0].library.finishSystems.find((s) => s.id === f.simpleId)!.layers.map((l) => l.waitHoursAfter);
}

const REFUSAL = { field: 'estimateId', message: 'The finish systems changed since this estimate was priced; save the estimate again.' };

describe('a finish system edited after the estimate was priced', () => {
  it('refuses the version (409 estimateId, naming the system, nothing made) until the estimate is saved again', async () => {
    const f = await pricedAt3pm('Drift System Plaster');
    at('16:00');
    await editPrimedSystem(f);
    const refused = await makeVersion(f);
    expect([refused.status, refused.body.errors]).toEqual([409, [REFUSAL]]);
    expect(refused.body.detail).toContain('"Primed walls"');
    expect((await f.agent.get(`/api/proposals?estimateId=${f.estimateId}`)).body.items).toEqual([]);

    at('17:00');
    await saveEstimateAgain(f);
    const made = await makeVersion(f);
    expect(made.status).toBe(201);
    // the crew's sheet reads the layers the new price was worked out from
    expect(await keptWaits(f, made.body.id)).toEqual([48]);
  });

  it('refuses a change to a draft made before the edit, which would copy the library again', async () => {
    const f = await pricedAt3pm('Drift Draft Plaster');
    const draft = await makeVersion(f);
    expect(draft.status).toBe(201);
    at('16:00');
    await editPrimedSystem(f);
    const changed = await f.agent
      .patch(`/api/proposals/${draft.body.id}`)
      .set('x-csrf-token', f.csrf())
      .send({ notes: 'Two weeks on site.' });
    expect([changed.status, changed.body.errors]).toEqual([409, [REFUSAL]]);
    expect(await keptWaits(f, draft.body.id)).toEqual([4]);
  });

  it('counts a product the options use (a new price), not a system they do not use', async () => {
    const f = await pricedAt3pm('Drift Product Plaster');
    at('16:00');
    const unused = await f.agent.post('/api/library/systems/' + f.simpleId + '/duplicate').set('x-csrf-token', f.csrf());
    expect(unused.status).toBe(201);
    expect(
      (await f.agent.patch(`/api/library/systems/${unused.body.id}`).set('x-csrf-token', f.csrf()).send({ name: 'Primed twice' })).status,
    ).toBe(200);
    expect((await makeVersion(f)).status).toBe(201);

    const { rows } = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query<{ id: string }>(`select id from products where tenant_id = $1 and name = 'Acrylic primer'`, [tx.tenantId]),
    );
    at('17:00');
    const repriced = await f.agent
      .patch(`/api/library/products/${rows[0].id}`)
      .set('x-csrf-token', f.csrf())
      .send({ containers: [{ label: 'Gallon', size: 1, unit: 'gallon', price: '49.00' }] });
    expect(repriced.status).toBe(200);
    const refused = await makeVersion(f);
    expect([refused.status, refused.body.errors, refused.body.detail]).toEqual([
      409,
      [REFUSAL],
      expect.stringContaining('"Acrylic primer"'),
    ]);
  });
});
