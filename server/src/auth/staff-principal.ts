import { firms, memberships, users, and, eq, withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { StaffPrincipal } from '../http/principal';

/** Reloads a staff member on each request, so a deactivation or role change takes effect at once. */
export async function loadStaffPrincipal(pool: Pool, userId: string, tenantId: string): Promise<StaffPrincipal | null> {
  return withTenant(pool, tenantId, async (tx) => {
    const rows = await tx.db
      .select({
        membershipId: memberships.id,
        role: memberships.role,
        status: memberships.status,
        name: users.name,
        email: users.email,
        firmName: firms.name,
      })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .innerJoin(firms, eq(firms.id, memberships.tenantId))
      .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.userId, userId)));
    const row = rows[0];
    if (!row || row.status !== 'active') return null;
    return { kind: 'staff', id: userId, tenantId, membershipId: row.membershipId, role: row.role, name: row.name, email: row.email, firmName: row.firmName };
  });
}
