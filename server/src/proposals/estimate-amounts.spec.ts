import type { EstimateView } from '@layerbook/contracts';
import { startTestServer, type TestServer } from '../testing/harness';
import { firmWithPricedEstimate } from './proposal-fixtures';
import { patchFirm } from '../testing/firm-settings';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;
const inputsOf = async (f: Firm) => ((await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView).inputs;
const save = (f: Firm, inputs: object) => f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(inputs);

describe('the amounts an estimate is saved with', () => {
  it('fit the firm’s currency: sen in a yen estimate are refused, each field named, and nothing is saved', async () => {
    const f = await firmWithPricedEstimate(t, 'Yen Amounts Plaster');
    expect((await patchFirm(f, { currency: 'JPY' })).status).toBe(200);
    const before = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
    const refused = await save(f, {
      ...before.inputs,
      addOns: [{ id: 'x', label: 'Stencil', labourHours: 1, materialsCost: '1200.75' }],
      equipment: [{ label: 'Scaffold', amount: '30000.40' }],
      discount: { kind: 'amount', amount: '500.50' },
    });
    expect(refused.status).toBe(400);
    expect((refused.body.errors as Array<{ field: string; message: string }>).map((e) => [e.field, e.message])).toEqual([
      ['equipment.0.amount', 'Use whole amounts in JPY.'],
      ['addOns.0.materialsCost', 'Use whole amounts in JPY.'],
      ['discount.amount', 'Use whole amounts in JPY.'],
    ]);
    expect(((await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView).computedAt).toBe(before.computedAt);
    expect((await save(f, { ...before.inputs, equipment: [{ label: 'Scaffold', amount: '30000' }] })).status).toBe(200);
  });

  it('make a price that can be recorded: one past a money column is 400 naming the option, never a 500', async () => {
    const f = await firmWithPricedEstimate(t, 'Overflow Amounts Plaster');
    // each line passes its own check (12 whole digits); with overhead and profit the price does not fit numeric(14,2)
    const res = await save(f, { ...(await inputsOf(f)), equipment: [{ label: 'Scaffold', amount: '999999999999.00' }] });
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('variants.0');
  });
});
