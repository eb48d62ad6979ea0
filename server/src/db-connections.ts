import type { Pool } from 'pg';
import type { Logger } from 'pino';

/**
 * A connection PostgreSQL drops (a restart, a failover, an administrator's terminate) raises an
 * 'error' event: on the pool while the connection is idle there, on the client while it is checked
 * out between two queries (a transaction waiting on other work). With no listener either one crashes
 * the process; with one, the query under way fails (the request answers 503), the pool discards the
 * connection and opens a new one when next asked.
 */
export function survivesDroppedConnections(pool: Pool, logger: Logger): void {
  const lost = (err: Error) => logger.warn({ dbError: err.message }, 'database connection lost');
  pool.on('error', lost);
  pool.on('connect', (client) => client.on('error', lost));
}
