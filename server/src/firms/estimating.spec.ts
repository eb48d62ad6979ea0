import { defaultEstimatingSettings } from '@layerbook/contracts';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, startTestServer, TestServer, uniqueEmail } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('estimating settings', () => {
  it('starts from marked defaults, and the owner saves the firm’s own', async () => {
    const o = await signUpFirm(t.app, 'Rates Plaster');
    const first = await o.agent.get('/api/firm/estimating');
    expect(first.body).toMatchObject({
      isDefault: true,
      lengthUnit: 'ft',
      currency: 'USD',
      settings: defaultEstimatingSettings('imperial'),
    });
    const mine = {
      ...first.body.settings,
      labourRate: '62.50',
      overheadProfit: { method: 'markup', overheadPercent: 20, profitPercent: 15 },
      tax: { mode: 'materials', ratePercent: 8 },
    };
    const saved = await o.agent.put('/api/firm/estimating').set('x-csrf-token', o.csrf()).send(mine);
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ isDefault: false, settings: mine });
  });

  it('refuses margins that leave nothing of the price, and bad values, naming each field', async () => {
    const o = await signUpFirm(t.app);
    const base = defaultEstimatingSettings('imperial');
    const res = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({
        ...base,
        labourRate: '-5',
        overheadProfit: { method: 'margin', overheadPercent: 60, profitPercent: 45 },
        crewSize: 0,
        calendar: { ...base.calendar, workingWeekdays: [] },
        multipliers: { ...base.multipliers, ceiling: 0.5 },
      });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { field: string }) => e.field).sort()).toEqual([
      'calendar.workingWeekdays',
      'crewSize',
      'labourRate',
      'multipliers.ceiling',
      'overheadProfit.profitPercent',
    ]);
    const margin = await o.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', o.csrf())
      .send({ ...base, overheadProfit: { method: 'margin', overheadPercent: 60, profitPercent: 45 } });
    expect(margin.body.errors).toEqual([expect.objectContaining({ field: 'overheadProfit.profitPercent' })]);
    expect((await o.agent.get('/api/firm/estimating')).body.isDefault).toBe(true);
  });

  it('is not shown to crew, and only the owner changes it', async () => {
    const o = await signUpFirm(t.app);
    for (const role of ['crew', 'office'] as const) {
      const email = uniqueEmail(role);
      await o.agent.post('/api/team/invitations').set('x-csrf-token', o.csrf()).send({ email, role });
      const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
      const m = await newAgent(t.app);
      await m.agent
        .post('/api/auth/invitations/accept')
        .set('x-csrf-token', m.csrf())
        .send({ token, name: role, password: 'member-password-2026' });
      await m.refresh();
      expect((await m.agent.get('/api/firm/estimating')).status).toBe(role === 'crew' ? 403 : 200);
      expect((await m.agent.put('/api/firm/estimating').set('x-csrf-token', m.csrf()).send({})).status).toBe(403);
    }
  });
});
