import { firmWithPricedEstimate } from './proposal-fixtures';
import { startTestServer, TestServer } from '../testing/harness';
import { patchFirm } from '../testing/firm-settings';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('a proposal made after the firm changed its units', () => {
  it('is refused until the estimate is saved again, then sizes are in the new unit', async () => {
    const f = await firmWithPricedEstimate(t, 'Unit Switch Plaster');
    const est = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body;
    const feet = est.result.variants[0].result.surfaces[0].measure.quantity as number;
    expect(est.result.lengthUnit).toBe('ft');
    const patched = await patchFirm(f, { units: 'metric' });
    expect(patched.status).toBe(200);
    const send = () =>
      f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-31' });
    // feet figures are never labelled m²: the office is told to save the estimate again
    const refused = await send();
    expect(refused.status).toBe(409);
    expect(refused.body.errors[0].field).toBe('estimateId');
    expect(refused.body.detail).toContain('saved in feet');

    const resaved = await f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(est.inputs);
    expect(resaved.status).toBe(200);
    const made = await send();
    expect(made.status).toBe(201);
    const shown = made.body.snapshot.scope[0].surfaces[0];
    // 1 ft² = 0.09290304 m² (NIST SP 811 App. B.8), to one decimal as the proposal prints it
    expect(shown.unit).toBe('m²');
    expect(shown.quantity).toBeCloseTo(feet * 0.09290304, 1);
  });
});
