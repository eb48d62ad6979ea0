import { firms, memberships, users, and, eq, withTenant, TenantTx } from '@layerbook/db';
import type { Pool } from 'pg';
import type { StaffPrincipal } from '../http/principal';

/**
 * Loads a staff member inside the request's own firm transaction, so a deactivation or role change
 * takes effect on the very next request at the cost of one query, not one more transaction.
 */
export async function loadStaffInTx(tx: TenantTx, userId: string): Promise<StaffPrincipal | null> {
  const rows = await tx.db
    .select({
      membershipId: memberships.id,
      role: memberships.role,
      status: memberships.status,
      name: users.name,
      email: users.email,
      firmName: firms.name,
      timeZone: firms.timeZone,
      currency: firms.currency,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(firms, eq(firms.id, memberships.tenantId))
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.userId, userId)));
  const row = rows[0];
  if (!row || row.status !== 'active') return null;
  const { status: _status, ...rest } = row;
  return { kind: 'staff', id: userId, tenantId: tx.tenantId, ...rest };
}

export function loadStaffPrincipal(pool: Pool, userId: string, tenantId: string): Promise<StaffPrincipal | null> {
  return withTenant(pool, tenantId, (tx) => loadStaffInTx(tx, userId));
}
