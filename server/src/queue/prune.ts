import type { Pool } from 'pg';
import { THROTTLE_WINDOW_MINUTES } from '../auth/throttle';

/** A public-form stamp is refused after two hours (inquiries/public-form.ts); its used nonce is kept a day. */
export const USED_STAMP_KEEP_HOURS = 24;
/** A sign-up, reset or portal sign-in link, once used or past its expiry, is kept a day and then deleted. */
export const PENDING_SIGN_UP_KEEP_HOURS = 24;
/** A sent e-mail's row is kept (its purpose key stops a second send) but its body — one-time links in plain text — goes after this. */
export const SENT_MAIL_BODY_KEEP_DAYS = 30;

export interface PruneResult {
  readonly sessions: number;
  readonly formStamps: number;
  readonly throttleWindows: number;
  readonly pendingSignUps: number;
  readonly passwordResets: number;
  readonly portalLinks: number;
  readonly mailBodies: number;
}

/**
 * The `prune-expired` queue job: deletes sessions past their expiry, used form stamps too old to
 * be replayed, sign-in throttle windows that have run out, sign-up, reset and portal sign-in links used or
 * expired more than a day ago, and the bodies of e-mails sent a month ago. Runs as the jobs role.
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
  const linkGone = `coalesce(least(used_at, expires_at), expires_at) < $1::timestamptz - make_interval(hours => $2)`;
  const resets = await pool.query(`delete from password_resets where ${linkGone}`, [at, PENDING_SIGN_UP_KEEP_HOURS]);
  const links = await pool.query(`delete from portal_links where ${linkGone}`, [at, PENDING_SIGN_UP_KEEP_HOURS]);
  const bodies = await pool.query(
    `update mail_outbox set html = '', text = '' where status = 'sent' and sent_at < $1::timestamptz - make_interval(days => $2)
        and (html <> '' or text <> '')`,
    [at, SENT_MAIL_BODY_KEEP_DAYS],
  );
  return {
    sessions: sessions.rowCount ?? 0,
    formStamps: formStamps.rowCount ?? 0,
    throttleWindows: throttle.rowCount ?? 0,
    pendingSignUps: signUps.rowCount ?? 0,
    passwordResets: resets.rowCount ?? 0,
    portalLinks: links.rowCount ?? 0,
    mailBodies: bodies.rowCount ?? 0,
  };
}
