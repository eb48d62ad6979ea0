import Decimal from 'decimal.js';
import type { Problem, TodayView } from '@layerbook/contracts';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const likelihoods = (overrides: Record<string, unknown>) => ({
  likelihoods: { new: 10, contacted: 20, visit_booked: 20, samples: 70, proposal_sent: 40, won: 100, lost: 0, ...overrides },
});

describe("the stages' likelihoods", () => {
  it('take JSON numbers only: null, "" and false are refused with a 400 naming each stage, not stored as 0 %', async () => {
    const o = await signUpFirm(t.app, 'Null Odds Plaster');
    const res = await o.agent
      .put('/api/inquiries/stages')
      .set('x-csrf-token', o.csrf())
      .send(likelihoods({ new: null, contacted: '', visit_booked: false, samples: '70' }));
    expect(res.status).toBe(400);
    expect((res.body as Problem).errors?.map((e) => e.field).sort()).toEqual([
      'likelihoods.contacted',
      'likelihoods.new',
      'likelihoods.samples',
      'likelihoods.visit_booked',
    ]);
    // more decimals than the column keeps
    const fine = await o.agent
      .put('/api/inquiries/stages')
      .set('x-csrf-token', o.csrf())
      .send(likelihoods({ new: 7.775 }));
    expect([fine.status, (fine.body as Problem).errors?.map((e) => e.field)]).toEqual([400, ['likelihoods.new']]);
    // nothing was stored by either
    const stages = (await o.agent.get('/api/inquiries/stages')).body as { items: Array<{ stage: string; likelihoodPercent: number }> };
    expect(stages.items.find((s) => s.stage === 'new')?.likelihoodPercent).not.toBe(0);
  });

  it("weigh Today's pipeline in decimals: 50.00 at 7.77 % is 3.885, rounded half up to 3.89 (a float gave 3.88)", async () => {
    const o = await signUpFirm(t.app, 'Decimal Pipeline Plaster');
    expect(
      (
        await o.agent
          .put('/api/inquiries/stages')
          .set('x-csrf-token', o.csrf())
          .send(likelihoods({ new: 7.77 }))
      ).status,
    ).toBe(200);
    const made = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Fifty', source: 'phone', estimatedValue: '50.00' });
    expect(made.status).toBe(201);
    // 50 × 0.0777 = 3.885 exactly (arithmetic); half up to cents as every money figure here rounds
    expect(new Decimal('50.00').times('0.0777').toFixed(2)).toBe('3.89');
    const today = (await o.agent.get('/api/inquiries/today')).body as TodayView;
    expect(today.pipeline).toMatchObject({ unweighted: '50.00', weighted: '3.89' });
  });
});
