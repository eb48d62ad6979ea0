import { createHash } from 'node:crypto';
import type { PoolClient } from 'pg';
import { inlineQuery, literal, type SqlQuery } from './sql-literal';

type Rows = Record<string, unknown>[];

/** The names each connection holds prepared (a prepared statement lives as long as its connection, whatever the transaction does). */
const preparedOn = new WeakMap<PoolClient, Set<string>>();

const NAME = /^[a-z_][a-z0-9_]{0,62}$/;

/**
 * Sends `before` (statements whose results are skipped), the reads and `after` (COMMIT, or null) as ONE simple query
 * and answers each read's rows in order. A named read runs as EXECUTE of a statement prepared on that
 * connection — the PREPARE sent ahead of it the first time — so PostgreSQL plans it once per
 * connection (a generic plan after its first few runs) instead of on every call; its parameters are
 * written in as literals (inlineQuery's) and take the types PREPARE inferred. When the query fails,
 * the names it was preparing are dropped again, so a later call prepares them afresh.
 */
export async function runReads(
  client: PoolClient,
  before: readonly string[],
  reads: readonly SqlQuery[],
  after: string | null,
): Promise<Rows[]> {
  const held = preparedOn.get(client) ?? new Set<string>();
  const preparing: string[] = [];
  const parts: string[] = [];
  const readAt: number[] = [];
  const skipped = before.length;
  for (const read of reads) {
    if (read.name === undefined) {
      readAt.push(skipped + parts.length);
      parts.push(inlineQuery(read).replace(/;\s*$/, ''));
      continue;
    }
    if (!NAME.test(read.name)) throw new Error(`runReads: "${read.name}" is not a statement name`);
    if (!held.has(read.name) && !preparing.includes(read.name)) {
      preparing.push(read.name);
      parts.push(`prepare ${read.name} as ${read.text.trim().replace(/;\s*$/, '')}`);
    }
    readAt.push(skipped + parts.length);
    const args = read.values.map((value, i) => literal(value, String(i + 1)));
    parts.push(args.length === 0 ? `execute ${read.name}` : `execute ${read.name}(${args.join(', ')})`);
  }
  const text = [...before, ...parts, ...(after === null ? [] : [after])].join('; ');
  try {
    const answered = (await client.query(text)) as unknown as Array<{ rows: Rows }> | { rows: Rows };
    const results = Array.isArray(answered) ? answered : [answered];
    if (preparing.length > 0) preparedOn.set(client, new Set([...held, ...preparing]));
    return readAt.map((at) => results[at].rows);
  } catch (error) {
    if (preparing.length > 0) {
      // Out of the failed transaction first: DEALLOCATE is refused inside it, and a PREPARE that ran stays.
      await client.query('rollback').catch(() => undefined);
      for (const name of preparing) await client.query(`deallocate ${name}`).catch(() => undefined);
    }
    throw error;
  }
}

const statementNames = new Map<string, string>();

/**
 * A prepared-statement name for a query text built from a few fixed variants (a list's filters,
 * with or without a cursor): `prefix` and a hash of the text, the same on every call for the same text.
 */
export function statementName(prefix: string, text: string): string {
  const known = statementNames.get(text);
  if (known !== undefined) return known;
  const name = `${prefix}_${createHash('sha1').update(text).digest('hex').slice(0, 16)}`;
  if (statementNames.size < 1_000) statementNames.set(text, name);
  return name;
}
