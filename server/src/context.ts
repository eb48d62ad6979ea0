import type { Pool } from 'pg';
import type { Logger } from 'pino';
import type { Config } from './config';
import type { ObjectStore } from './files/object-store';
import type { JobQueue } from './queue/job-queue';

/** What services need from the outside world; routes pass it in, jobs can too. */
export interface AppContext {
  readonly config: Config;
  readonly pool: Pool;
  readonly queue: JobQueue;
  readonly logger: Logger;
  /** Uploaded files' bytes; their rows live in the `files` table. */
  readonly storage: ObjectStore;
  /** The clock, injectable so tests can move time (link expiry, lockouts). */
  readonly now: () => Date;
}
