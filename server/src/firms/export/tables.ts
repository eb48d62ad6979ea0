import type { TenantTx } from '@layerbook/db';

/**
 * Tables of firm data the export leaves out, with why. Anything else with a `tenant_id` that the
 * web role may read goes in, so a new table is exported without anyone remembering to add it.
 */
export const LEFT_OUT_TABLES: Readonly<Record<string, string>> = {
  portal_links: 'one-time sign-in links (token hashes only)',
  used_form_stamps: "the public form's spent anti-spam stamps",
};

/** Tables of sign-in secrets, by name: second factors, recovery codes, sessions. */
const SECRET_TABLE = /(^|_)(session|sessions|totp|second_factors?|recovery_codes?|secrets?)($|_)/;

/** Columns never written out: password hashes, token hashes, TOTP secrets, recovery codes. */
export const SECRET_COLUMN = /(^|_)(password|token|secret|totp|recovery)($|_)/;

export interface ExportTable {
  readonly name: string;
  /** the columns written, in table order; secrets left out */
  readonly columns: readonly string[];
  readonly hasId: boolean;
}

export interface TablePlan {
  readonly tables: readonly ExportTable[];
  /** firm tables not exported, and why */
  readonly leftOut: readonly { readonly table: string; readonly why: string }[];
}

interface CatalogRow {
  name: string;
  columns: string[];
  readable: boolean;
}

/**
 * The firm's tables as the web role sees them in the catalog: every table of `public` with a
 * `tenant_id` this role may SELECT as a whole (a table it may only partly read, like the mail
 * outbox whose bodies carry one-time links, is left out and named), and `firms` (the firm's own row, keyed by id). The team's people
 * (`users`: id, name, e-mail only) are added by the query that reads them.
 */
export async function planExport(tx: TenantTx): Promise<TablePlan> {
  const { rows } = await tx.client.query<CatalogRow>(
    `select c.relname as name,
            coalesce(array_agg(a.attname::text order by a.attnum) filter (where has_column_privilege(c.oid, a.attnum, 'SELECT')), '{}') as columns,
            has_table_privilege(c.oid, 'SELECT') as readable
       from pg_class c
       join pg_namespace n on n.oid = c.relnamespace and n.nspname = 'public'
       join pg_attribute a on a.attrelid = c.oid and a.attnum > 0 and not a.attisdropped
      where c.relkind in ('r', 'p')
        and (c.relname = 'firms' or exists (select 1 from pg_attribute t where t.attrelid = c.oid and t.attname = 'tenant_id' and not t.attisdropped))
      group by c.oid, c.relname
      order by c.relname`,
  );
  const tables: ExportTable[] = [];
  const leftOut: { table: string; why: string }[] = [];
  for (const row of rows) {
    const why =
      LEFT_OUT_TABLES[row.name] ?? (SECRET_TABLE.test(row.name) ? 'sign-in secrets' : row.readable ? null : 'not readable by the app');
    if (why) {
      leftOut.push({ table: row.name, why });
      continue;
    }
    const columns = row.columns.filter((c) => !SECRET_COLUMN.test(c));
    tables.push({ name: row.name, columns, hasId: columns.includes('id') });
  }
  return { tables, leftOut };
}

const ident = (name: string) => `"${name.replace(/"/g, '""')}"`;

/**
 * One statement for every table: each row as its table's name and its JSON text, table after table.
 * Read through one cursor, the whole export is one snapshot even before the transaction is
 * REPEATABLE READ. Values stay PostgreSQL's own JSON text (numeric amounts keep their digits).
 * `$1` is the firm's id.
 */
export function exportSql(tables: readonly ExportTable[]): string {
  const branch = (name: string, from: string) =>
    `(select '${name.replace(/'/g, "''")}'::text as t, to_jsonb(s)::text as j from (${from}) s)`;
  const columns = (table: ExportTable) => table.columns.map(ident).join(', ');
  const parts = [
    branch(
      'users',
      `select u.id, u.name, u.email from users u where u.id in (select m.user_id from memberships m where m.tenant_id = $1) order by u.id`,
    ),
    ...tables.map((table) =>
      branch(
        table.name,
        table.name === 'firms'
          ? `select ${columns(table)} from firms where id = $1`
          : `select ${columns(table)} from ${ident(table.name)} where tenant_id = $1${table.hasId ? ' order by id' : ''}`,
      ),
    ),
  ];
  return parts.join('\nunion all\n');
}

/** The names in the order exportSql reads them. */
export const exportOrder = (tables: readonly ExportTable[]): string[] => ['users', ...tables.map((t) => t.name)];
