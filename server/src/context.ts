import { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from './config';
import type { ObjectStore } from './files/object-store';
import type { JobQueue } from './queue/job-queue';

/** What services need from the outside world; routes pass it in, jobs can too. */
export interface AppContext {
  readonly config: Config;
  readonly pool: Pool;
  /**
   * The read replica's pool (DATABASE_READ_URL) for reports that only read; undefined when there is
   * none, and they read `pool`. Reached through withStaffReport (cash/read-only.ts), never for writes.
   */
  readonly readPool?: Pool;
  readonly queue: JobQueue;
  readonly logger: Logger;
  /** Uploaded files' bytes; their rows live in the `files` table. */
  readonly storage: ObjectStore;
  /** The clock, injectable so tests can move time (link expiry, lockouts). */
  readonly now: () => Date;
}

/**
 * The pool for the read replica when DATABASE_READ_URL is set (same app role and row-level security
 * as the primary's pool), else undefined. The caller ends it on shutdown.
 */
export function openReadPool(config: Config, name: string): Pool | undefined {
  if (!config.DATABASE_READ_URL) return undefined;
  return new Pool({ connectionString: config.DATABASE_READ_URL, max: config.DB_POOL_MAX, application_name: `${name}-read` });
}
