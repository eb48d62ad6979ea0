import { randomUUID } from 'node:crypto';
import type { SignInRequest, SignUpRequest } from '@layerbook/contracts';
import { asc, eq, firms, memberships, users, withGlobal, withLookup, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';
import type { StaffPrincipal } from '../http/principal';
import { conflict, HttpError } from '../http/problem';
import { recordAudit } from '../audit/record';
import { isSlugTaken, slugCandidates } from '../firms/slug';
import { isUniqueViolation } from '../http/pg-errors';
import { passwordHashOf } from './password-store';
import { loadStaffPrincipal } from './staff-principal';
import { assertNotThrottled, clearFailedSignIns, countFailedSignIn } from './throttle';
import { assertAcceptablePassword, decoyPasswordHash, hashPassword, verifyPassword } from './passwords';

const WRONG = () => new HttpError(401, 'Sign-in failed', 'E-mail or password is not right.');
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

/**
 * Checks a password. Every failure answers the same 401 (an unknown e-mail is verified against a
 * decoy hash, so it takes as long); repeated failures are throttled per e-mail and address, never
 * locked (throttle.ts). The hash is read through a security-definer function (password-store.ts).
 */
export async function signIn(ctx: AppContext, input: SignInRequest, address: string): Promise<StaffPrincipal> {
  await assertNotThrottled(ctx, input.email, address);
  const user = await withGlobal(
    ctx.pool,
    async (tx) => (await tx.db.select({ id: users.id }).from(users).where(eq(users.email, input.email)))[0],
  );
  const passwordHash = user ? await passwordHashOf(ctx.pool, user.id) : null;
  if (!user || !passwordHash || !(await verifyPassword(passwordHash, input.password))) {
    if (!passwordHash) await verifyPassword(await decoyPasswordHash(), input.password);
    await countFailedSignIn(ctx, input.email, address);
    throw WRONG();
  }
  await clearFailedSignIns(ctx, input.email, address);
  return firstActivePrincipal(ctx, user.id);
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
