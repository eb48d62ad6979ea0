import { existsSync } from 'node:fs';
import path from 'node:path';
import { migrateDatabase } from '@layerbook/db';
import { Pool } from 'pg';
import { createApp } from './app';
import { loadConfig } from './config';
import { openReadPool, type AppContext } from './context';
import { assertRlsBoundRole } from './db-roles';
import { survivesDroppedConnections } from './db-connections';
import { createLogger } from './http/logger';
import { openObjectStore } from './files/object-store';
import { metricsRegistry, startMetricsServer } from './health/metrics-server';
import { startQueue } from './queue/job-queue';
import { startWorkers } from './queue/workers';
import { loadSsrHandlers } from './ssr/load';

/**
 * `web` (default): HTTP plus the job workers in one process. `worker`: the job workers alone.
 * Either can be scaled out; sessions and jobs live in PostgreSQL.
 */
async function main(mode: 'web' | 'worker'): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config);
  if (config.RUN_MIGRATIONS) await migrateDatabase(config.DATABASE_OWNER_URL, path.join(config.ROOT_DIR, 'migrations'));
  const pool = new Pool({ connectionString: config.DATABASE_URL, max: config.DB_POOL_MAX, application_name: `layerbook-${mode}` });
  survivesDroppedConnections(pool, logger);
  await assertRlsBoundRole(pool);
  // Reports that only read go to the read replica when there is one (DATABASE_READ_URL), under the same checked role.
  const readPool = mode === 'web' ? openReadPool(config, `layerbook-${mode}`) : undefined;
  if (readPool) survivesDroppedConnections(readPool, logger);
  if (readPool) await assertRlsBoundRole(readPool);
  const queue = await startQueue(config, logger);
  const storage = await openObjectStore(config);
  const ctx: AppContext = { config, pool, readPool, queue, logger, storage, now: () => new Date() };
  const workers = mode === 'worker' || config.RUN_WORKERS ? await startWorkers(config, queue, logger, ctx.now) : undefined;
  // Prometheus metrics on a loopback listener of their own (ops/README.md, "Health and metrics"); off when METRICS_PORT is unset.
  const metrics = config.METRICS_PORT
    ? await startMetricsServer(
        metricsRegistry({ role: mode, jobsDb: queue.boss.getDb() }),
        config.METRICS_PORT,
        config.METRICS_HOST,
        logger,
      )
    : undefined;

  let server: import('node:http').Server | undefined;
  if (mode === 'web') {
    // Tests may start the server before the apps are built (npm test runs jest first): the API alone then.
    const appsBuilt = existsSync(path.join(config.ROOT_DIR, 'dist', 'admin', 'server', 'server.mjs'));
    const app = createApp(ctx, config.NODE_ENV === 'test' && !appsBuilt ? undefined : await loadSsrHandlers(config.ROOT_DIR));
    server = app.listen(config.PORT, config.HOST, () => logger.info({ url: config.PUBLIC_URL }, 'Layerbook is listening'));
  } else {
    logger.info('Layerbook worker started');
  }

  /**
   * SIGTERM (or SIGINT): stop accepting connections, let the requests under way finish (idle
   * keep-alive connections are closed as they fall idle), then let the running jobs finish and
   * record their outcome (queue.stop), then close the pools and exit 0. Past 25 s it exits 1 anyway.
   */
  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    // Stop accepting first: a connection made once this is logged is refused.
    const http = server;
    const closed = http ? new Promise<void>((resolve) => http.close(() => resolve())) : undefined;
    logger.info({ signal }, 'shutting down');
    const force = setTimeout(() => {
      logger.error('shutdown took too long; exiting');
      process.exit(1);
    }, 25_000).unref();
    if (http) {
      // A keep-alive connection whose request has finished would otherwise hold close() for its idle timeout.
      const idle = setInterval(() => http.closeIdleConnections(), 100);
      await closed;
      clearInterval(idle);
      logger.info('requests under way finished');
    }
    await queue.stop();
    await workers?.stop();
    await metrics?.close();
    logger.info('jobs under way finished');
    await pool.end();
    await readPool?.end();
    storage.close();
    clearTimeout(force);
    process.exit(0);
  };
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
  process.on('SIGINT', () => void shutdown('SIGINT'));
}

main(process.argv[2] === 'worker' ? 'worker' : 'web').catch((error) => {
  console.error(error);
  process.exit(1);
});
