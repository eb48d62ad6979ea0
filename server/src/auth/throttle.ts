import { createHash } from 'node:crypto';
import type { AppContext } from '../context';
import { HttpError } from '../http/problem';

/**
 * Slows password guessing without locking anyone out and without telling which accounts exist:
 * failed attempts are counted per e-mail from one address (tight) and per e-mail from anywhere
 * (loose, against guessing spread over many addresses), in fixed windows, whether or not the
 * e-mail has an account. Per address alone is express-rate-limit's job (http/rate-limit.ts).
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

/** 429 when either count for this e-mail is spent in the current window. */
export function assertNotThrottled(ctx: AppContext, email: string, address: string): Promise<void> {
  return assertKeysNotThrottled(ctx, keysFor(email, address));
}

/** Counts one failure under each key, in one statement per key so parallel guesses each count. */
export function countFailedSignIn(ctx: AppContext, email: string, address: string): Promise<void> {
  return countFailures(ctx, keysFor(email, address));
}

/** A right password clears this address's count for the e-mail (the account-wide one runs out by itself). */
export async function clearFailedSignIns(ctx: AppContext, email: string, address: string): Promise<void> {
  const [, accountAddress] = keysFor(email, address);
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

/** 429 when any key's count is spent in the current window. */
export async function assertKeysNotThrottled(ctx: AppContext, keys: readonly ThrottleKey[]): Promise<void> {
  const { rows } = await ctx.pool.query<{ key: string; failures: number }>(
    `select key, failures from sign_in_throttle
      where key = any($1) and window_started_at > $2::timestamptz - make_interval(mins => $3)`,
    [keys.map((k) => k.key), ctx.now().toISOString(), THROTTLE_WINDOW_MINUTES],
  );
  if (rows.some((r) => r.failures >= (keys.find((k) => k.key === r.key)?.limit ?? Infinity))) throw tooManyAttempts();
}

export async function countFailures(ctx: AppContext, keys: readonly ThrottleKey[]): Promise<void> {
  const now = ctx.now().toISOString();
  for (const { key } of keys) {
    await ctx.pool.query(
      `insert into sign_in_throttle (key, failures, window_started_at) values ($1, 1, $2)
       on conflict (key) do update set
         failures = case when sign_in_throttle.window_started_at <= $2::timestamptz - make_interval(mins => $3)
                         then 1 else sign_in_throttle.failures + 1 end,
         window_started_at = case when sign_in_throttle.window_started_at <= $2::timestamptz - make_interval(mins => $3)
                                  then $2::timestamptz else sign_in_throttle.window_started_at end`,
      [key, now, THROTTLE_WINDOW_MINUTES],
    );
  }
}
