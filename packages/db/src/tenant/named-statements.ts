import { createHash } from 'node:crypto';
import type { PoolClient } from 'pg';
import { inlineQuery, type SqlQuery } from './sql-literal';

/**
 * How many distinct query texts get a name. Texts are fixed in the code (Drizzle's and ours), so
 * this is never reached in practice; a text built with its values written in would make a new one
 * on every call, and past the cap those simply run unnamed.
 */
const MAX_NAMES = 2_000;
const names = new Map<string, string>();
const named = new WeakSet<PoolClient>();
/** Connections whose transaction commitWith() ended: nothing may run on them until they go back to the pool. */
const ended = new WeakSet<PoolClient>();

type Query = PoolClient['query'];

function nameOf(text: string): string | undefined {
  const known = names.get(text);
  if (known !== undefined || names.size >= MAX_NAMES) return known;
  const name = `lb_q_${createHash('sha1').update(text).digest('hex').slice(0, 24)}`;
  names.set(text, name);
  return name;
}

const hasValues = (values: unknown) => Array.isArray(values) && values.length > 0;

/**
 * Makes every parameterised query on this connection a named statement, so PostgreSQL parses it
 * once per connection and, after a few runs, keeps a generic plan instead of planning it on every
 * call (planning was most of the time a short write transaction spent in PostgreSQL). node-postgres
 * remembers which names each connection holds and forgets one whose parse failed. Queries without
 * parameters stay on the simple protocol (they may hold several statements); a query that already
 * has a name, or is a cursor or stream, is left as it is. Idempotent.
 */
export function nameStatements(client: PoolClient): PoolClient {
  if (named.has(client)) return client;
  named.add(client);
  const query = client.query.bind(client) as (...args: unknown[]) => unknown;
  const withName = (...args: unknown[]): unknown => {
    if (ended.has(client)) throw new Error('This transaction was committed by commitWith(): nothing more may run in it.');
    const [first, second] = args;
    if (typeof first === 'string' && hasValues(second)) {
      const name = nameOf(first);
      if (name !== undefined) return query({ name, text: first, values: second }, ...args.slice(2));
    } else if (first !== null && typeof first === 'object') {
      const config = first as { name?: string; text?: unknown; values?: unknown; submit?: unknown };
      if (config.name === undefined && typeof config.submit !== 'function' && typeof config.text === 'string' && hasValues(config.values)) {
        const name = nameOf(config.text);
        if (name !== undefined) return query({ ...config, name }, ...args.slice(1));
      }
    }
    return query(...args);
  };
  client.query = withName as Query;
  return client;
}

/**
 * Sends `last` and COMMIT as ONE simple query (its parameters written in as literals) and answers
 * `last`'s rows: a transaction that takes a row lock every writer of the firm waits on (a numbering
 * counter) holds it only while PostgreSQL runs that statement and commits, not also for two trips
 * through a busy Node event loop. It must be the transaction's last step: withTenant() then sends no
 * COMMIT of its own, and any query after it throws. A failure rolls everything back as usual.
 */
export async function commitWith(client: PoolClient, last: SqlQuery): Promise<Record<string, unknown>[]> {
  if (!named.has(client)) throw new Error('commitWith needs a transaction of withTenant()');
  const answered = (await client.query(`${inlineQuery(last).replace(/;\s*$/, '')}; commit`)) as unknown as Array<{
    rows: Record<string, unknown>[];
  }>;
  ended.add(client);
  return answered[0].rows;
}

/** Notes that a query this package sent ended the connection's transaction with COMMIT (readAllInOneTrip's `commit`). */
export function markEnded(client: PoolClient): void {
  ended.add(client);
}

/** True once (and forgets it): whether commitWith() already committed this connection's transaction. */
export function takeEnded(client: PoolClient): boolean {
  return ended.delete(client);
}
