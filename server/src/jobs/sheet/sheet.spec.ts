import type { EstimateView, ItemList, JobSheet, JobSheetSummary } from '@layerbook/contracts';
import { assembleEstimateInput } from '@layerbook/contracts/engine';
import { withTenant } from '@layerbook/db';
import { OFFICE_ONLY_LINES, computeEstimate, planDays, toResultJson } from '@layerbook/domain';
import { acceptedJob } from '../../billing/progress-fixtures';
import { joinAs } from '../../proposals/proposal-fixtures';
import { newAgent, startTestServer, type TestServer } from '../../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;
let job: Job;
let crew: Awaited<ReturnType<typeof joinAs>>;
let sheet: JobSheet;
beforeAll(async () => {
  job = await acceptedJob(t, 'Sheet Studio');
  crew = await joinAs(t, job, 'crew');
  const res = await crew.agent.get(`/api/jobs/${job.job.id}/sheet`);
  expect(res.status).toBe(200);
  sheet = res.body as JobSheet;
});

/** 1 US gallon = 231 in³ = 3.785411784 L (NIST Handbook 44, Appendix C; NIST SP 811 B.8). */
const ML_PER_GALLON = 3785.411784;

describe('the job sheet', () => {
  it('lists the jobs under way for the crew, with layers done of all', async () => {
    const res = await crew.agent.get('/api/jobs/sheets');
    expect(res.status).toBe(200);
    expect((res.body as ItemList<JobSheetSummary>).items).toEqual([
      {
        id: job.job.id,
        title: 'Dining room plaster',
        siteAddress: '1 Round Row, Ochreford',
        status: 'scheduled',
        startDate: job.job.startDate,
        finishDate: job.job.finishDate,
        layersDone: 0,
        layersTotal: 6,
      },
    ]);
  });

  it('names the job, its place and dates, in the firm’s units and zone', () => {
    expect(sheet).toMatchObject({
      id: job.job.id,
      title: 'Dining room plaster',
      siteAddress: '1 Round Row, Ochreford',
      status: 'scheduled',
      startDate: '2026-12-07',
      units: 'imperial',
      lengthUnit: 'ft',
      timeZone: 'America/New_York',
      firmCountry: 'US',
      sourceLanguage: 'en',
    });
  });

  it('rooms and surfaces in the proposal’s order with their measured sizes', () => {
    const sizes = sheet.rooms.map((r) => [r.name, r.surfaces.map((s) => [s.name, s.measure, s.gross, s.deductions, s.quantity])]);
    // Hall walls: perimeter 40 ft × height 8 ft = 320 ft²; Hall ceiling 12 × 8 ft = 96 ft² (rectangle areas)
    expect(sizes[1]).toEqual([
      'Hall',
      [
        ['Hall walls', 'area', 320, 0, 320],
        ['Hall ceiling', 'area', 96, 0, 96],
      ],
    ]);
    // Dining room: round walls r = 9 ft, H = 10 ft: 2π·r·H (circumference × height, DOMAIN.md §2.2)
    const [walls] = sheet.rooms[0].surfaces;
    expect(sheet.rooms[0].name).toBe('Dining room');
    expect(walls.gross).toBeCloseTo(2 * Math.PI * 9 * 10, 6);
    expect(walls.quantity).toBeCloseTo(walls.gross - walls.deductions, 6);
    expect(walls.isCurved).toBe(true);
  });

  it('each surface’s layers with their work item and material need (quantities in mL or g)', () => {
    const hallWalls = sheet.rooms[1].surfaces[0];
    const [primer, lime] = hallWalls.layers;
    const items = new Map(sheet.workItems.map((w) => [w.id, w]));
    expect(items.get(primer.workItemId!)).toMatchObject({ surfaceName: 'Hall walls', layerName: 'Primer', doneOn: null });
    expect(items.get(lime.workItemId!)).toMatchObject({ surfaceName: 'Hall walls', layerName: 'Lime plaster' });
    // primer: 320 ft² ÷ 350 ft²/gal × 1.10 waste (fixture rates, common practice, no source), in mL
    expect(primer.products).toHaveLength(1);
    expect(primer.products[0].quantity).toBeCloseTo((320 / 350) * 1.1 * ML_PER_GALLON, 6);
    // lime: 0.15 kg/ft² × 320 ft² × 2 coats × 1.10 waste = 105.6 kg = 105 600 g (fixture rates)
    expect(lime.products[0].quantity).toBeCloseTo(0.15 * 320 * 2 * 1.1 * 1000, 6);
    expect(primer.water).toBe(0);
  });

  it('the finish’s layers in order, the products with their hazard flags', () => {
    expect(sheet.finishes).toHaveLength(1);
    expect(sheet.finishes[0].name).toBe('Polished lime plaster');
    expect(sheet.finishes[0].layers.map((l) => [l.name, l.method, l.coats, l.coverageShare, l.waitHoursAfter, l.coverage.kind])).toEqual([
      ['Primer', 'roll', 1, 1, 4, 'spreadRate'],
      ['Lime plaster', 'trowel', 2, 1, 24, 'consumption'],
    ]);
    expect(sheet.products.map((p) => [p.name, p.unit, p.hazards])).toEqual([
      ['Acrylic primer', 'gallon', {}],
      ['Lime putty plaster', 'kg', { isLime: true }],
    ]);
  });

  it('the day plan and the cautions are the engine’s for this job', async () => {
    const estimate = (await job.agent.get(`/api/estimates/${job.estimateId}`)).body as EstimateView;
    const engine = toResultJson(computeEstimate(assembleEstimateInput(estimate.context, estimate.inputs, 'A')));
    expect(sheet.dayPlan).toEqual(planDays(engine.schedule));
    expect(sheet.dayPlan.some((d) => d.waits.length > 0)).toBe(true);
    const forCrew = engine.cautions.map((c) => ({ ...c, bullets: c.bullets.filter((b) => !OFFICE_ONLY_LINES.has(b)) }));
    expect(sheet.cautions.map((c) => c.id)).toEqual(['lime-alkali']); // ICSC 0408: the lime putty plaster is flagged isLime
    expect(sheet.cautions).toEqual(
      forCrew.map((c) => ({
        id: c.id,
        title: c.title,
        bullets: c.bullets,
        rule: c.rule,
        jurisdiction: c.jurisdiction,
        standing: c.standing,
        titleKey: c.titleKey,
        ruleKey: c.ruleKey,
        lines: c.lines,
        jurisdictionKeys: c.jurisdictionKeys,
        standingKey: c.standingKey,
      })),
    );
  });

  it('shows a layer done once the crew marks it', async () => {
    const item = sheet.workItems[0];
    const marked = await crew.agent
      .post(`/api/jobs/${job.job.id}/progress`)
      .set('x-csrf-token', crew.csrf())
      .send({ kind: 'layerDone', workItemId: item.id, on: '2026-12-01', clientKey: 'sheet-spec-1' });
    expect(marked.status).toBe(201);
    const again = (await crew.agent.get(`/api/jobs/${job.job.id}/sheet`)).body as JobSheet;
    const layer = again.rooms.flatMap((r) => r.surfaces.flatMap((s) => s.layers)).find((l) => l.workItemId === item.id);
    expect(layer?.doneOn).toBe('2026-12-01');
    const list = (await crew.agent.get('/api/jobs/sheets')).body as ItemList<JobSheetSummary>;
    expect(list.items[0]).toMatchObject({ layersDone: 1, layersTotal: 6 });
  });

  it('leaves finished and cancelled jobs off the list', async () => {
    await withTenant(t.ctx.pool, job.firmId, (tx) =>
      tx.client.query(`update jobs set status = 'complete' where tenant_id = $1 and id = $2`, [tx.tenantId, job.job.id]),
    );
    expect(((await crew.agent.get('/api/jobs/sheets')).body as ItemList<JobSheetSummary>).items).toEqual([]);
    expect((await crew.agent.get(`/api/jobs/${job.job.id}/sheet`)).status).toBe(200);
    await withTenant(t.ctx.pool, job.firmId, (tx) =>
      tx.client.query(`update jobs set status = 'scheduled' where tenant_id = $1 and id = $2`, [tx.tenantId, job.job.id]),
    );
  });
});

