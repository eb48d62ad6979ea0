/**
 * The web process of the load run, started by load-run.ts as a process of its own (so the load
 * generator never shares its event loop): the whole API on HOST:PORT from the environment's
 * configuration, no job workers (mail stays queued), no file storage. SIGTERM closes it.
 */
import pino from 'pino';
import { createApp } from '../../../server/src/app';
import { loadConfig } from '../../../server/src/config';
import type { ObjectStore } from '../../../server/src/files/object-store';
import { benchServices } from '../bench-server';

const noFiles: ObjectStore = {
  put: () => Promise.reject(new Error('The load run stores no files.')),
  get: () => Promise.resolve(null),
  delete: () => Promise.resolve(),
  close: () => undefined,
};

async function main(): Promise<void> {
  const config = loadConfig(process.env);
  const services = await benchServices(config, config.DB_POOL_MAX);
  const logger = pino({ level: config.LOG_LEVEL });
  // Plain-HTTP cookies on loopback: the app runs with NODE_ENV development, as the API benchmarks do.
  const app = createApp({ config: { ...config, NODE_ENV: 'development' }, ...services, logger, storage: noFiles, now: () => new Date() });
  const server = app.listen(config.PORT, config.HOST);
  await new Promise((resolve, reject) => server.once('listening', resolve).once('error', reject));
  process.once('SIGTERM', () => {
    server.close(() => {
      void services.queue
        .stop()
        .then(() => services.pool.end())
        .then(() => process.exit(0));
    });
    server.closeAllConnections();
  });
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
