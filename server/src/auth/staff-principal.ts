import { isUuid, withTenant, TenantTx } from '@layerbook/db';
import type { Pool } from 'pg';
import type { Language, UnitSystem } from '@layerbook/contracts';
import type { StaffPrincipal } from '../http/principal';
import { isSessionId } from '../http/session';

/**
 * Loads a staff member inside the request's own firm transaction, so a deactivation or role change
 * takes effect on the very next request at the cost of one query, not one more transaction.
 */
interface StaffRow {
  membership_id: string;
  role: StaffPrincipal['role'];
  status: string;
  name: string;
  email: string;
  firm_name: string;
  time_zone: string;
  currency: string;
  language: Language;
  own_language: Language | null;
  units: UnitSystem;
  country: string;
  /** false when the request's session has ended in the database (signed out or expired elsewhere) */
  session_live?: boolean;
}

/**
 * The staff member's row as literal SQL for the first round trip of a request's transaction
 * (withTenantAndFirst), with whether the request's session is still live (`sessionId`; null when
 * there is none to check). Ids are checked UUIDs and the session id is checked base64url, so
 * inlining them is safe.
 */
export function staffRowSql(tenantId: string, userId: string, sessionId: string | null = null): string {
  if (!isUuid(tenantId) || !isUuid(userId)) throw new Error('staffRowSql needs ids');
  return `select m.id as membership_id, m.role, m.status, u.name, u.email, f.name as firm_name, f.time_zone, f.currency,
                 coalesce(m.language, f.language) as language, m.language as own_language, f.units, f.country,
                 ${sessionLiveSql(sessionId, userId)} as session_live
            from memberships m join users u on u.id = m.user_id join firms f on f.id = m.tenant_id
           where m.tenant_id = '${tenantId}' and m.user_id = '${userId}'`;
}

/** `auth_session_live(…)` for the first round trip, or `true` when no session is to be checked. */
export function sessionLiveSql(sessionId: string | null, userId: string): string {
  if (sessionId === null) return 'true';
  if (!isSessionId(sessionId) || !isUuid(userId)) throw new Error('sessionLiveSql needs ids');
  return `auth_session_live('${sessionId}', '${userId}')`;
}

export function toStaffPrincipal(tenantId: string, userId: string, row: StaffRow | undefined): StaffPrincipal | null {
  if (!row || row.status !== 'active' || row.session_live === false) return null;
  return {
    kind: 'staff',
    id: userId,
    tenantId,
    membershipId: row.membership_id,
    role: row.role,
    name: row.name,
    email: row.email,
    firmName: row.firm_name,
    timeZone: row.time_zone,
    currency: row.currency,
    language: row.language,
    ownLanguage: row.own_language,
    units: row.units,
    country: row.country,
  };
}

export async function loadStaffInTx(tx: TenantTx, userId: string): Promise<StaffPrincipal | null> {
  const { rows } = await tx.client.query<StaffRow>(staffRowSql(tx.tenantId, userId));
  const row = rows[0];
  if (!row || row.status !== 'active') return null;
  return {
    kind: 'staff',
    id: userId,
    tenantId: tx.tenantId,
    membershipId: row.membership_id,
    role: row.role,
    name: row.name,
    email: row.email,
    firmName: row.firm_name,
    timeZone: row.time_zone,
    currency: row.currency,
    language: row.language,
    ownLanguage: row.own_language,
    units: row.units,
    country: row.country,
  };
}

export function loadStaffPrincipal(pool: Pool, userId: string, tenantId: string): Promise<StaffPrincipal | null> {
  return withTenant(pool, tenantId, (tx) => loadStaffInTx(tx, userId));
}
