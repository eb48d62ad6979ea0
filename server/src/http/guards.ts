import { roleAtLeast, StaffRole } from '@layerbook/contracts';
import { TenantTx, withTenant, withTenantAndFirst } from '@layerbook/db';
import type { Request } from 'express';
import { loadClientInTx } from '../auth/portal-auth';
import { staffRowSql, toStaffPrincipal } from '../auth/staff-principal';
import type { AppContext } from '../context';
import type { ClientPrincipal, StaffPrincipal } from './principal';
import { forbidden, unauthorized } from './problem';

/**
 * Function-level and record-level authorisation in one step: opens the signed-in person's firm
 * transaction, re-checks they are an active member with at least `needed`, then runs `fn` in it.
 * owner ⊃ office ⊃ crew.
 */
export async function withStaff<T>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  fn: (tx: TenantTx, staff: StaffPrincipal) => Promise<T>,
): Promise<T> {
  const claim = req.user;
  if (!claim || claim.kind !== 'staff') throw unauthorized();
  return withTenantAndFirst(ctx.pool, claim.tenantId, staffRowSql(claim.tenantId, claim.id), async (tx, rows) => {
    const staff = toStaffPrincipal(claim.tenantId, claim.id, rows[0] as unknown as Parameters<typeof toStaffPrincipal>[2]);
    if (!staff) throw unauthorized('Your access has ended. Sign in again, or ask the owner.');
    if (!roleAtLeast(staff.role, needed)) throw forbidden();
    return fn(tx, staff);
  });
}

export async function withClient<T>(ctx: AppContext, req: Request, fn: (tx: TenantTx, client: ClientPrincipal) => Promise<T>): Promise<T> {
  const claim = req.user;
  if (!claim || claim.kind !== 'client') throw unauthorized('Sign in with the link we e-mail you.');
  return withTenant(ctx.pool, claim.tenantId, async (tx) => {
    const client = await loadClientInTx(tx, claim.id);
    if (!client) throw unauthorized('This client account is no longer active.');
    return fn(tx, client);
  });
}
