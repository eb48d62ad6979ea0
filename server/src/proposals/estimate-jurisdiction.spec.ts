import { withTenant } from '@layerbook/db';
import { startTestServer, TestServer } from '../testing/harness';
import { firmWithPricedEstimate } from './proposal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

interface Caution {
  id: string;
  jurisdiction: string;
}
const cautionsOf = (body: { result: { variants: Array<{ result: { cautions: Caution[] } }> } }) =>
  body.result.variants.flatMap((v) => v.result.cautions);

describe('safety cautions and the firm country', () => {
  it('say the cited rules are US federal, and for a firm outside the US add "check your national or provincial rules"', async () => {
    const f = await firmWithPricedEstimate(t, 'Ochre Ridge Lime');
    const us = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body;
    expect(us.context.firmCountry).toBe('US');
    const usCautions = cautionsOf(us);
    expect(usCautions.length).toBeGreaterThan(0);
    for (const c of usCautions) expect(c.jurisdiction).toMatch(/^(A US federal rule\.|Guidance, not a regulation\.)$/);

    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update firms set country = 'CA' where id = $1`, [f.firmId]));
    const saved = await f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(us.inputs);
    expect(saved.status).toBe(200);
    const ca = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body;
    expect(ca.context.firmCountry).toBe('CA');
    for (const c of cautionsOf(ca)) expect(c.jurisdiction).toMatch(/ Outside the US, check your national or provincial rules\.$/);
  });
});
