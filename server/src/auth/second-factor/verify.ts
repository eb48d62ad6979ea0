import { eq, firms, type TenantTx, type Tx } from '@layerbook/db';
import { roleAtLeast, type SecondFactorStep } from '@layerbook/contracts';
import type { AppContext } from '../../context';
import type { StaffPrincipal } from '../../http/principal';
import { badRequest } from '../../http/problem';
import { recordAudit } from '../../audit/record';
import { giveBackAttempt, secondFactorKeys, takeAttempt } from '../throttle';
import { normaliseRecoveryCode } from './recovery-codes';
import { openSecret, recoveryCodeHash } from './secret-box';
import { factorOf, spendRecoveryCode, takeStep } from './store';
import { acceptedStep } from './totp';

export type SecondFactorUsed = 'app' | 'recoveryCode';

export const wrongCode = () =>
  badRequest(
    [{ field: 'code', message: 'That code is not right. Use the newest code from your app, or a recovery code.' }],
    'That code is not right.',
  );

/**
 * Checks a code from the app (6 digits: within one step of now and newer than the last step used,
 * which it then takes) or a recovery code (spent). Null when neither: the caller counts a failure.
 */
export async function useCode(ctx: AppContext, tx: Tx, userId: string, typed: string): Promise<SecondFactorUsed | null> {
  const now = ctx.now();
  const digits = typed.replace(/\s/g, '');
  if (/^[0-9]{6}$/.test(digits)) {
    const row = await factorOf(tx, userId);
    if (!row?.confirmedAt) return null;
    const step = acceptedStep(openSecret(ctx.config, userId, row.secretSealed), digits, now, row.lastUsedStep);
    return step !== null && (await takeStep(tx, userId, step, now)) ? 'app' : null;
  }
  const code = normaliseRecoveryCode(typed);
  if (!code) return null;
  return (await spendRecoveryCode(tx, userId, recoveryCodeHash(ctx.config, code), now)) ? 'recoveryCode' : null;
}

/**
 * Runs a code check throttled like passwords (per person and address, and per person): 429 when
 * spent; each attempt is counted before the check (so codes sent at once are each counted), a right
 * one is given back, a wrong one answers 400 on `code`.
 */
export const wrongPassword = () =>
  badRequest([{ field: 'password', message: 'That password is not right.' }], 'That password is not right.');

export async function throttledCheck<T>(
  ctx: AppContext,
  userId: string,
  address: string,
  check: () => Promise<T | null>,
  wrong: () => Error = wrongCode,
): Promise<T> {
  const keys = secondFactorKeys(userId, address);
  await takeAttempt(ctx, keys);
  const result = await check();
  if (result === null) throw wrong();
  await giveBackAttempt(ctx, keys);
  return result;
}

/**
 * What a person who gave the right password must do before they are signed in: a code when they
 * have a second factor; enrol when their firm requires one and they have none; nothing for crew
 * (and for owner and office without one, in a firm that does not require it).
 */
export async function signInStepFor(tx: TenantTx, staff: StaffPrincipal): Promise<SecondFactorStep | null> {
  if (!roleAtLeast(staff.role, 'office')) return null;
  const row = await factorOf(tx, staff.id);
  if (row?.confirmedAt) return 'code';
  return (await firmRequiresSecondFactor(tx)) ? 'enrol' : null;
}

export async function firmRequiresSecondFactor(tx: TenantTx): Promise<boolean> {
  const [firm] = await tx.db.select({ required: firms.secondFactorRequired }).from(firms).where(eq(firms.id, tx.tenantId));
  return firm?.required ?? false;
}

/** Every staff sign-in is in the firm's audit log, with whether (and how) a second factor was used. */
export function recordSignIn(tx: TenantTx, staff: StaffPrincipal, used: SecondFactorUsed | null, how?: 'firmSwitch'): Promise<void> {
  return recordAudit(tx, {
    actorUserId: staff.id,
    actorKind: 'staff',
    action: 'staff.signedIn',
    entity: 'user',
    entityId: staff.id,
    data: { secondFactor: used !== null, ...(used ? { secondFactorBy: used } : {}), ...(how ? { by: how } : {}) },
  });
}
