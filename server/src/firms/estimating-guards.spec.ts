/* The firm's estimating settings: measures kept the same size across a change of units, and values the engine would refuse refused when saved. */
import { defaultEstimatingSettings, type EstimateInputs, type EstimatingSettingsView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { firmWithPricedEstimate } from '../proposals/proposal-fixtures';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { sessionsWaiting } from '../testing/lock-waits';
import { patchFirm } from '../testing/firm-settings';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('estimating settings and the firm’s units', () => {
  it('keeps the saved heights and areas the same size when the firm goes metric', async () => {
    const o = await signUpFirm(t.app, 'Review Units Plaster');
    const saved = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({ ...defaultEstimatingSettings('imperial'), minDeductedOpeningArea: 10 });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ lengthUnit: 'ft', settings: { scaffoldHeight: 12, workingReach: 6 } });

    expect((await patchFirm(o, { units: 'metric' })).status).toBe(200);
    const after = (await o.agent.get('/api/firm/estimating')).body as EstimatingSettingsView;
    expect(after.lengthUnit).toBe('m');
    // 12 ft = 3.6576 m, 6 ft = 1.8288 m, 10 ft² = 0.9290304 m² (NIST SP 811 B.8: 1 ft = 0.3048 m exactly)
    expect(after.settings.scaffoldHeight).toBeCloseTo(3.6576, 3);
    expect(after.settings.workingReach).toBeCloseTo(1.8288, 3);
    expect(after.settings.minDeductedOpeningArea).toBeCloseTo(0.9290304, 3);
  });
});

describe('two switches of units at once (a double-clicked Save)', () => {
  it('converts the measures once: 12 ft is 3.6576 m, not 1.1148 m', async () => {
    const o = await signUpFirm(t.app, 'Double Save Plaster');
    expect(
      (await o.agent.put('/api/firm/estimating').set('x-csrf-token', o.csrf()).send(defaultEstimatingSettings('imperial'))).status,
    ).toBe(200);
    // Another transaction holds the firm's row (as any change of the firm does), so both saves queue behind it.
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    let locked!: () => void;
    const lockedYet = new Promise<void>((resolve) => (locked = resolve));
    const holder = withTenant(t.ctx.pool, o.firmId, async (tx) => {
      await tx.client.query(`select 1 from firms where id = $1 for update`, [o.firmId]);
      locked();
      await held;
    });
    await lockedYet;
    const both = Promise.all([patchFirm(o, { units: 'metric' }), patchFirm(o, { units: 'metric' })]);
    await sessionsWaiting(t.ctx.pool, 2, 'the two saves');
    release();
    await holder;
    expect((await both).map((r) => r.status)).toEqual([200, 200]);

    const view = (await o.agent.get('/api/firm/estimating')).body as EstimatingSettingsView;
    expect([view.lengthUnit, view.settings.scaffoldHeight, view.settings.workingReach]).toEqual(['m', 3.6576, 1.8288]);
  });
});

describe('estimating settings the engine would refuse', () => {
  it('is refused when the owner saves it, naming the field', async () => {
    const f = await firmWithPricedEstimate(t, 'Review Rounding Plaster', { save: false });
    const current = ((await f.agent.get('/api/firm/estimating')).body as EstimatingSettingsView).settings;
    const res = await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...current, rounding: { kind: 'nearest', increment: '0.00' } });
    const estimate = await f.agent
      .put(`/api/estimates/${f.estimateId}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send({
        title: 'Dining room plaster',
        startDate: '2026-12-07',
        isOccupied: false,
        variants: [{ id: 'A', label: 'Polished lime', surfaces: [{ surfaceId: f.surfaceId, finishSystemId: f.systemId }] }],
        addOns: [],
        equipment: [],
        subcontracts: [],
        sundries: [],
        discount: null,
        perAreaRates: {},
      } satisfies EstimateInputs);
    // the estimate still saves: the bad increment was never kept
    expect(estimate.status).toBe(200);
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([expect.objectContaining({ field: 'rounding.increment' })]);
  });
});

describe('amounts finer than the firm’s currency', () => {
  it('refuses a minimum charge in fractions of a yen', async () => {
    const o = await signUpFirm(t.app, 'Review Yen Plaster');
    expect((await patchFirm(o, { currency: 'JPY' })).status).toBe(200);
    const res = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({ ...defaultEstimatingSettings('imperial'), labourRate: '5500.75', minimumCharge: '150000.50' });
    expect([res.status, res.body.errors?.map((e: { field: string }) => e.field)]).toEqual([400, ['labourRate', 'minimumCharge']]);
  });
});

describe('a working day that runs past midnight', () => {
  it('is refused when saved, not at every estimate afterwards', async () => {
    const o = await signUpFirm(t.app, 'Review Night Plaster');
    const base = defaultEstimatingSettings('imperial');
    const res = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({ ...base, calendar: { ...base.calendar, dayStartHour: 20, productiveHoursPerDay: 8 } });
    // the engine refuses it ('The working day runs past midnight.') on every estimate of the firm
    expect([res.status, res.body.errors?.map((e: { field: string }) => e.field)]).toEqual([400, ['calendar.productiveHoursPerDay']]);
  });
});
