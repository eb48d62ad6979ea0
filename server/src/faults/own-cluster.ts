import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { migrateDatabase } from '@layerbook/db';
import { ROOT } from './processes';

const run = promisify(execFile);

/**
 * A PostgreSQL 15 cluster of its own (Debian's binaries, found as ops/env.sh finds them), initialised
 * by ops/pg-start.sh into a throwaway folder on a port of its own, so it can be stopped and started
 * under load without touching the shared one. Roles and passwords are the local defaults (ops/env.sh).
 */
export interface OwnCluster {
  readonly port: number;
  readonly dir: string;
  /** the three roles' URLs for `db` on this cluster */
  urls(db: string): { DATABASE_URL: string; DATABASE_OWNER_URL: string; DATABASE_JOBS_URL: string };
  /** `pg_ctl stop -m fast`: sessions are ended (57P01), new connections refused */
  stop(): Promise<void>;
  start(): Promise<void>;
  /** stops it if running and removes its folder */
  destroy(): Promise<void>;
}

export async function startOwnCluster(port: number, db: string): Promise<OwnCluster> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'layerbook-faults-pg-'));
  const env = { ...process.env, LB_DATA: dir, PGDATA_DIR: path.join(dir, 'pg'), LB_PG_PORT: String(port) };
  const ops = (script: string, ...args: string[]) => run('bash', [path.join(ROOT, 'ops', script), ...args], { env, cwd: ROOT });
  // pg_ctl as ops/env.sh runs it (as the postgres user when we are root).
  const pgCtl = (...args: string[]) =>
    run('bash', ['-c', `source ops/env.sh && as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" "$@"`, 'pg_ctl', ...args], { env, cwd: ROOT });
  await ops('pg-start.sh');
  await ops('pg-createdb.sh', db);
  const pw = (name: string, fallback: string) => process.env[name] ?? fallback;
  const urls = (name: string) => ({
    DATABASE_URL: `postgres://layerbook_app:${pw('LB_APP_PASSWORD', 'layerbook-app-local')}@127.0.0.1:${port}/${name}`,
    DATABASE_OWNER_URL: `postgres://layerbook_owner:${pw('LB_OWNER_PASSWORD', 'layerbook-owner-local')}@127.0.0.1:${port}/${name}`,
    DATABASE_JOBS_URL: `postgres://layerbook_jobs:${pw('LB_JOBS_PASSWORD', 'layerbook-jobs-local')}@127.0.0.1:${port}/${name}`,
  });
  await migrateDatabase(urls(db).DATABASE_OWNER_URL, path.join(ROOT, 'migrations'));
  let running = true;
  return {
    port,
    dir,
    urls,
    async stop() {
      await pgCtl('-m', 'fast', '-w', 'stop');
      running = false;
    },
    async start() {
      await pgCtl('-l', path.join(dir, 'pg', 'server.log'), '-w', '-t', '30', 'start');
      running = true;
    },
    async destroy() {
      if (running) await pgCtl('-m', 'immediate', '-w', 'stop').catch(() => undefined);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
