import path from 'node:path';
import { migrateDatabase } from '@layerbook/db';
import { Pool } from 'pg';
import { createApp } from './app';
import { loadConfig } from './config';
import { openReadPool, type AppContext } from './context';
import { assertRlsBoundRole } from './db-roles';
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
  await assertRlsBoundRole(pool);
  // Reports that only read go to the read replica when there is one (DATABASE_READ_URL), under the same checked role.
  const readPool = mode === 'web' ? openReadPool(config, `layerbook-${mode}`) : undefined;
  readPool?.on('error', (err) => logger.warn({ dbError: err.message }, 'idle read-replica connection lost'));
  if (readPool) await assertRlsBoundRole(readPool);
  const queue = await startQueue(config, logger);
  const storage = await openObjectStore(config);
  const ctx: AppContext = { config, pool, readPool, queue, logger, storage, now: () => new Date() };
  const workers = mode === 'worker' || config.RUN_WORKERS ? await startWorkers(config, queue, logger, ctx.now) : undefined;
  // Prometheus metrics on a loopback listener of their own (ops/README.md, "Health and metrics"); off when METRICS_PORT is unset.
  const metrics = config.METRICS_PORT
    ? await startMetricsServer(metricsRegistry({ role: mode, jobsDb: queue.boss.getDb() }), config.METRICS_PORT, config.METRICS_HOST, logger)
    : undefined;

  let server: import('node:http').Server | undefined;
  if (mode === 'web') {
    const app = createApp(ctx, await loadSsrHandlers(config.ROOT_DIR));
    server = app.listen(config.PORT, config.HOST, () => logger.info({ url: config.PUBLIC_URL }, 'Layerbook is listening'));
  } else {
    logger.info('Layerbook worker started');
  }

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    const force = setTimeout(() => process.exit(1), 15_000).unref();
    await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
    server?.closeAllConnections?.();
    await queue.stop();
    await workers?.stop();
    await metrics?.close();
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
