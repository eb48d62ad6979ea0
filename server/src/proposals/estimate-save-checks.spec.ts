import type { EstimateView } from '@layerbook/contracts';
import { startTestServer, type TestServer } from '../testing/harness';
import { firmWithPricedEstimate } from './proposal-fixtures';

/*
 * Two people saving one estimate: each save names the save it started from (`computedAt` as loaded),
 * so the later one cannot silently undo the earlier. And add-on ids are unique, as option ids are.
 */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;

const load = async (f: Firm) => (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
const put = (f: Firm, body: object) => f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(body);

describe('saving an estimate someone else saved since it was opened', () => {
  it('answers 409 naming computedAt with the time of the other save, and keeps the other save', async () => {
    t.setNow(new Date('2026-12-01T15:00:00Z'));
    const f = await firmWithPricedEstimate(t, 'Two Desks Plaster');
    const first = await load(f);
    const second = await load(f);

    t.setNow(new Date('2026-12-01T15:42:00Z'));
    const a = await put(f, { ...first.inputs, equipment: [{ label: 'Scaffold', amount: '600.00' }], computedAt: first.computedAt });
    expect(a.status).toBe(200);

    t.setNow(new Date('2026-12-01T15:50:00Z'));
    const b = await put(f, { ...second.inputs, clientNotes: 'We cover floors daily.', computedAt: second.computedAt });
    expect(b.status).toBe(409);
    expect(b.body.errors.map((e: { field: string }) => e.field)).toEqual(['computedAt']);
    // the fixture's firm keeps the default zone; the time is said in it
    expect(b.body.detail).toMatch(/^Someone else saved this estimate at \d\d:\d\d, after you opened it\. Reload to see their changes/);
    const kept = await load(f);
    expect(kept.inputs.equipment).toEqual([{ label: 'Scaffold', amount: '600.00' }]);
    expect(kept.inputs.clientNotes ?? '').toBe('');

    // reloaded, the save goes through and carries both changes
    const c = await put(f, { ...kept.inputs, clientNotes: 'We cover floors daily.', computedAt: kept.computedAt });
    expect(c.status).toBe(200);
    expect((c.body as EstimateView).inputs).toMatchObject({ equipment: [{ label: 'Scaffold' }], clientNotes: 'We cover floors daily.' });
  });

  it('null means "never saved": refused once saved; a body without computedAt (an older client) is not checked', async () => {
    const f = await firmWithPricedEstimate(t, 'Old Client Plaster');
    const { inputs } = await load(f);
    const stale = await put(f, { ...inputs, computedAt: null });
    expect([stale.status, stale.body.errors?.[0]?.field]).toEqual([409, 'computedAt']);
    expect((await put(f, inputs)).status).toBe(200);
    const bad = await put(f, { ...inputs, computedAt: 'yesterday' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(['computedAt']);
  });
});

describe('add-on ids', () => {
  it('refuses two add-ons with one id: 400 naming addOns.1.id, nothing saved', async () => {
    const f = await firmWithPricedEstimate(t, 'Twin Addon Plaster');
    const before = await load(f);
    const addOn = { id: 'x', label: 'Border', labourHours: 2, materialsCost: '10.00' };
    const res = await put(f, { ...before.inputs, addOns: [addOn, { ...addOn, label: 'Frieze' }] });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ field: 'addOns.1.id', message: 'Each add-on needs its own id.' }]);
    expect((await load(f)).inputs.addOns).toEqual(before.inputs.addOns);
  });
});
