import type { ItemList, JobProgressView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { acceptedJob } from '../../billing/progress-fixtures';
import { jpegImage } from '../../files/test-images';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';

/**
 * The crew never reads money (issue 13: "no money anywhere — the server refuses it"). Signed in as
 * crew, every route the crew may call is called and every JSON value walked: a key that names money
 * fails when its value is a number, a numeric string or an object (a figure, or figures inside).
 */
const MONEY_KEY = /price|cost|amount|total|sum|rate|margin|tax|paid|balance|invoice|money|currency|deposit|retainage/i;
const NUMERIC = /^-?\d+(\.\d+)?$/;

/** Keys that match the pattern but hold no money, each with why and the shape it must have to pass. */
const NOT_MONEY: Readonly<Record<string, { readonly why: string; readonly is: (v: unknown) => boolean }>> = {
  layersTotal: { why: 'a count of layers on the job sheet list (layers done of all)', is: Number.isInteger },
  totals: {
    why: 'a takeoff room’s or site’s measured sizes (area, running length, disturbed paint)',
    is: (v) => typeof v === 'object' && v !== null && Object.keys(v).every((k) => ['area', 'length', 'disturbedPaintedArea'].includes(k)),
  },
  totalWaitHours: { why: 'a finish system’s drying waits in hours', is: (v) => typeof v === 'number' },
  productionRate: {
    why: 'a library layer’s labour productivity: surface finished per worker-hour',
    is: (v) => typeof v === 'object' && v !== null && Object.keys(v).every((k) => ['surfacePerHour', 'lengthUnit'].includes(k)),
  },
};

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

function moneyIn(value: unknown, path = '$', found: string[] = [], exempted = new Set<string>()): string[] {
  if (Array.isArray(value)) value.forEach((v, i) => moneyIn(v, `${path}[${i}]`, found, exempted));
  else if (value !== null && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      const looksMoney = MONEY_KEY.test(key);
      const holdsFigure =
        typeof v === 'number' || (typeof v === 'string' && NUMERIC.test(v.trim())) || (v !== null && typeof v === 'object');
      if (looksMoney && holdsFigure) {
        if (Object.prototype.hasOwnProperty.call(NOT_MONEY, key) && NOT_MONEY[key].is(v)) exempted.add(key);
        else found.push(`${path}.${key} = ${JSON.stringify(v).slice(0, 80)}`);
      }
      moneyIn(v, `${path}.${key}`, found, exempted);
    }
  }
  return found;
}

describe('the money walk: nothing a crew member reads carries money', () => {
  it('every answer of every route the crew may call', async () => {
    const job = await acceptedJob(t, 'Money Walk Studio');
    const crew = await joinAs(t, job, 'crew');
    const jobId = job.job.id;
    const { siteId, roomId } = await withTenant(t.ctx.pool, job.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ site_id: string; room_id: string }>(
        `select j.site_id, r.id as room_id from jobs j join rooms r on r.tenant_id = j.tenant_id and r.site_id = j.site_id
          where j.tenant_id = $1 and j.id = $2 order by r.position limit 1`,
        [tx.tenantId, jobId],
      );
      return { siteId: rows[0].site_id, roomId: rows[0].room_id };
    });
    const get = async (path: string): Promise<unknown> => {
      const res = await crew.agent.get(path);
      expect([path, res.status]).toEqual([path, 200]);
      return res.body;
    };
    // a sample board with the priced finish on it, so the board's view is walked too
    const board = await job.agent
      .post('/api/samples')
      .set('x-csrf-token', job.csrf())
      .send({ clientId: job.clientId, siteId, estimateId: job.estimateId, label: 'Board 1', finishSystemId: job.systemId });
    expect(board.status).toBe(201);
    const answers = new Map<string, unknown>();
    const read = async (path: string) => answers.set(`GET ${path}`, await get(path));

    for (const path of [
      '/api/auth/session',
      '/api/firm',
      '/api/team/members',
      '/api/team/invitations',
      '/api/jobs/sheets',
      `/api/jobs/${jobId}/sheet`,
      `/api/jobs/${jobId}/progress`,
      `/api/jobs/${jobId}/photos`,
      `/api/takeoff/sites/${siteId}`,
      `/api/takeoff/rooms/${roomId}/photos`,
      '/api/samples',
    ]) {
      await read(path);
    }
    const products = (await get('/api/library/products')) as ItemList<{ id: string }>;
    answers.set('GET /api/library/products', products);
    for (const p of products.items) await read(`/api/library/products/${p.id}`);
    const systems = (await get('/api/library/systems')) as ItemList<{ id: string }>;
    answers.set('GET /api/library/systems', systems);
    for (const s of systems.items) await read(`/api/library/systems/${s.id}`);
    for (const b of ((answers.get('GET /api/samples') as ItemList<{ id: string }>) ?? { items: [] }).items)
      await read(`/api/samples/${b.id}`);
    expect(products.items.length).toBeGreaterThan(0);
    expect(systems.items.length).toBeGreaterThan(0);
    expect(answers.has(`GET /api/samples/${(board.body as { id: string }).id}`)).toBe(true);

    const items = (answers.get(`GET /api/jobs/${jobId}/progress`) as JobProgressView).workItems;
    const marked = await crew.agent
      .post(`/api/jobs/${jobId}/progress`)
      .set('x-csrf-token', crew.csrf())
      .send({ kind: 'layerDone', workItemId: items[0].id, on: '2026-12-01', clientKey: 'walk-1' });
    expect(marked.status).toBe(201);
    answers.set('POST progress', marked.body);
    const photo = await crew.agent
      .post(`/api/jobs/${jobId}/photos`)
      .set('x-csrf-token', crew.csrf())
      .field('caption', 'Primer on')
      .field('workItemId', items[0].id)
      .attach('file', await jpegImage(), 'primer.jpg');
    expect(photo.status).toBe(201);
    answers.set('POST photos', photo.body);
    // the sheet again, now with a mark and a photo in it
    await read(`/api/jobs/${jobId}/sheet`);

    const exempted = new Set<string>();
    const found = [...answers].flatMap(([route, body]) => moneyIn(body, route, [], exempted));
    expect(found).toEqual([]);
    // what was let through, by name (each has its reason in NOT_MONEY)
    expect([...exempted].sort()).toEqual(['layersTotal', 'productionRate', 'totalWaitHours', 'totals']);
  });

  it('the money routes answer the crew 403', async () => {
    const job = await acceptedJob(t, 'Money Door Studio');
    const crew = await joinAs(t, job, 'crew');
    const jobId = job.job.id;
    const lines = ((await job.agent.get(`/api/jobs/${jobId}/progress`)).body as JobProgressView).valueLines;
    for (const path of [
      '/api/jobs',
      `/api/jobs/${jobId}`,
      `/api/jobs/${jobId}/billing`,
      `/api/jobs/${jobId}/history`,
      `/api/jobs/${jobId}/change-orders`,
      '/api/invoices',
      '/api/billing/today',
      '/api/cash/receivables',
      '/api/cash/jobs',
      `/api/estimates/${job.estimateId}`,
      '/api/firm/estimating',
      '/api/firm/billing',
    ]) {
      expect([path, (await crew.agent.get(path)).status]).toEqual([path, 403]);
    }
    const stored = await crew.agent
      .post(`/api/jobs/${jobId}/progress`)
      .set('x-csrf-token', crew.csrf())
      .send({ kind: 'storedMaterials', valueLineId: lines[0].id, amount: '250.00', on: '2026-12-01' });
    expect(stored.status).toBe(403);
  });
});
