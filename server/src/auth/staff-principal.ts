import { isUuid, type SqlQuery, withTenant, TenantTx } from '@layerbook/db';
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
 * The staff member's row for the first round trip of a request's transaction (withTenantAndFirst,
 * readInOneTrip), with whether the request's session is still live (`sessionId`; null when there is
 * none to check). Named, so each connection prepares it once instead of planning its three-table
 * join on every request; its values are written in as escaped literals (EXECUTE's arguments).
 */
export function staffRowQuery(tenantId: string, userId: string, sessionId: string | null = null): SqlQuery {
  if (!isUuid(tenantId) || !isUuid(userId)) throw new Error('staffRowQuery needs ids');
  const live = sessionLive(sessionId, userId, 3);
  return {
    name: `lb_staff_row${live.suffix}`,
    text: `select m.id as membership_id, m.role, m.status, u.name, u.email, f.name as firm_name, f.time_zone, f.currency,
                 coalesce(m.language, f.language) as language, m.language as own_language, f.units, f.country,
                 ${live.sql} as session_live
            from memberships m join users u on u.id = m.user_id join firms f on f.id = m.tenant_id
           where m.tenant_id = $1 and m.user_id = $2`,
    values: [tenantId, userId, ...live.values],
  };
}

/**
 * `auth_session_live(…)` with its two parameters numbered from `from` (the user id goes again, as
 * text), or `true` when no session is to be checked; `suffix` tells the two statements apart.
 */
export function sessionLive(sessionId: string | null, userId: string, from: number): { sql: string; values: string[]; suffix: string } {
  if (sessionId === null) return { sql: 'true', values: [], suffix: '' };
  if (!isSessionId(sessionId) || !isUuid(userId)) throw new Error('sessionLive needs ids');
  return { sql: `auth_session_live($${from}, $${from + 1})`, values: [sessionId, userId], suffix: '_live' };
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
  const staffRow = staffRowQuery(tx.tenantId, userId);
  const { rows } = await tx.client.query<StaffRow>(staffRow.text, [...staffRow.values]);
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
