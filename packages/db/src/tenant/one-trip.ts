import type { Pool } from 'pg';
import { markEnded } from './named-statements';
import { runReads } from './prepared-reads';
import { isUuid, type TenantTx, type Tx } from './scoped';
import { asQuery, type SqlQuery } from './sql-literal';

export { inlineQuery, type SqlQuery } from './sql-literal';
export { statementName } from './prepared-reads';

type Rows = Record<string, unknown>[];

/**
 * A firm's read in ONE round trip: BEGIN READ ONLY, the firm set transaction-locally, `first` (e.g.
 * the signed-in person's re-check), `read` and COMMIT, sent as one simple query (named ones run as
 * statements prepared once per connection: prepared-reads.ts). The caller decides from `first`
 * whether `rows` may be used; a read-only transaction can have changed nothing either way. Saves two
 * round trips against withTenantAndFirst + query + commit.
 */
export async function readInOneTrip(
  pool: Pool,
  tenantId: string,
  first: string | SqlQuery,
  read: SqlQuery,
): Promise<{ first: Rows; rows: Rows }> {
  if (!isUuid(tenantId)) throw new Error('readInOneTrip needs a firm id');
  const client = await pool.connect();
  try {
    const [firstRows, rows] = await runReads(
      client,
      ['begin read only', `select set_config('app.tenant_id', '${tenantId}', true)`],
      [asQuery(first), read],
      'commit',
    );
    return { first: firstRows, rows };
  } catch (error) {
    // A failed statement leaves the transaction open and aborted: end it before the connection goes back.
    await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}

/**
 * A firm's read-only transaction in TWO round trips, for reads whose queries depend on who asks
 * (their firm's day, their role): the first sends BEGIN READ ONLY, the firm set transaction-locally
 * and `first` (the signed-in person's re-check, prepared when named); `check` decides from its rows
 * (and may throw: a 401 or 403), `build` makes the queries from what it answered (and may throw: a
 * 400); the second sends them all and COMMIT (named ones as prepared statements: prepared-reads.ts).
 * Anything thrown rolls the transaction back. `results` holds each query's rows, in order.
 */
export async function readInTwoTrips<P>(
  pool: Pool,
  tenantId: string,
  first: string | SqlQuery,
  check: (first: Rows) => P,
  build: (checked: P) => readonly SqlQuery[],
): Promise<{ checked: P; results: Rows[] }> {
  if (!isUuid(tenantId)) throw new Error('readInTwoTrips needs a firm id');
  const client = await pool.connect();
  try {
    const [firstRows] = await runReads(
      client,
      ['begin read only', `select set_config('app.tenant_id', '${tenantId}', true)`],
      [asQuery(first)],
      null,
    );
    const checked = check(firstRows);
    const results = await runReads(client, [], build(checked), 'commit');
    return { checked, results };
  } catch (error) {
    await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}

/** Several reads of one firm in ONE round trip (BEGIN READ ONLY, the firm, the reads, COMMIT): each one's rows, in order. */
export async function readManyInOneTrip(pool: Pool, tenantId: string, reads: readonly SqlQuery[]): Promise<Rows[]> {
  if (!isUuid(tenantId)) throw new Error('readManyInOneTrip needs a firm id');
  const client = await pool.connect();
  try {
    return await runReads(client, ['begin read only', `select set_config('app.tenant_id', '${tenantId}', true)`], reads, 'commit');
  } catch (error) {
    await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}

/**
 * Several reads inside the caller's transaction in ONE round trip (no BEGIN of its own; named ones
 * as prepared statements: prepared-reads.ts): each one's rows, in order. With `commit` the
 * transaction's COMMIT goes in the same trip: it must be its last step (withTenant then sends no COMMIT
 * of its own, and any query after it throws).
 */
export async function readAllInOneTrip(tx: Tx, reads: readonly SqlQuery[], options: { commit?: boolean } = {}): Promise<Rows[]> {
  const rows = await runReads(tx.client, [], reads, options.commit ? 'commit' : null);
  if (options.commit) markEnded(tx.client);
  return rows;
}

/** readAllInOneTrip for statements that write (their RETURNING rows, in order). */
export const runInOneTrip = readAllInOneTrip;

const COMMIT: SqlQuery = { text: 'commit', values: [] };

/**
 * Ends the caller's transaction and reads what it answers, in ONE round trip: `last` (its final
 * statements), COMMIT, then `after` in a new read-only transaction of the same firm (BEGIN READ
 * ONLY, the firm, the reads, COMMIT). Locks taken in the first are released at its COMMIT, before
 * the reads run. As with readAllInOneTrip's `commit`, nothing may run in the transaction after it. A failure in
 * `last` rolls it all back; one in `after` leaves the first committed (the caller's rollback then
 * ends the read-only one).
 */
export async function commitThenRead(
  tx: TenantTx,
  last: readonly SqlQuery[],
  after: readonly SqlQuery[],
): Promise<{ last: Rows[]; after: Rows[] }> {
  if (!isUuid(tx.tenantId)) throw new Error('commitThenRead needs a firm id');
  const reopen: SqlQuery[] = [
    COMMIT,
    { text: 'begin read only', values: [] },
    { text: `select set_config('app.tenant_id', '${tx.tenantId}', true)`, values: [] },
  ];
  const rows = await runReads(tx.client, [], [...last, ...reopen, ...after], 'commit');
  markEnded(tx.client);
  return { last: rows.slice(0, last.length), after: rows.slice(last.length + reopen.length) };
}
