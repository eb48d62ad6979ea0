import type { Pool } from 'pg';
import type { StartedQueue } from './job-queue';
import type { QueueName } from './queues';

/**
 * Queues one firm's day (`singletonKey` firm:localDate) on a 'stately' queue, unless a copy is already
 * waiting, retrying or running. The policy alone refuses a second waiting copy, but lets one wait
 * behind a running one — and pg-boss 10 fetches the oldest waiting job first, so that copy would hold
 * every other firm's day back until the first run ended (pg-boss issue 536). True when queued.
 */
export async function sendFirmDay(
  pool: Pool,
  queue: StartedQueue,
  name: QueueName,
  data: { readonly tenantId: string; readonly localDate: string },
): Promise<boolean> {
  const singletonKey = `${data.tenantId}:${data.localDate}`;
  const { rowCount } = await pool.query(
    `select 1 from pgboss.job where name = $1 and singleton_key = $2 and state in ('created', 'retry', 'active') limit 1`,
    [name, singletonKey],
  );
  if (rowCount) return false;
  return (await queue.boss.send(name, data, { singletonKey })) !== null;
}
