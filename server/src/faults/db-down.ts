import { withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { MailCatcher } from './mail-catcher';
import type { OwnCluster } from './own-cluster';
import { sleep, until } from './processes';
import type { HttpAgent } from './signed-in';

interface Sample {
  readonly startedAt: number;
  readonly ms: number;
  /** 0: no HTTP answer (refused, reset or timed out) */
  readonly status: number;
  readonly write: boolean;
  /** the client's name a write asked for */
  readonly name?: string;
  readonly problemJson: boolean;
  readonly retryAfter?: string;
  readonly title?: string;
  readonly error?: string;
}

export interface DbDownResult {
  readonly requests: number;
  /** answers while PostgreSQL was down: 503 each */
  readonly duringOutage: Record<string, number>;
  /** statuses other than 200, 201 and 503 (or no answer at all), over the whole run */
  readonly unexpected: string[];
  /** every 503 a problem+json with Retry-After and the database title */
  readonly clear503s: boolean;
  readonly slowest503Ms: number;
  /** PostgreSQL back (pg_ctl start returned) to the first request that succeeded */
  readonly recoveredMs: number | null;
  /** writes answered 201 and clients rows written by the run: equal (nothing half-written, nothing lost) */
  readonly writesAnswered201: number;
  readonly rowsWritten: number;
  readonly writesMatchRows: boolean;
  /** an invitation made after the outage reached the mail catcher: the queue works again */
  readonly queueResumedMs: number | null;
  readonly outageMs: number;
}

/**
 * Stop PostgreSQL (its own cluster) for `outageMs` while `connections` clients keep listing and
 * creating clients through a running server; then start it again and keep going until requests succeed.
 */
export async function stopDatabaseUnderLoad(
  cluster: OwnCluster,
  app: Pool,
  owner: { agent: HttpAgent; csrf: () => string; firmId: string },
  catcher: MailCatcher,
  options: {
    connections: number;
    outageMs: number;
    /** send an e-mail just before the stop, so a worker's pool holds a connection when PostgreSQL goes */
    jobBeforeStop: boolean;
    /** called once PostgreSQL is back, before the queue is checked (e.g. to start a worker process) */
    beforeQueueCheck?: () => Promise<void>;
  },
): Promise<DbDownResult> {
  const samples: Sample[] = [];
  const tag = `Load ${Date.now().toString(36)}`;
  let running = true;
  let n = 0;
  const one = async (write: boolean) => {
    const startedAt = Date.now();
    const name = write ? `${tag} ${++n}` : undefined;
    try {
      const req = write
        ? owner.agent.post('/api/clients').set('x-csrf-token', owner.csrf()).send({ kind: 'designer', name })
        : owner.agent.get('/api/clients');
      const res = await req.timeout(10_000);
      const body = res.body as { title?: string };
      samples.push({
        startedAt,
        ms: Date.now() - startedAt,
        status: res.status,
        write,
        ...(name ? { name } : {}),
        problemJson: String(res.headers['content-type'] ?? '').startsWith('application/problem+json'),
        ...(res.headers['retry-after'] ? { retryAfter: String(res.headers['retry-after']) } : {}),
        ...(body?.title ? { title: body.title } : {}),
      });
    } catch (error) {
      samples.push({ startedAt, ms: Date.now() - startedAt, status: 0, write, problemJson: false, error: String(error) });
      await sleep(50); // no answer at all (the server is gone): do not spin
    }
  };
  const loops = Array.from({ length: options.connections }, async (_, i) => {
    for (let k = i; running; k++) await one(k % 2 === 1);
  });

  await sleep(1_000);
  if (options.jobBeforeStop) {
    const before = `fault.before.${Date.now().toString(36)}@example.test`;
    await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email: before, role: 'crew' });
    await catcher.waitFor((m) => m.to.includes(before), 15_000);
  }
  await sleep(500);
  const stopAt = Date.now();
  await cluster.stop();
  await sleep(options.outageMs - (Date.now() - stopAt));
  const startAt = Date.now();
  await cluster.start();
  const backAt = Date.now();
  const firstOk = await until(
    'a request to succeed again',
    () => Promise.resolve(samples.find((s) => s.startedAt >= backAt && s.status >= 200 && s.status < 300)),
    30_000,
  ).catch(() => undefined);
  await sleep(3_000);
  running = false;
  await Promise.all(loops);

  // Only requests made entirely inside the outage (not one that finished just before it began).
  const during = samples.filter((s) => s.startedAt >= stopAt + 500 && s.startedAt + s.ms <= startAt);
  const duringOutage: Record<string, number> = {};
  for (const s of during) duringOutage[String(s.status)] = (duringOutage[String(s.status)] ?? 0) + 1;
  const unexpected = samples.filter((s) => ![200, 201, 503].includes(s.status)).map((s) => `${s.status} ${s.error ?? s.title ?? ''}`);
  const failures = samples.filter((s) => s.status === 503);
  const created = samples.filter((s) => s.write && s.status === 201).map((s) => s.name!);
  const rows = await withTenant(app, owner.firmId, async (tx) => {
    const { rows } = await tx.client.query<{ name: string }>(`select name from clients where tenant_id = $1 and name like $2 || '%'`, [
      tx.tenantId,
      tag,
    ]);
    return rows.map((r) => r.name);
  });

  // The queue: an invitation's e-mail goes through pg-boss and a worker, both of which lost their connections.
  await options.beforeQueueCheck?.();
  const invitedAt = Date.now();
  const email = `fault.after.${Date.now().toString(36)}@example.test`;
  const invited = await owner.agent
    .post('/api/team/invitations')
    .set('x-csrf-token', owner.csrf())
    .send({ email, role: 'crew' })
    .then((res) => res.status)
    .catch(() => 0);
  const arrived = invited === 201 ? await catcher.waitFor((m) => m.to.includes(email), 60_000).catch(() => undefined) : undefined;

  return {
    requests: samples.length,
    duringOutage,
    unexpected,
    clear503s:
      failures.length > 0 && failures.every((s) => s.problemJson && s.retryAfter === '5' && s.title === 'The database is unavailable'),
    slowest503Ms: Math.max(0, ...failures.map((s) => s.ms)),
    recoveredMs: firstOk ? firstOk.startedAt + firstOk.ms - backAt : null,
    writesAnswered201: created.length,
    rowsWritten: rows.length,
    writesMatchRows: created.length === rows.length && created.every((name) => rows.includes(name)),
    queueResumedMs: arrived ? Date.now() - invitedAt : null,
    outageMs: backAt - stopAt,
  };
}