describe('who may read a job sheet', () => {
  it('signed out 401, a client (no staff session) 401, another firm 404, a bad id 400', async () => {
    const anonymous = await newAgent(t.app);
    expect((await anonymous.agent.get('/api/jobs/sheets')).status).toBe(401);
    expect((await anonymous.agent.get(`/api/jobs/${job.job.id}/sheet`)).status).toBe(401);
    expect((await job.client.agent.get('/api/jobs/sheets')).status).toBe(401);
    expect((await job.client.agent.get(`/api/jobs/${job.job.id}/sheet`)).status).toBe(401);
    const other = await acceptedJob(t, 'Other Sheet Studio');
    expect((await other.agent.get(`/api/jobs/${job.job.id}/sheet`)).status).toBe(404);
    expect(((await other.agent.get('/api/jobs/sheets')).body as ItemList<JobSheetSummary>).items.map((j) => j.id)).toEqual([other.job.id]);
    const bad = await crew.agent.get('/api/jobs/not-a-job/sheet');
    expect(bad.status).toBe(400);
    expect(bad.body.errors[0].field).toBe('id');
  });

  it('owner and office read it too', async () => {
    expect((await job.agent.get(`/api/jobs/${job.job.id}/sheet`)).status).toBe(200);
    const office = await joinAs(t, job, 'office');
    expect((await office.agent.get('/api/jobs/sheets')).status).toBe(200);
  });
});
