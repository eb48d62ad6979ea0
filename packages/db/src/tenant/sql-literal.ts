import { escapeLiteral } from 'pg';

/** A parameterised query as node-postgres takes it. */
export interface SqlQuery {
  readonly text: string;
  readonly values: readonly unknown[];
  /**
   * A name to keep the statement prepared under on each connection (runReads in prepared-reads.ts:
   * planned once per connection, not on every call). Lower case, digits and underscores.
   */
  readonly name?: string;
}

/** A trusted literal statement (no parameters) as a query; a query as it is. */
export const asQuery = (query: string | SqlQuery): SqlQuery => (typeof query === 'string' ? { text: query, values: [] } : query);

/**
 * The query with its `$n` parameters written in as literals (strings through pg's escapeLiteral), for
 * the simple-query protocol, which takes no parameters. Only for texts this code builds: a `$n` inside
 * a quoted string or a dollar-quoted body of the text would be replaced too.
 */
export function inlineQuery(query: SqlQuery): string {
  return query.text.replace(/\$(\d+)/g, (_match, n: string) => literal(query.values[Number(n) - 1], n));
}

export function literal(value: unknown, n: string): string {
  if (value === null || value === undefined) return 'null';
  if (typeof value === 'string') return escapeLiteral(value);
  if (typeof value === 'number' && Number.isFinite(value)) return `(${value})`;
  if (typeof value === 'boolean') return String(value);
  if (value instanceof Date && !Number.isNaN(value.getTime())) return escapeLiteral(value.toISOString());
  throw new Error(`inlineQuery: parameter $${n} cannot be written as a literal`);
}
