import { assembleEstimateInput, type EstimateInputs } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { computeEstimate } from '@layerbook/domain';
import { joinAs } from '../../proposals/proposal-fixtures';
import { loadEstimateContext } from '../../proposals/estimate-context';
import { sentProposal } from '../../proposals/portal-fixtures';
import { startTestServer, TestServer } from '../../testing/harness';
import { acceptedJob, addChangeOrder, jobMoney, secondJob, sendChangeOrder } from './change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const lump = (title: string, price: string) => ({ title, description: '', pricing: { kind: 'lumpSum' as const, price } });

describe('change orders for the office', () => {
  it('numbers them 1, 2, 3 per job, each job counting on its own', async () => {
    const f = await acceptedJob(t, 'Numbering Plaster');
    const numbers = [];
    for (const title of ['Extra niche', 'Hall ceiling', 'Skip the border'])
      numbers.push((await addChangeOrder(f, lump(title, '100.00'))).number);
    expect(numbers).toEqual([1, 2, 3]);
    const other = await secondJob(t, f);
    expect((await addChangeOrder(f, lump('Hall skirting', '50.00'), other)).number).toBe(1);
    expect((await addChangeOrder(f, lump('Fourth', '10.00'))).number).toBe(4);

    const list = await f.agent.get(`/api/jobs/${f.jobId}/change-orders`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((c: { number: number; title: string }) => [c.number, c.title])).toEqual([
      [1, 'Extra niche'],
      [2, 'Hall ceiling'],
      [3, 'Skip the border'],
      [4, 'Fourth'],
    ]);
  });

  it('prices a lump sum up or down with the whole-job tax (8.25 %), and no tax when the firm taxes materials only', async () => {
    const f = await acceptedJob(t, 'Lump Sum Plaster');
    const contractSum = (await f.agent.get(`/api/jobs/${f.jobId}`)).body.contractSum as string;
    const up = await addChangeOrder(f, {
      title: 'Venetian niche',
      description: 'A polished niche by the stair.',
      pricing: { kind: 'lumpSum', price: '1000' },
    });
    // 1000.00 × 8.25 % = 82.50 (worked by hand)
    expect(up).toMatchObject({
      number: 1,
      status: 'draft',
      price: '1000.00',
      tax: '82.50',
      amount: '1082.50',
      currency: 'USD',
      pricingKind: 'lumpSum',
    });
    expect(up).toMatchObject({ engine: null, signedName: null, taxNote: null, contractSumBefore: contractSum });
    expect(up.contractSumAfter).toBe(new Decimal(contractSum).plus('1082.50').toFixed(2));
    const down = await addChangeOrder(f, lump('Leave out the hall', '-200.05'));
    // −200.05 × 8.25 % = −16.504125 → −16.50 (half away from zero)
    expect(down).toMatchObject({ price: '-200.05', tax: '-16.50', amount: '-216.55', pricing: { kind: 'lumpSum', price: '-200.05' } });

    const estimating = (await f.agent.get('/api/firm/estimating')).body.settings;
    await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...estimating, tax: { mode: 'materials', ratePercent: 8.25 } });
    const untaxed = await addChangeOrder(f, lump('Extra coat', '300.00'));
    expect(untaxed).toMatchObject({ price: '300.00', tax: '0.00', amount: '300.00' });
    expect(untaxed.taxNote).toBe('materialsOnly');
  });

  it('gives back at most the tax the contract carries: a deduction on a job sold untaxed carries none', async () => {
    const f = await acceptedJob(t, 'Untaxed Sale Plaster');
    const contractTax = async (value: string) =>
      withTenant(t.ctx.pool, f.firmId, (tx) =>
        tx.client.query(`update jobs set contract_tax = $3 where tenant_id = $1 and id = $2`, [tx.tenantId, f.jobId, value]),
      );
    await contractTax('0');
    // the firm taxes the whole job now (8.25 %), but this contract was sold with no tax in it
    expect(await addChangeOrder(f, lump('Leave out the hall', '-400.00'))).toMatchObject({
      price: '-400.00',
      tax: '0.00',
      amount: '-400.00',
    });
    await contractTax('10.00');
    const partly = await addChangeOrder(f, lump('Leave out the stair', '-400.00'));
    // −400.00 × 8.25 % = −33.00, but only 10.00 of tax is in the contract
    expect(partly).toMatchObject({ tax: '-10.00', amount: '-410.00' });
    // the contract's tax moved meanwhile (another deduction approved): sending it now is refused, naming why
    await contractTax('5.00');
    const sent = await f.agent.post(`/api/change-orders/${partly.id}/send`).set('x-csrf-token', f.csrf()).send({});
    expect(sent.status).toBe(409);
    expect(sent.body.detail).toMatch(/more tax than the contract carries/);
  });

  it('prices added work for itself, never up to the firm minimum charge for a whole job', async () => {
    const f = await acceptedJob(t, 'Minimum Plaster');
    const view = (await f.agent.get('/api/firm/estimating')).body as { settings: Record<string, unknown> };
    const raised = await f.agent
      .put('/api/firm/estimating')
      .set('x-csrf-token', f.csrf())
      .send({ ...view.settings, minimumCharge: '90000.00' });
    expect(raised.status).toBe(200);
    const made = await addChangeOrder(f, {
      title: 'Prime the dining room walls again',
      description: '',
      pricing: { kind: 'engine', surfaceIds: [f.surfaceId], finishSystemId: f.simpleId },
    });
    expect(Number(made.price)).toBeGreaterThan(0);
    expect(Number(made.price)).toBeLessThan(90000);
  });

  it('prices added surfaces with the engine: the same figure the engine gives for those surfaces', async () => {
    const f = await acceptedJob(t, 'Engine Plaster');
    const made = await addChangeOrder(f, {
      title: 'Prime the dining room walls again',
      description: '',
      pricing: { kind: 'engine', surfaceIds: [f.surfaceId], finishSystemId: f.simpleId },
    });
    const siteId = (await f.agent.get(`/api/jobs/${f.jobId}`)).body.siteId as string;
    const expected = await withTenant(t.ctx.pool, f.firmId, async (tx) => {
      const loaded = await loadEstimateContext(tx, siteId);
      // A change order is priced without the firm's minimum charge (the job already carries it).
      const context = { ...loaded, settings: { ...loaded.settings, minimumCharge: null } };
      const inputs: EstimateInputs = {
        title: 'Same surfaces',
        startDate: '2026-12-07',
        isOccupied: false,
        variants: [{ id: 'X', label: 'X', surfaces: [{ surfaceId: f.surfaceId, finishSystemId: f.simpleId }] }],
        addOns: [],
        equipment: [],
        subcontracts: [],
        sundries: [],
        discount: null,
        perAreaRates: {},
      };
      return computeEstimate(assembleEstimateInput(context, inputs, 'X'));
    });
    expect(made).toMatchObject({
      pricingKind: 'engine',
      pricing: { kind: 'engine', surfaceIds: [f.surfaceId], finishSystemId: f.simpleId },
      price: expected.price.price.toFixed(2),
      tax: expected.price.tax.toFixed(2),
      amount: expected.price.total.toFixed(2),
    });
    expect(Number(made.tax)).toBeGreaterThan(0);
    expect(made.engine).toEqual({
      finishName: 'Primed walls',
      surfaces: [{ room: 'Dining room', surface: 'Walls', quantity: expect.stringMatching(/ ft²$/) as unknown }],
      labourHours: expected.labour.totalCrewHours.toFixed(2),
      workingDays: expected.schedule.workingDays,
    });
  });

  it('changes a draft only; sending e-mails the client a portal link and freezes it', async () => {
    const f = await acceptedJob(t, 'Send Plaster');
    const made = await addChangeOrder(f, lump('Extra niche', '400.00'));
    const changed = await f.agent
      .patch(`/api/change-orders/${made.id}`)
      .set('x-csrf-token', f.csrf())
      .send({ title: 'Two extra niches', pricing: { kind: 'lumpSum', price: '800.00' } });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ title: 'Two extra niches', price: '800.00', tax: '66.00', amount: '866.00', status: 'draft' });
    expect((await f.agent.patch(`/api/change-orders/${made.id}`).set('x-csrf-token', f.csrf()).send({})).status).toBe(400);

    const sent = await sendChangeOrder(f, made.id);
    expect(sent.status).toBe('sent');
    expect(sent.sentAt).toBe('2026-12-01T15:00:00.000Z');
    const mail = await t.inbox.waitFor(
      (m) => JSON.stringify(m.to).includes(f.clientEmail) && (m.text ?? '').includes(`/portal/change-orders/${made.id}`),
    );
    expect(mail.subject).toBe('Send Plaster sent you change order #1: Two extra niches');
    expect(mail.text).toContain('$866.00');

    const late = await f.agent.patch(`/api/change-orders/${made.id}`).set('x-csrf-token', f.csrf()).send({ title: 'Three niches' });
    expect(late.status).toBe(409);
    expect((await f.agent.post(`/api/change-orders/${made.id}/send`).set('x-csrf-token', f.csrf()).send({})).status).toBe(409);
    expect((await f.agent.get(`/api/change-orders/${made.id}`)).body.title).toBe('Two extra niches');
  });

  it('refuses bad input with 400 naming the field, and writes nothing', async () => {
    const f = await acceptedJob(t, 'Bad Input Plaster');
    const post = (body: unknown) =>
      f.agent
        .post(`/api/jobs/${f.jobId}/change-orders`)
        .set('x-csrf-token', f.csrf())
        .send(body as object);
    const fields = async (body: unknown) => {
      const res = await post(body);
      expect(res.status).toBe(400);
      return (res.body.errors as Array<{ field: string }>).map((e) => e.field);
    };
    expect(await fields({ title: ' ', description: '', pricing: { kind: 'lumpSum', price: '10.00' } })).toEqual(['title']);
    expect(await fields(lump('Niche', 'ten dollars'))).toEqual(['pricing.price']);
    expect(await fields(lump('Niche', '0.00'))).toEqual(['pricing.price']);
    expect(await fields(lump('Niche', '10.005'))).toEqual(['pricing.price']);
    // 999,999,999,999.99 fits the column, but not with 8.25 % tax on top
    expect(await fields(lump('Niche', '999999999999.99'))).toEqual(['pricing.price']);
    // a deduction of the whole job (and its tax) leaves no contract: refused as typed, not first when sent
    const { contract_sum: sum } = await jobMoney(t, f);
    const whole = await post(lump('Leave it all out', `-${sum}`));
    expect(whole.body.errors).toEqual([
      {
        field: 'pricing.price',
        message: expect.stringMatching(/^This takes off more than the contract sum of \$[\d,]+\.\d\d: the job would be worth nothing\.$/),
      },
    ]);
    expect(
      await fields({ title: 'Niche', description: '', pricing: { kind: 'engine', surfaceIds: ['nope'], finishSystemId: f.simpleId } }),
    ).toEqual(['pricing.surfaceIds.0']);
    // a surface id of this firm's, but not measured on this job's site: refused by the server
    expect(
      await fields({ title: 'Niche', description: '', pricing: { kind: 'engine', surfaceIds: [f.simpleId], finishSystemId: f.simpleId } }),
    ).toEqual(['pricing.surfaceIds.0']);
    expect(
      await fields({
        title: 'Niche',
        description: '',
        pricing: { kind: 'engine', surfaceIds: [f.surfaceId], finishSystemId: f.surfaceId },
      }),
    ).toEqual(['pricing.finishSystemId']);
    expect(await fields({ title: 'Niche', pricing: { kind: 'lumpSum', price: '10.00' }, colour: 'red' })).toEqual(['colour']);
    expect((await f.agent.get(`/api/jobs/${f.jobId}/change-orders`)).body.items).toEqual([]);
  });

  it('is for owner and office: crew 403 everywhere; another firm 404', async () => {
    const f = await acceptedJob(t, 'Roles Plaster');
    const made = await addChangeOrder(f, lump('Extra niche', '400.00'));
    const crew = await joinAs(t, f, 'crew');
    expect((await crew.agent.get(`/api/jobs/${f.jobId}/change-orders`)).status).toBe(403);
    expect((await crew.agent.post(`/api/jobs/${f.jobId}/change-orders`).set('x-csrf-token', crew.csrf()).send({})).status).toBe(403);
    expect((await crew.agent.get(`/api/change-orders/${made.id}`)).status).toBe(403);
    expect((await crew.agent.patch(`/api/change-orders/${made.id}`).set('x-csrf-token', crew.csrf()).send({ title: 'x' })).status).toBe(
      403,
    );
    expect((await crew.agent.post(`/api/change-orders/${made.id}/send`).set('x-csrf-token', crew.csrf()).send({})).status).toBe(403);
    const office = await joinAs(t, f, 'office');
    expect((await office.agent.get(`/api/change-orders/${made.id}`)).status).toBe(200);

    const other = await sentProposal(t, 'Other Roles Plaster', { signIn: false });
    expect((await other.agent.get(`/api/jobs/${f.jobId}/change-orders`)).status).toBe(404);
    expect(
      (await other.agent.post(`/api/jobs/${f.jobId}/change-orders`).set('x-csrf-token', other.csrf()).send(lump('x', '1.00'))).status,
    ).toBe(404);
    expect((await other.agent.get(`/api/change-orders/${made.id}`)).status).toBe(404);
    expect((await other.agent.patch(`/api/change-orders/${made.id}`).set('x-csrf-token', other.csrf()).send({ title: 'x' })).status).toBe(
      404,
    );
    expect((await other.agent.post(`/api/change-orders/${made.id}/send`).set('x-csrf-token', other.csrf()).send({})).status).toBe(404);
    expect((await f.agent.get(`/api/change-orders/${made.id}`)).body.status).toBe('draft');
  });
});
