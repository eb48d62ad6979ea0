import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Client, ClientConfig, escapeIdentifier } from 'pg';

/**
 * An administrator's connection to database `db`: DATABASE_ADMIN_URL (pointing at `db`) when set,
 * otherwise `postgres` over the local cluster's socket (ops/env.sh), as ops/backup/common.sh does.
 */
export function adminConnection(db: string, env: NodeJS.ProcessEnv = process.env): ClientConfig {
  const url = env['DATABASE_ADMIN_URL'];
  if (url) {
    // The same rewrite as url_with_db in common.sh (the URL may name no host: `postgres://u@/db?host=/run/socket`).
    const match = /^([a-z]+:\/\/[^/?]*)(\/[^?]*)?(\?.*)?$/.exec(url);
    if (!match) throw new Error('DATABASE_ADMIN_URL is not a postgres:// URL');
    return { connectionString: `${match[1]}/${db}${match[3] ?? ''}` };
  }
  const root = path.resolve(__dirname, '../..');
  return {
    host: env['PGDATA_DIR'] || path.join(env['LB_DATA'] || path.join(root, '.data'), 'pg'),
    port: Number(env['LB_PG_PORT'] || 54329),
    user: 'postgres',
    database: db,
  };
}

/** Every table holding rows, in every schema but PostgreSQL's own, as `schema.table` (quoted when needed). */
export async function listTables(client: Client): Promise<string[]> {
  const res = await client.query<{ name: string }>(
    `select format('%I.%I', n.nspname, c.relname) as name
       from pg_class c join pg_namespace n on n.oid = c.relnamespace
      where c.relkind in ('r', 'p')
        and n.nspname not in ('pg_catalog', 'information_schema') and n.nspname not like 'pg\\_toast%' and n.nspname not like 'pg\\_temp%'
      order by n.nspname, c.relname`,
  );
  return res.rows.map((r) => r.name);
}

/** Row count of every table; run inside one transaction to read one snapshot. */
export async function countRows(client: Client): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of await listTables(client)) {
    const res = await client.query<{ n: string }>(`select count(*) as n from ${table}`);
    out[table] = Number(res.rows[0].n);
  }
  return out;
}

export interface MigrationLevel {
  /** Migrations recorded as applied (drizzle's own table). */
  applied: number;
  /** The newest one's name from migrations/meta/_journal.json (null when unknown to this checkout). */
  latest: string | null;
  /** Its timestamp as drizzle records it (the journal's `when`, in milliseconds). */
  latestWhen: number | null;
}

export async function migrationLevel(client: Client, root = path.resolve(__dirname, '../..')): Promise<MigrationLevel> {
  const table = `${escapeIdentifier('drizzle')}.${escapeIdentifier('__drizzle_migrations')}`;
  const exists = await client.query<{ t: string | null }>(`select to_regclass('drizzle.__drizzle_migrations')::text as t`);
  if (!exists.rows[0].t) return { applied: 0, latest: null, latestWhen: null };
  const res = await client.query<{ applied: number; latest: string | null }>(
    `select count(*)::int as applied, max(created_at)::text as latest from ${table}`,
  );
  const latestWhen = res.rows[0].latest === null ? null : Number(res.rows[0].latest);
  let latest: string | null = null;
  try {
    const journal = JSON.parse(readFileSync(path.join(root, 'migrations/meta/_journal.json'), 'utf8')) as {
      entries: { when: number; tag: string }[];
    };
    latest = journal.entries.find((e) => e.when === latestWhen)?.tag ?? null;
  } catch {
    latest = null;
  }
  return { applied: res.rows[0].applied, latest, latestWhen };
}
