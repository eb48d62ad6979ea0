import { randomUUID } from 'node:crypto';
import type { SignInRequest, SignUpRequest } from '@layerbook/contracts';
import { asc, eq, firms, memberships, users, withGlobal, withLookup, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';
import type { StaffPrincipal } from '../http/principal';
import { conflict, HttpError } from '../http/problem';
import { recordAudit } from '../audit/record';
import { isSlugTaken, slugCandidates } from '../firms/slug';
import { isUniqueViolation } from '../http/pg-errors';
import { loadStaffPrincipal } from './staff-principal';
import { assertAcceptablePassword, decoyPasswordHash, hashPassword, verifyPassword } from './passwords';

const WRONG = () => new HttpError(401, 'Sign-in failed', 'E-mail or password is not right.');
const LOCK_AFTER = 5;
const emailTaken = () =>
  conflict('An account with this e-mail already exists.', [
    { field: 'email', message: 'An account with this e-mail already exists; sign in instead.' },
  ]);

/** Creates a firm and its owner in one transaction, and returns the owner, signed in. */
export async function signUp(ctx: AppContext, input: SignUpRequest): Promise<StaffPrincipal> {
  assertAcceptablePassword(input.password, { email: input.email, name: input.name, firmNames: [input.firmName] });
  const passwordHash = await hashPassword(input.password);
  const firmId = randomUUID();
  const userId = randomUUID();
  for (const slug of slugCandidates(input.firmName)) {
    try {
      await createFirmWithOwner(ctx, { ...input, firmId, userId, slug, passwordHash });
      break;
    } catch (error) {
      if (isUniqueViolation(error, 'users_email_key')) throw emailTaken();
      if (!isSlugTaken(error)) throw error;
    }
  }
  const principal = await loadStaffPrincipal(ctx.pool, userId, firmId);
  if (!principal) throw new Error('new owner not found');
  return principal;
}

async function createFirmWithOwner(
  ctx: AppContext,
  p: SignUpRequest & { firmId: string; userId: string; slug: string; passwordHash: string },
): Promise<void> {
  await withTenant(ctx.pool, p.firmId, async (tx) => {
    const taken = await tx.db.select({ id: users.id }).from(users).where(eq(users.email, p.email));
    if (taken.length) {
      throw emailTaken();
    }
    await tx.db.insert(firms).values({ id: p.firmId, name: p.firmName, slug: p.slug });
    await tx.db.insert(users).values({ id: p.userId, email: p.email, name: p.name, passwordHash: p.passwordHash });
    await tx.db.insert(memberships).values({ tenantId: p.firmId, userId: p.userId, role: 'owner' });
    await recordAudit(tx, { actorUserId: p.userId, actorKind: 'staff', action: 'firm.created', entity: 'firm', entityId: p.firmId });
  });
}

/** Checks a password with per-account lockout and back-off; failures never say which part was wrong. */
export async function signIn(ctx: AppContext, input: SignInRequest): Promise<StaffPrincipal> {
  const now = ctx.now();
  const user = await withGlobal(ctx.pool, async (tx) => (await tx.db.select().from(users).where(eq(users.email, input.email)))[0]);
  if (!user) {
    await verifyPassword(await decoyPasswordHash(), input.password);
    throw WRONG();
  }
  assertNotLocked(user.lockedUntil, now);
  if (!(await verifyPassword(user.passwordHash, input.password))) {
    await countFailure(ctx, user.id, now);
    throw WRONG();
  }
  if (user.failedSignIns || user.lockedUntil) {
    await withGlobal(ctx.pool, (tx) => tx.db.update(users).set({ failedSignIns: 0, lockedUntil: null }).where(eq(users.id, user.id)));
  }
  return firstActivePrincipal(ctx, user.id);
}

/** An account locked by repeated failures answers 423 wherever its password is checked. */
export function assertNotLocked(lockedUntil: Date | null, now: Date): void {
  if (lockedUntil && lockedUntil > now) {
    const minutes = Math.ceil((lockedUntil.getTime() - now.getTime()) / 60_000);
    throw new HttpError(
      423,
      'Account locked for now',
      `Too many failed attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}, or reset your password.`,
    );
  }
}

/**
 * Counts a failed attempt in one statement, so parallel guesses each count. Back-off doubles from
 * one minute after the fifth failure, capped at an hour.
 */
export async function countFailure(ctx: AppContext, userId: string, now: Date): Promise<void> {
  await withGlobal(ctx.pool, (tx) =>
    tx.client.query(
      `update users set failed_sign_ins = failed_sign_ins + 1,
              locked_until = case when failed_sign_ins + 1 >= $2
                                  then $3::timestamptz + make_interval(mins => least(power(2, failed_sign_ins + 1 - $2)::int, 60))
                                  else locked_until end
        where id = $1`,
      [userId, LOCK_AFTER, now.toISOString()],
    ),
  );
}

/** A person may belong to several firms; they enter the one they joined first. */
export async function firstActivePrincipal(ctx: AppContext, userId: string): Promise<StaffPrincipal> {
  const rows = await withLookup(ctx.pool, { userId }, (tx) =>
    tx.db
      .select({ tenantId: memberships.tenantId, status: memberships.status })
      .from(memberships)
      .where(eq(memberships.userId, userId))
      .orderBy(asc(memberships.createdAt)),
  );
  const active = rows.find((r) => r.status === 'active');
  if (!active) throw new HttpError(403, 'No access', 'Your access to this firm has been turned off. Ask the owner.');
  const principal = await loadStaffPrincipal(ctx.pool, userId, active.tenantId);
  if (!principal) throw new HttpError(403, 'No access', 'Your access to this firm has been turned off. Ask the owner.');
  return principal;
}
