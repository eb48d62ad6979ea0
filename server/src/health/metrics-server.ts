import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Logger } from 'pino';
import { collectDefaultMetrics, Registry } from 'prom-client';
import { registerBacklogMetrics } from './queue-metrics';
import type { SqlRunner } from './health-routes';
import { requestDuration } from './request-metrics';

export interface MetricsOptions {
  /** `web` or `worker`: a label on every series, so one dashboard tells the processes apart. */
  readonly role: string;
  /** The jobs role's connection (pg-boss's pool) for the queue and outbox counts. */
  readonly jobsDb: SqlRunner;
  readonly cacheMs?: number;
  readonly timeoutMs?: number;
}

/**
 * This process's metrics: Node's own (CPU, memory, event loop lag, GC, handles), request latency by
 * route (web processes observe into it; a worker's stays empty), queue depth and failures, and the
 * mail outbox's backlog. A registry of its own, not prom-client's global one.
 */
export function metricsRegistry({ role, jobsDb, cacheMs, timeoutMs }: MetricsOptions): Registry {
  const registry = new Registry();
  registry.setDefaultLabels({ role });
  collectDefaultMetrics({ register: registry });
  registry.registerMetric(requestDuration);
  registerBacklogMetrics(registry, {
    db: jobsDb,
    ...(cacheMs === undefined ? {} : { cacheMs }),
    ...(timeoutMs === undefined ? {} : { timeoutMs }),
  });
  return registry;
}

export interface MetricsServer {
  readonly url: string;
  close(): Promise<void>;
}

/**
 * The metrics on a listener of their own (`METRICS_PORT` on `METRICS_HOST`, loopback by default),
 * never on the public port: the figures name queues and routes, and a scrape costs two counting
 * queries. `GET /metrics` answers Prometheus's text format; anything else 404.
 */
export async function startMetricsServer(registry: Registry, port: number, host: string, logger: Logger): Promise<MetricsServer> {
  const server: Server = createServer((req, res) => {
    const path = (req.url ?? '').split('?', 1)[0];
    if (req.method !== 'GET' || path !== '/metrics') {
      res.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' }).end('Not found\n');
      return;
    }
    registry.metrics().then(
      (text) => res.writeHead(200, { 'content-type': registry.contentType, 'cache-control': 'no-store' }).end(text),
      (err: unknown) => {
        logger.error({ err }, 'metrics could not be collected');
        res.writeHead(500, { 'content-type': 'text/plain; charset=utf-8' }).end('Metrics could not be collected\n');
      },
    );
  });
  await new Promise<void>((resolve, reject) => server.listen(port, host, () => resolve()).once('error', reject));
  const address = server.address() as AddressInfo;
  const url = `http://${address.family === 'IPv6' ? `[${address.address}]` : address.address}:${address.port}/metrics`;
  logger.info({ url }, 'metrics listening');
  return {
    url,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
