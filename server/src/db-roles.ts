import type { Pool } from 'pg';

/**
 * The web role must be bound by row-level security: not superuser, not BYPASSRLS, owning no table.
 * Checked at start-up (and in a test) so a misconfigured deployment refuses to serve.
 */
export async function assertRlsBoundRole(pool: Pool): Promise<void> {
  const { rows } = await pool.query(
    `select r.rolname, r.rolsuper, r.rolbypassrls,
            (select count(*)::int from pg_tables t where t.schemaname = 'public' and t.tableowner = r.rolname) as owned
       from pg_roles r where r.rolname = current_user`,
  );
  const role = rows[0] as { rolname: string; rolsuper: boolean; rolbypassrls: boolean; owned: number } | undefined;
  if (!role || role.rolsuper || role.rolbypassrls || role.owned > 0) {
    throw new Error(`Database role ${role?.rolname ?? '?'} would bypass row-level security; use the layerbook_app login role.`);
  }
}
