import { escapeLiteral, type Pool } from 'pg';
import { isUuid } from './scoped';

/** A parameterised query as node-postgres takes it. */
export interface SqlQuery {
  readonly text: string;
  readonly values: readonly unknown[];
}

type Rows = Record<string, unknown>[];

/**
 * The query with its `$n` parameters written in as literals (strings through pg's escapeLiteral), for
 * the simple-query protocol, which takes no parameters. Only for texts this code builds: a `$n` inside
 * a quoted string or a dollar-quoted body of the text would be replaced too.
 */
export function inlineQuery(query: SqlQuery): string {
  return query.text.replace(/\$(\d+)/g, (_match, n: string) => literal(query.values[Number(n) - 1], n));
}

function literal(value: unknown, n: string): string {
  if (value === null || value === undefined) return 'null';
  if (typeof value === 'string') return escapeLiteral(value);
  if (typeof value === 'number' && Number.isFinite(value)) return `(${value})`;
  if (typeof value === 'boolean') return String(value);
  if (value instanceof Date && !Number.isNaN(value.getTime())) return escapeLiteral(value.toISOString());
  throw new Error(`inlineQuery: parameter $${n} cannot be written as a literal`);
}

/**
 * A firm's read in ONE round trip: BEGIN READ ONLY, the firm set transaction-locally, `firstSql` (a
 * trusted literal, e.g. the signed-in person's re-check), `read` and COMMIT, sent as one simple
 * query. The caller decides from `first` whether `rows` may be used; a read-only transaction can
 * have changed nothing either way. Saves two round trips against withTenantAndFirst + query + commit.
 */
export async function readInOneTrip(pool: Pool, tenantId: string, firstSql: string, read: SqlQuery): Promise<{ first: Rows; rows: Rows }> {
  if (!isUuid(tenantId)) throw new Error('readInOneTrip needs a firm id');
  const client = await pool.connect();
  try {
    const results = (await client.query(
      `begin read only; select set_config('app.tenant_id', '${tenantId}', true); ${firstSql}; ${inlineQuery(read)}; commit`,
    )) as unknown as Array<{ rows: Rows }>;
    return { first: results[2].rows, rows: results[3].rows };
  } catch (error) {
    // A failed statement leaves the transaction open and aborted: end it before the connection goes back.
    await client.query('rollback').catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}
