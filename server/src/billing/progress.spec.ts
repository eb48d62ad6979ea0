import type { JobHistory, JobProgressView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { allocateByWeights } from '@layerbook/domain';
import { joinAs } from '../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';
import { acceptedJob } from './progress-fixtures';
import { defaultValueLines, ensureJobWork, workItemsOf } from './work-items';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;

const rows = (job: Job, sql: string, params: unknown[] = []) =>
  withTenant(t.ctx.pool, job.firmId, async (tx) => (await tx.client.query(sql, [tx.tenantId, job.job.id, ...params])).rows);

/** Every key anywhere in a JSON answer. */
function keysOf(value: unknown, into = new Set<string>()): Set<string> {
  if (Array.isArray(value)) value.forEach((v) => keysOf(v, into));
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) {
      into.add(k);
      keysOf(v, into);
    }
  return into;
}
const MONEY_KEYS = [
  'amount',
  'contractSum',
  'scheduledValue',
  'storedMaterials',
  'billedWork',
  'price',
  'tax',
  'total',
  'subtotal',
  'value',
];

describe('the work of an accepted job', () => {
  it('is made at acceptance: each layer on each surface in crew order, and value lines per room adding up to the contract sum', async () => {
    const job = await acceptedJob(t, 'Work Items Studio');
    const res = await job.agent.get(`/api/jobs/${job.job.id}/progress`);
    expect(res.status).toBe(200);
    const view = res.body as JobProgressView;
    // Rooms in the site's order (Dining room, then Hall), surfaces in the proposal's order, layers first on to last.
    expect(view.workItems.map((w) => [w.position, w.roomName, w.surfaceName, w.layerName, w.layerOrder, w.doneOn])).toEqual([
      [1, 'Dining room', 'Walls', 'Primer', 1, null],
      [2, 'Dining room', 'Walls', 'Lime plaster', 2, null],
      [3, 'Hall', 'Hall walls', 'Primer', 1, null],
      [4, 'Hall', 'Hall walls', 'Lime plaster', 2, null],
      [5, 'Hall', 'Hall ceiling', 'Primer', 1, null],
      [6, 'Hall', 'Hall ceiling', 'Lime plaster', 2, null],
    ]);
    expect(view.walkthroughOn).toBeNull();
    expect(view.valueLines.map((l) => [l.position, l.label, l.percentComplete])).toEqual([
      [1, 'Dining room', '0'],
      [2, 'Hall', '0'],
    ]);

    // Scheduled values: the contract sum split by each room's labour hours in the estimate (common practice, no source).
    const [estimate] = await rows(
      job,
      `select e.result from estimates e join jobs j on j.estimate_id = e.id where e.tenant_id = $1 and j.id = $2`,
    );
    type Stored = {
      variants: Array<{ id: string; result: { surfaces: Array<{ surfaceId: string; layers: Array<{ labour: { hours: number } }> }> } }>;
    };
    const surfaces = (estimate.result as Stored).variants.find((v) => v.id === 'A')!.result.surfaces;
    const hours = (ids: string[]) =>
      surfaces.filter((s) => ids.includes(s.surfaceId)).reduce((a, s) => a + s.layers.reduce((b, l) => b + l.labour.hours, 0), 0);
    const lines = await rows(
      job,
      `select label, scheduled_value::text as v from job_value_lines where tenant_id = $1 and job_id = $2 order by position`,
    );
    const expected = allocateByWeights(job.option.total, [hours([job.surfaceId]), hours([job.wallsId, job.ceilingId])], 2).map((d) =>
      d.toFixed(2),
    );
    expect(lines.map((l) => l.v)).toEqual(expected);
    expect(lines.reduce((a, l) => a + Math.round(Number(l.v) * 100), 0)).toBe(Math.round(Number(job.option.total) * 100));
  });

  it('is made for a job from before it existed, once, however many ask at the same time', async () => {
    const job = await acceptedJob(t, 'Old Job Studio');
    await rows(job, `delete from job_work_items where tenant_id = $1 and job_id = $2`);
    await rows(job, `delete from job_value_lines where tenant_id = $1 and job_id = $2`);
    await Promise.all([1, 2, 3, 4, 5].map(() => withTenant(t.ctx.pool, job.firmId, (tx) => ensureJobWork(tx, job.job.id))));
    const res = await job.agent.get(`/api/jobs/${job.job.id}/progress`);
    expect((res.body as JobProgressView).workItems).toHaveLength(6);
    expect(await rows(job, `select count(*)::int as n from job_value_lines where tenant_id = $1 and job_id = $2`)).toEqual([{ n: 2 }]);
  });

  it('orders and splits by the pure rules (no hours: one line for all the work)', () => {
    const surfaces = [
      { roomId: 'r2', surfaceId: 's3', name: 'Ceiling', layers: [{ layerId: 'a', name: 'Skim', labour: { hours: 3 } }] },
      { roomId: 'r1', surfaceId: 's1', name: 'Walls', layers: [{ layerId: 'a', name: 'Skim', labour: { hours: 1 } }] },
    ];
    const scope = [
      { id: 'r1', name: 'Study', surfaces: [] },
      { id: 'r2', name: 'Attic', surfaces: [] },
    ];
    const items = workItemsOf(surfaces, scope, new Map());
    expect(items.map((i) => `${i.roomName}/${i.surfaceName}`)).toEqual(['Study/Walls', 'Attic/Ceiling']);
    // 100.00 by 1 : 3 hours
    expect(defaultValueLines(items, '100.00', 'USD')).toEqual([
      { label: 'Study', amount: '25.00' },
      { label: 'Attic', amount: '75.00' },
    ]);
    expect(defaultValueLines([], '100.00', 'JPY')).toEqual([{ label: 'All the work', amount: '100' }]);
  });
});

