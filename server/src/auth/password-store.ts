import type { Pool, PoolClient } from 'pg';

type Queryable = Pick<Pool | PoolClient, 'query'>;

/**
 * Password hashes are out of the web role's reach (migrations/0018): it reads or sets one person's
 * hash by user id through security-definer functions owned by the owner role, never by a select.
 */
export async function passwordHashOf(db: Queryable, userId: string): Promise<string | null> {
  const { rows } = await db.query<{ hash: string | null }>('select auth_password_hash($1) as hash', [userId]);
  return rows[0]?.hash ?? null;
}

export async function setPasswordHash(db: Queryable, userId: string, passwordHash: string): Promise<void> {
  await db.query('select auth_set_password_hash($1, $2)', [userId, passwordHash]);
}

/** Ends every session of a staff member (after a password reset); the session table is out of reach too. */
export async function endStaffSessions(db: Queryable, userId: string): Promise<void> {
  await db.query('select auth_sessions_end_for_staff($1)', [userId]);
}

/** Ends a staff member's sessions in the caller's firm only (deactivation), in its transaction. */
export async function endMemberSessions(db: Queryable, userId: string, tenantId: string): Promise<void> {
  await db.query('select auth_sessions_end_for_member($1, $2)', [userId, tenantId]);
}
