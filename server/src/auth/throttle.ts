import { createHash } from 'node:crypto';
import type { AppContext } from '../context';
import { HttpError } from '../http/problem';

/**
 * Slows password guessing without locking anyone out and without telling which accounts exist:
 * attempts are counted, before the check, per e-mail from one address (tight) and per e-mail from anywhere
 * (loose, against guessing spread over many addresses), in fixed windows, whether or not the
 * e-mail has an account; a right one is given back. Per address alone is express-rate-limit's job (http/rate-limit.ts).
 * Someone elsewhere hitting the tight limit for your e-mail does not stop you signing in.
 */
export const THROTTLE_WINDOW_MINUTES = 15;
export const FAILURES_PER_ACCOUNT_AND_ADDRESS = 5;
export const FAILURES_PER_ACCOUNT = 50;

export interface ThrottleKey {
  readonly key: string;
  readonly limit: number;
}

const digest = (text: string) => createHash('sha256').update(text).digest('hex');

function keysFor(email: string, address: string): ThrottleKey[] {
  const account = email.trim().toLowerCase();
  return [
    { key: `account:${digest(account)}`, limit: FAILURES_PER_ACCOUNT },
    { key: `account-address:${digest(`${account}\n${address}`)}`, limit: FAILURES_PER_ACCOUNT_AND_ADDRESS },
  ];
}

export const tooManyAttempts = () =>
  new HttpError(429, 'Too many attempts', 'Too many attempts for this sign-in. Wait a few minutes and try again.');

/**
 * Takes one attempt for this e-mail from this address before the password is checked: 429 when
 * either count is spent (takeAttempt). A right password gives it back (passedSignIn).
 */
export function takeSignInAttempt(ctx: AppContext, email: string, address: string): Promise<void> {
  return takeAttempt(ctx, keysFor(email, address));
}

/**
 * A right password: the attempt taken for it is given back to the account-wide count, and this
 * address's count for the e-mail is cleared.
 */
export async function passedSignIn(ctx: AppContext, email: string, address: string): Promise<void> {
  const [account, accountAddress] = keysFor(email, address);
  await giveBackAttempt(ctx, [account]);
  await ctx.pool.query('delete from sign_in_throttle where key = $1', [accountAddress.key]);
}

/**
 * Wrong second-factor codes count like wrong passwords: per person from one address (tight) and per
 * person from anywhere (loose), in the same windows, so six digits cannot be walked through.
 */
export function secondFactorKeys(userId: string, address: string): ThrottleKey[] {
  return [
    { key: `second-factor:${digest(userId)}`, limit: FAILURES_PER_ACCOUNT },
    { key: `second-factor-address:${digest(`${userId}\n${address}`)}`, limit: FAILURES_PER_ACCOUNT_AND_ADDRESS },
  ];
}

/**
 * Counts one attempt under each key before the secret is checked, each in one statement that answers
 * the new count, so guesses sent at the same moment are each counted before any is checked (checking
 * first and counting after let them all through). 429 when any count goes past its limit: the
 * limit's worth of attempts are checked in a window, the rest refused. A new window starts at 1.
 */
export async function takeAttempt(ctx: AppContext, keys: readonly ThrottleKey[]): Promise<void> {
  const now = ctx.now().toISOString();
  let spent = false;
  for (const { key, limit } of keys) {
    const { rows } = await ctx.pool.query<{ failures: number }>(
      `insert into sign_in_throttle (key, failures, window_started_at) values ($1, 1, $2)
       on conflict (key) do update set
         failures = case when sign_in_throttle.window_started_at <= $2::timestamptz - make_interval(mins => $3)
                         then 1 else sign_in_throttle.failures + 1 end,
         window_started_at = case when sign_in_throttle.window_started_at <= $2::timestamptz - make_interval(mins => $3)
                                  then $2::timestamptz else sign_in_throttle.window_started_at end
       returning failures`,
      [key, now, THROTTLE_WINDOW_MINUTES],
    );
    if (rows[0].failures > limit) spent = true;
  }
  if (spent) throw tooManyAttempts();
}

/** An attempt that turned out right is not a failure: its count is taken back. */
export async function giveBackAttempt(ctx: AppContext, keys: readonly ThrottleKey[]): Promise<void> {
  await ctx.pool.query(`update sign_in_throttle set failures = greatest(failures - 1, 0) where key = any($1)`, [keys.map((k) => k.key)]);
}