describe('progress marks', () => {
  let job: Job;
  let crew: Awaited<ReturnType<typeof joinAs>>;
  let items: JobProgressView['workItems'];
  beforeAll(async () => {
    job = await acceptedJob(t, 'Marking Studio');
    crew = await joinAs(t, job, 'crew');
    items = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).workItems;
  });
  const mark = (who: { agent: Job['agent']; csrf: () => string }, body: object) =>
    who.agent.post(`/api/jobs/${job.job.id}/progress`).set('x-csrf-token', who.csrf()).send(body);

  it('crew mark a layer done and read the work without any money; a mark sent twice with one key counts once', async () => {
    const body = { kind: 'layerDone', workItemId: items[0].id, on: '2026-12-01', clientKey: 'phone-1:mark-1', note: 'Dry by noon' };
    const first = await mark(crew, body);
    expect(first.status).toBe(201);
    const again = await mark(crew, body);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    const view = first.body as JobProgressView;
    expect(view.workItems[0].doneOn).toBe('2026-12-01');
    const read = await crew.agent.get(`/api/jobs/${job.job.id}/progress`);
    expect(read.status).toBe(200);
    for (const answer of [first.body, read.body]) {
      const keys = keysOf(answer);
      expect(MONEY_KEYS.filter((k) => keys.has(k))).toEqual([]);
    }
    const history = await rows(job, `select kind, actor_user_id, note from job_progress where tenant_id = $1 and job_id = $2`);
    expect(history).toHaveLength(1);
    // the first layer done puts a scheduled job under way
    expect(await rows(job, `select status from jobs where tenant_id = $1 and id = $2`)).toEqual([{ status: 'in_progress' }]);
    const [doneBy] = await rows(job, `select done_by from job_work_items where tenant_id = $1 and job_id = $2 and id = $3`, [items[0].id]);
    expect(doneBy.done_by).toBe(history[0].actor_user_id);
    // Each mark asks the queue to check the job's billing triggers, in the same transaction.
    const checks = await t.ctx.pool.query(
      `select count(*)::int as n from pgboss.job where name = 'billing-evaluate' and data->>'jobId' = $1`,
      [job.job.id],
    );
    expect(checks.rows[0].n).toBeGreaterThanOrEqual(1);
  });

  it('reopens a layer, sets a percent, stored materials (office only) and the walkthrough; the office reads it all in the history', async () => {
    const lines = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).valueLines;
    expect((await mark(job, { kind: 'layerDone', workItemId: items[1].id, on: '2026-11-30' })).status).toBe(201);
    const reopened = await mark(job, { kind: 'layerReopened', workItemId: items[1].id, on: '2026-12-01' });
    expect(reopened.status).toBe(201);
    expect((reopened.body as JobProgressView).workItems[1].doneOn).toBeNull();
    const percent = await mark(crew, { kind: 'valuePercent', valueLineId: lines[0].id, percentComplete: 37.5, on: '2026-12-01' });
    expect(percent.status).toBe(201);
    expect((percent.body as JobProgressView).valueLines[0].percentComplete).toBe('37.5');
    expect((await mark(crew, { kind: 'storedMaterials', valueLineId: lines[0].id, amount: '250.00', on: '2026-12-01' })).status).toBe(403);
    expect((await mark(job, { kind: 'storedMaterials', valueLineId: lines[0].id, amount: '250.00', on: '2026-12-01' })).status).toBe(201);
    const [stored] = await rows(
      job,
      `select stored_materials::text as s from job_value_lines where tenant_id = $1 and job_id = $2 and id = $3`,
      [lines[0].id],
    );
    expect(stored.s).toBe('250.00');
    const walk = await mark(job, { kind: 'walkthrough', on: '2026-12-02' });
    expect(walk.status).toBe(201);
    expect((walk.body as JobProgressView).walkthroughOn).toBe('2026-12-02');

    expect((await crew.agent.get(`/api/jobs/${job.job.id}/history`)).status).toBe(403);
    const res = await job.agent.get(`/api/jobs/${job.job.id}/history`);
    expect(res.status).toBe(200);
    const history = res.body as JobHistory;
    const texts = history.items.map((e) => e.text);
    expect(texts[0]).toBe('Final walkthrough held');
    expect(texts).toEqual(
      expect.arrayContaining([
        'Primer done on Dining room · Walls — Dry by noon',
        'Lime plaster done on Dining room · Walls',
        'Lime plaster reopened on Dining room · Walls',
        'Dining room at 37.5 % complete',
        'Materials stored on site for Dining room: 250.00',
        'Job made: the client accepted the proposal',
      ]),
    );
    expect(history.items.find((e) => e.text.startsWith('Primer done'))).toMatchObject({ who: 'A crew', on: '2026-12-01' });
    expect(history.items.find((e) => e.kind === 'job.created')?.who).toBe('Edwina Marl');
    const times = history.items.map((e) => e.at);
    expect([...times].sort().reverse()).toEqual(times);
  });

  it('refuses bad marks with a 400 naming the field and writes nothing', async () => {
    const before = await rows(job, `select count(*)::int as n from job_progress where tenant_id = $1 and job_id = $2`);
    const line = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).valueLines[1];
    const cases: Array<[object, string]> = [
      // firm-local today is 2026-12-01 (New York at 15:00 UTC): tomorrow is the latest day
      [{ kind: 'layerDone', workItemId: items[2].id, on: '2026-12-03' }, 'on'],
      [{ kind: 'layerDone', workItemId: items[2].id, on: '2025-11-30' }, 'on'],
      [{ kind: 'layerDone', workItemId: items[2].id, on: '2026-02-30' }, 'on'],
      [{ kind: 'layerDone', workItemId: '00000000-0000-4000-8000-000000000000', on: '2026-12-01' }, 'workItemId'],
      [{ kind: 'layerDone', workItemId: 'nope', on: '2026-12-01' }, 'workItemId'],
      [{ kind: 'valuePercent', valueLineId: line.id, percentComplete: 120, on: '2026-12-01' }, 'percentComplete'],
      [{ kind: 'valuePercent', valueLineId: line.id, percentComplete: '50', on: '2026-12-01' }, 'percentComplete'],
      [{ kind: 'valuePercent', valueLineId: items[2].id, percentComplete: 50, on: '2026-12-01' }, 'valueLineId'],
      [{ kind: 'storedMaterials', valueLineId: line.id, amount: '-5', on: '2026-12-01' }, 'amount'],
      [{ kind: 'walkthrough', on: '2026-12-01', clientKey: 'x'.repeat(101) }, 'clientKey'],
      [{ kind: 'walkthrough', on: '2026-12-01', extra: 1 }, 'extra'],
      [{ kind: 'finished', on: '2026-12-01' }, 'kind'],
    ];
    for (const [body, field] of cases) {
      const res = await mark(job, body);
      expect([JSON.stringify(body), res.status]).toEqual([JSON.stringify(body), 400]);
      expect(res.headers['content-type']).toContain('application/problem+json');
      expect((res.body as { errors: Array<{ field: string }> }).errors.map((e) => e.field)).toContain(field);
    }
    // Stored materials in the job's currency's own units: no cents on a yen job.
    const currency = async (c: string) => rows(job, `update jobs set currency = $3 where tenant_id = $1 and id = $2`, [c]);
    await currency('JPY');
    try {
      const cents = await mark(job, { kind: 'storedMaterials', valueLineId: line.id, amount: '250.55', on: '2026-12-01' });
      expect(cents.status).toBe(400);
      expect((cents.body as { errors: Array<{ field: string }> }).errors.map((e) => e.field)).toEqual(['amount']);
    } finally {
      await currency('USD');
    }
    expect(await rows(job, `select count(*)::int as n from job_progress where tenant_id = $1 and job_id = $2`)).toEqual(before);
  });

  it('never lets the percent fall below what issued progress invoices billed', async () => {
    const line = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).valueLines[1];
    const [value] = await rows(
      job,
      `select scheduled_value::text as v from job_value_lines where tenant_id = $1 and job_id = $2 and id = $3`,
      [line.id],
    );
    const half = (Math.round(Number(value.v) * 50) / 100).toFixed(2);
    await rows(
      job,
      `insert into invoices (tenant_id, job_id, client_id, kind, status, number, number_text, currency, subtotal, total, origin, progress, issued_on, due_on)
       select $1, $2, client_id, 'progress', 'issued', 9001, 'INV-9001', currency, $3, $3, 'office', $4, '2026-12-01', '2026-12-15' from jobs where tenant_id = $1 and id = $2`,
      [half, JSON.stringify({ lines: [{ valueLineId: line.id, thisPeriodWork: half }] })],
    );
    const low = await mark(job, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 40, on: '2026-12-01' });
    expect(low.status).toBe(400);
    expect(low.body.errors[0].field).toBe('percentComplete');
    // The crew may mark a percent, but a refusal tells them no amounts (what is billed is money).
    const crewLow = await mark(crew, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 40, on: '2026-12-01' });
    expect([crewLow.status, crewLow.body.errors?.[0]?.field]).toEqual([400, 'percentComplete']);
    expect(JSON.stringify(crewLow.body)).not.toMatch(/\d\.\d\d/);
    expect((await mark(job, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 50, on: '2026-12-01' })).status).toBe(201);
  });

  it('keeps work done plus materials stored within the line’s value; a mark sent again still answers 201 when it would now be refused', async () => {
    const line = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).valueLines[0];
    const [value] = await rows(
      job,
      `select scheduled_value::text as v from job_value_lines where tenant_id = $1 and job_id = $2 and id = $3`,
      [line.id],
    );
    const scheduled = Number(value.v);
    const stored = (amount: string, clientKey?: string) =>
      mark(job, { kind: 'storedMaterials', valueLineId: line.id, amount, on: '2026-12-01', ...(clientKey ? { clientKey } : {}) });
    // 37.5 % done (the test above): at most 62.5 % of the value can be stored.
    const room = (Math.round(scheduled * 62.5) / 100).toFixed(2);
    const over = await stored((Number(room) + 0.01).toFixed(2));
    expect([over.status, over.body.errors?.[0]?.field]).toEqual([400, 'amount']);
    expect((await stored('999999999999.99')).status).toBe(400);
    expect((await stored(room, 'office:stored-1')).status).toBe(201);
    const more = await mark(job, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 40, on: '2026-12-01' });
    expect([more.status, more.body.errors?.[0]?.field]).toEqual([400, 'percentComplete']);
    const crewMore = await mark(crew, { kind: 'valuePercent', valueLineId: line.id, percentComplete: 40, on: '2026-12-01' });
    expect([crewMore.status, crewMore.body.errors?.[0]?.field]).toEqual([400, 'percentComplete']);
    expect(JSON.stringify(crewMore.body)).not.toMatch(/\d\.\d\d/);
    expect((await stored('0.00')).status).toBe(201);
    // The first stored mark again, from a phone that was offline: counted once already, so 201 and nothing changes.
    const again = await stored(room, 'office:stored-1');
    expect(again.status).toBe(201);
    const [now] = await rows(
      job,
      `select stored_materials::text as s from job_value_lines where tenant_id = $1 and job_id = $2 and id = $3`,
      [line.id],
    );
    expect(now.s).toBe('0.00');
    const other = await acceptedJob(t, 'Key Reuse Studio');
    const reused = await other.agent
      .post(`/api/jobs/${other.job.id}/progress`)
      .set('x-csrf-token', other.csrf())
      .send({ kind: 'walkthrough', on: '2026-12-01', clientKey: 'office:stored-1' });
    // Keys are per firm: another firm's same key is its own.
    expect(reused.status).toBe(201);
  });

  it('another firm gets 404 on the job; a client 401', async () => {
    const other = await acceptedJob(t, 'Other Marking Studio');
    expect((await other.agent.get(`/api/jobs/${job.job.id}/progress`)).status).toBe(404);
    expect((await other.agent.get(`/api/jobs/${job.job.id}/history`)).status).toBe(404);
    const res = await other.agent
      .post(`/api/jobs/${job.job.id}/progress`)
      .set('x-csrf-token', other.csrf())
      .send({ kind: 'walkthrough', on: '2026-12-01' });
    expect(res.status).toBe(404);
    expect((await job.client.agent.get(`/api/jobs/${job.job.id}/progress`)).status).toBe(401);
  });
});
