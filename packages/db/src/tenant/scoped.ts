import { drizzle, NodePgDatabase } from 'drizzle-orm/node-postgres';
import type { Pool, PoolClient } from 'pg';
import { nameStatements, takeEnded } from './named-statements';
import { runReads } from './prepared-reads';
import { asQuery, type SqlQuery } from './sql-literal';

/**
 * Query-builder only (no relational `db.query` API): building Drizzle's relational config from the
 * schema on every transaction costs more than the queries of a typical request.
 */
type Db = NodePgDatabase;

declare const tenantScoped: unique symbol;
declare const lookupScoped: unique symbol;

/**
 * One transaction on one pooled connection. `client` is there for libraries that must join the
 * same transaction (pg-boss `send(..., { db })`), `db` for Drizzle queries.
 */
export interface Tx {
  readonly db: Db;
  readonly client: PoolClient;
}

/**
 * A transaction in which `app.tenant_id` is set. Only withTenant() makes one, so a function that
 * takes a TenantTx cannot be handed a bare pool or another transaction: it fails to compile.
 */
export interface TenantTx extends Tx {
  readonly tenantId: string;
  readonly [tenantScoped]: true;
}

/** A transaction that may read the few rows a lookup key opens (see lookupPolicy in the schema). */
export interface LookupTx extends Tx {
  readonly [lookupScoped]: true;
}

export interface LookupKeys {
  readonly userId?: string;
  readonly email?: string;
  readonly tokenHash?: string;
  readonly slug?: string;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

async function inTransaction<T>(pool: Pool, begin: (client: PoolClient) => Promise<void>, fn: (tx: Tx) => Promise<T>): Promise<T> {
  const client = nameStatements(await pool.connect());
  try {
    await begin(client);
    const result = await fn({ client, db: drizzle(client, { casing: 'snake_case' }) });
    if (!takeEnded(client)) await client.query('commit');
    return result;
  } catch (error) {
    // After a batch's own COMMIT (one-trip.ts) there is nothing to roll back, and nothing may be sent.
    if (!takeEnded(client)) await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}

/** Runs fn in one transaction with the firm set transaction-locally (never a plain SET on a pooled connection). */
export function withTenant<T>(pool: Pool, tenantId: string, fn: (tx: TenantTx) => Promise<T>): Promise<T> {
  if (!UUID.test(tenantId)) return Promise.reject(new Error('withTenant needs a firm id'));
  return inTransaction(
    pool,
    async (client) => {
      // One round trip for BEGIN and the setting; the id is a checked UUID, so inlining it is safe.
      await client.query(`begin; select set_config('app.tenant_id', '${tenantId}', true)`);
    },
    (tx) => fn({ ...tx, tenantId } as TenantTx),
  );
}

/**
 * withTenant whose first round trip also runs `first` (a trusted literal, or a query whose values are
 * written in: prepared once per connection when it has a name, see prepared-reads.ts), handing its
 * rows to `fn`. Saves a round trip on every request that must re-check the signed-in person first.
 */
export function withTenantAndFirst<T>(
  pool: Pool,
  tenantId: string,
  first: string | SqlQuery,
  fn: (tx: TenantTx, firstRows: Record<string, unknown>[]) => Promise<T>,
): Promise<T> {
  if (!UUID.test(tenantId)) return Promise.reject(new Error('withTenant needs a firm id'));
  let firstRows: Record<string, unknown>[] = [];
  return inTransaction(
    pool,
    async (client) => {
      [firstRows] = await runReads(client, ['begin', `select set_config('app.tenant_id', '${tenantId}', true)`], [asQuery(first)], null);
    },
    (tx) => fn({ ...tx, tenantId } as TenantTx, firstRows),
  );
}

export const isUuid = (value: string) => UUID.test(value);

export function withLookup<T>(pool: Pool, keys: LookupKeys, fn: (tx: LookupTx) => Promise<T>): Promise<T> {
  return inTransaction(
    pool,
    async (client) => {
      await client.query('begin');
      await client.query(
        `select set_config('app.user_id', $1, true), set_config('app.lookup_email', $2, true),
                set_config('app.token_hash', $3, true), set_config('app.lookup_slug', $4, true)`,
        [keys.userId ?? '', keys.email ?? '', keys.tokenHash ?? '', keys.slug ?? ''],
      );
    },
    (tx) => fn(tx as LookupTx),
  );
}

/** For tables that are not firm data (users, password resets, outbox). */
export function withGlobal<T>(pool: Pool, fn: (tx: Tx) => Promise<T>): Promise<T> {
  return inTransaction(pool, async (client) => void (await client.query('begin')), fn);
}
