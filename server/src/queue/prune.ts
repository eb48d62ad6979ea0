import type { Pool } from 'pg';
import { THROTTLE_WINDOW_MINUTES } from '../auth/throttle';

/** A public-form stamp is refused after two hours (inquiries/public-form.ts); its used nonce is kept a day. */
export const USED_STAMP_KEEP_HOURS = 24;
/** A sign-up link, once used or past its expiry, is kept a day and then deleted. */
export const PENDING_SIGN_UP_KEEP_HOURS = 24;

export interface PruneResult {
  readonly sessions: number;
  readonly formStamps: number;
  readonly throttleWindows: number;
  readonly pendingSignUps: number;
}

/**
 * The `prune-expired` queue job: deletes sessions past their expiry, used form stamps too old to
 * be replayed, sign-in throttle windows that have run out, and sign-up links used or expired more than a
 * day ago. Runs as the jobs role.
 */
export async function pruneExpired(pool: Pool, now: Date): Promise<PruneResult> {
  const at = now.toISOString();
  const sessions = await pool.query(`delete from session where expire < $1::timestamptz`, [at]);
  const formStamps = await pool.query(`delete from used_form_stamps where used_at < $1::timestamptz - make_interval(hours => $2)`, [
    at,
    USED_STAMP_KEEP_HOURS,
  ]);
  const throttle = await pool.query(`delete from sign_in_throttle where window_started_at < $1::timestamptz - make_interval(mins => $2)`, [
    at,
    THROTTLE_WINDOW_MINUTES,
  ]);
  const signUps = await pool.query(
    `delete from pending_sign_ups
      where coalesce(least(used_at, expires_at), expires_at) < $1::timestamptz - make_interval(hours => $2)`,
    [at, PENDING_SIGN_UP_KEEP_HOURS],
  );
  return {
    sessions: sessions.rowCount ?? 0,
    formStamps: formStamps.rowCount ?? 0,
    throttleWindows: throttle.rowCount ?? 0,
    pendingSignUps: signUps.rowCount ?? 0,
  };
}
