import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { QUEUES } from '../queue/queues';
import { startTestServer, TestServer } from '../testing/harness';
import type { SqlRunner } from './health-routes';
import { metricsRegistry, startMetricsServer } from './metrics-server';
import { registerBacklogMetrics } from './queue-metrics';
import { Registry } from 'prom-client';

/**
 * The value of the sample named `name` with exactly these labels (in any order) in Prometheus's text
 * format (prometheus.io/docs/instrumenting/exposition_formats: `name{label="value",…} value`).
 */
function sample(text: string, name: string, labels: Record<string, string> = {}): number | undefined {
  const wanted = Object.entries(labels).sort().join(';');
  for (const line of text.split('\n')) {
    const m = /^([a-zA-Z_:][a-zA-Z0-9_:]*)(?:\{(.*)\})? (\S+)$/.exec(line);
    if (!m || m[1] !== name) continue;
    const found = [...(m[2] ?? '').matchAll(/(\w+)="([^"]*)"/g)].map((l) => [l[1], l[2]]);
    if (found.sort().join(';') === wanted) return Number(m[3]);
  }
  return undefined;
}

describe('metrics', () => {
  let t: TestServer;
  beforeAll(async () => {
    t = await startTestServer();
  });
  afterAll(async () => {
    await t.stop();
  });

  const scrape = () => metricsRegistry({ role: 'web', jobsDb: t.queue.boss.getDb(), cacheMs: 0 }).metrics();

  it('times requests by route pattern and status class, never by the URL with its ids', async () => {
    const id = randomUUID();
    // 401 from inside the route's handler: the error unwinds the routers before the answer is written.
    expect((await request(t.app).get(`/api/jobs/${id}`)).status).toBe(401);
    expect((await request(t.app).get('/api/no-such-route')).status).toBe(404);
    expect((await request(t.app).get('/healthz')).status).toBe(200);
    const text = await scrape();
    expect(text).toContain('# TYPE layerbook_http_request_duration_seconds histogram');
    const count = (route: string, status: string) =>
      sample(text, 'layerbook_http_request_duration_seconds_count', { method: 'GET', route, status_class: status, role: 'web' });
    expect(count('/api/jobs/:id', '4xx')).toBeGreaterThanOrEqual(1);
    expect(count('unmatched', '4xx')).toBeGreaterThanOrEqual(1);
    expect(count('/healthz', '2xx')).toBeGreaterThanOrEqual(1);
    const healthz = { method: 'GET', route: '/healthz', status_class: '2xx', role: 'web' };
    expect(sample(text, 'layerbook_http_request_duration_seconds_bucket', { ...healthz, le: '+Inf' })).toBe(count('/healthz', '2xx'));
    expect(sample(text, 'layerbook_http_request_duration_seconds_bucket', { ...healthz, le: '0.005' })).toBeDefined();
    expect(text).not.toContain(id);
    expect(text).not.toContain('route="/:id"');
  });

  it('counts waiting and failed jobs per queue', async () => {
    // Dead-letter queues have no worker: what is sent there stays until looked at.
    const queue = QUEUES.pruneDead;
    const before = await scrape();
    const jobs = (text: string, state: string) => sample(text, 'layerbook_queue_jobs', { queue, state, role: 'web' }) ?? NaN;
    await t.queue.boss.send(queue, { spec: 'waiting' });
    await t.queue.boss.send(queue, { spec: 'to fail' });
    const [job] = await t.queue.boss.fetch(queue);
    await t.queue.boss.fail(queue, job.id, { reason: 'spec' });
    const after = await scrape();
    expect(jobs(after, 'created') - jobs(before, 'created')).toBe(1);
    expect(jobs(after, 'failed') - jobs(before, 'failed')).toBe(1);
    // Every declared queue has its series, at zero when empty.
    for (const name of Object.values(QUEUES)) {
      expect(sample(after, 'layerbook_queue_jobs', { queue: name, state: 'active', role: 'web' })).toBeGreaterThanOrEqual(0);
    }
    expect(sample(after, 'layerbook_backlog_read_ok', { role: 'web' })).toBe(1);
  });

  it("reports the outbox's unsent mail and Node's own figures", async () => {
    const text = await scrape();
    expect(sample(text, 'layerbook_mail_outbox_unsent', { status: 'pending', role: 'web' })).toBeGreaterThanOrEqual(0);
    expect(sample(text, 'layerbook_mail_outbox_unsent', { status: 'failed', role: 'web' })).toBeGreaterThanOrEqual(0);
    expect(sample(text, 'layerbook_mail_outbox_oldest_pending_seconds', { role: 'web' })).toBeGreaterThanOrEqual(0);
    expect(sample(text, 'process_cpu_user_seconds_total', { role: 'web' })).toBeGreaterThanOrEqual(0);
    expect(sample(text, 'nodejs_eventloop_lag_seconds', { role: 'web' })).toBeGreaterThanOrEqual(0);
  });

  it('serves them on a loopback listener of its own: GET /metrics in the text format, nothing else', async () => {
    const registry = metricsRegistry({ role: 'worker', jobsDb: t.queue.boss.getDb() });
    const server = await startMetricsServer(registry, 0, '127.0.0.1', t.ctx.logger);
    try {
      expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/metrics$/);
      const res = await fetch(server.url);
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toBe('text/plain; version=0.0.4; charset=utf-8');
      expect(await res.text()).toContain('layerbook_queue_jobs{');
      expect((await fetch(server.url.replace('/metrics', '/'))).status).toBe(404);
      expect((await fetch(server.url, { method: 'POST' })).status).toBe(404);
    } finally {
      await server.close();
    }
  });
});

describe('backlog counts at scrape time', () => {
  const fakeDb = (answer: () => Promise<{ rows: unknown[] } | undefined>) => {
    let calls = 0;
    const db: SqlRunner = {
      executeSql: (text) => {
        calls += 1;
        return text.includes('pgboss.job')
          ? answer()
          : answer().then((r) => r && { rows: [{ pending: 2, failed: 1, oldest_pending_seconds: 90 }] });
      },
    };
    return { db, calls: () => calls };
  };

  it('runs its two queries once for every scrape within the cache time', async () => {
    const fake = fakeDb(() => Promise.resolve({ rows: [{ queue: 'mail-send', state: 'created', count: 3 }] }));
    const registry = new Registry();
    registerBacklogMetrics(registry, { db: fake.db, cacheMs: 60_000 });
    const first = await registry.metrics();
    await registry.metrics();
    await registry.metrics();
    expect(fake.calls()).toBe(2);
    expect(sample(first, 'layerbook_queue_jobs', { queue: 'mail-send', state: 'created' })).toBe(3);
    expect(sample(first, 'layerbook_queue_jobs', { queue: 'mail-send', state: 'failed' })).toBe(0);
    expect(sample(first, 'layerbook_mail_outbox_unsent', { status: 'pending' })).toBe(2);
    expect(sample(first, 'layerbook_mail_outbox_unsent', { status: 'failed' })).toBe(1);
    expect(sample(first, 'layerbook_mail_outbox_oldest_pending_seconds')).toBe(90);
  });

  it('gives up on counts that take too long, and says so', async () => {
    const fake = fakeDb(() => new Promise(() => undefined));
    const registry = new Registry();
    registerBacklogMetrics(registry, { db: fake.db, cacheMs: 0, timeoutMs: 50 });
    const text = await registry.metrics();
    expect(sample(text, 'layerbook_backlog_read_ok')).toBe(0);
    expect(text).not.toMatch(/^layerbook_queue_jobs\{/m);
  });
});
