import { roleAtLeast, type StaffRole } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { endMemberSessions } from '../password-store';
import { factorOf } from './store';
import { firmRequiresSecondFactor } from './verify';

/*
 * The firm's rule ("owner and office sign in with a second factor") is checked at sign-in. A session
 * opened before someone came under it (promoted from crew, or the rule switched on) would otherwise
 * keep office access with no factor, so such sessions end in this firm: the next sign-in asks for
 * the set-up. Sessions in the person's other firms stay (each firm has its own rule).
 */

/** Whether a role change lifts someone into owner or office (crew → office, crew or office → owner). */
export const risesIntoOffice = (from: StaffRole, to: StaffRole): boolean => roleAtLeast(to, 'office') && !roleAtLeast(from, to);

/** Ends a member's sessions in this firm when it requires a second factor they have not confirmed. */
export async function endSessionsIfFactorMissing(tx: TenantTx, userId: string): Promise<void> {
  if (!(await firmRequiresSecondFactor(tx)) || (await factorOf(tx, userId))?.confirmedAt) return;
  await endMemberSessions(tx.client, userId, tx.tenantId);
}

/** Ends, in this firm, the sessions of every owner and office member without a confirmed second factor (one round trip). */
export async function endSessionsWithoutFactor(tx: TenantTx): Promise<void> {
  await tx.client.query(
    `select auth_sessions_end_for_member(m.user_id, m.tenant_id)
       from memberships m
      where m.tenant_id = $1 and m.role in ('owner', 'office')
        and not exists (select 1 from user_second_factors f where f.user_id = m.user_id and f.confirmed_at is not null)`,
    [tx.tenantId],
  );
}
