import { createHash } from 'node:crypto';
import type { PoolClient } from 'pg';

/**
 * How many distinct query texts get a name. Texts are fixed in the code (Drizzle's and ours), so
 * this is never reached in practice; a text built with its values written in would make a new one
 * on every call, and past the cap those simply run unnamed.
 */
const MAX_NAMES = 2_000;
/**
 * How many statements one connection keeps prepared (each holds its plan in that PostgreSQL
 * backend's memory): the first ones a connection runs, which are the busy ones; the rest of its
 * queries run unnamed. Idle connections close after the pool's idle timeout, freeing them.
 */
const MAX_PER_CONNECTION = 300;
const names = new Map<string, string>();
/** Per connection, the names it has sent to be prepared. */
const named = new WeakMap<PoolClient, Set<string>>();
/** Connections whose transaction ended with a batch's COMMIT (one-trip.ts): nothing may run on them until they go back to the pool. */
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
  const held = new Set<string>();
  named.set(client, held);
  const nameHere = (text: string): string | undefined => {
    const name = nameOf(text);
    if (name === undefined || held.has(name)) return name;
    if (held.size >= MAX_PER_CONNECTION) return undefined;
    held.add(name);
    return name;
  };
  const query = client.query.bind(client) as (...args: unknown[]) => unknown;
  const withName = (...args: unknown[]): unknown => {
    if (ended.has(client)) throw new Error('This transaction was committed in its last round trip: nothing more may run in it.');
    const [first, second] = args;
    if (typeof first === 'string' && hasValues(second)) {
      const name = nameHere(first);
      if (name !== undefined) return query({ name, text: first, values: second }, ...args.slice(2));
    } else if (first !== null && typeof first === 'object') {
      const config = first as { name?: string; text?: unknown; values?: unknown; submit?: unknown };
      if (config.name === undefined && typeof config.submit !== 'function' && typeof config.text === 'string' && hasValues(config.values)) {
        const name = nameHere(config.text);
        if (name !== undefined) return query({ ...config, name }, ...args.slice(1));
      }
    }
    return query(...args);
  };
  client.query = withName as Query;
  return client;
}

/** Notes that a batch this package sent ended the connection's transaction with COMMIT (one-trip.ts). */
export function markEnded(client: PoolClient): void {
  ended.add(client);
}

/** True once (and forgets it): whether a batch already committed this connection's transaction. */
export function takeEnded(client: PoolClient): boolean {
  return ended.delete(client);
}
