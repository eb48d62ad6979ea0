import { randomUUID } from 'node:crypto';
import type { SignInRequest, SignUpRequest } from '@layerbook/contracts';
import { asc, eq, firms, memberships, pendingSignUps, users, withGlobal, withLookup, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';
import type { StaffPrincipal } from '../http/principal';
import { conflict, HttpError } from '../http/problem';
import { recordAudit } from '../audit/record';
import { isSlugTaken, slugCandidates } from '../firms/slug';
import { isUniqueViolation } from '../http/pg-errors';
import { passwordHashOf } from './password-store';
import { loadStaffPrincipal } from './staff-principal';
import { enqueueMail } from '../mail/outbox';
import { signUpConfirmMail, signUpKnownAddressMail } from '../mail/sign-up-templates';
import { hashToken, minutesFromNow, newToken } from './tokens';
import { passedSignIn, takeSignInAttempt } from './throttle';
import { assertAcceptablePassword, decoyPasswordHash, hashPassword, verifyPassword } from './passwords';

const WRONG = () => new HttpError(401, 'Sign-in failed', 'E-mail or password is not right.');
const emailTaken = () =>
  conflict('An account with this e-mail already exists.', [
    { field: 'token', message: 'An account with this e-mail already exists; sign in instead.' },
  ]);

export const SIGN_UP_HOURS = 24;

/**
 * The purpose key of the "someone tried to sign up with your address" notice: one per person per
 * clock hour (the outbox sends a purpose once), so the sign-up form cannot flood an owner's inbox.
 */
export function knownAddressNoticeKey(userId: string, now: Date): string {
  return `sign-up-known:${userId}:${now.toISOString().slice(0, 13)}`;
}

/**
 * Starts a sign-up. It answers the same whether the e-mail is new or already has an account (so
 * accounts cannot be discovered), and hashes the password either way so both take as long. A new
 * address gets a confirmation link (the firm is created only when it is followed); a known one is
 * told that someone tried (at most once an hour), and nothing is created.
 */
export async function requestSignUp(ctx: AppContext, input: SignUpRequest): Promise<void> {
  assertAcceptablePassword(input.password, { email: input.email, name: input.name, firmNames: [input.firmName] });
  const passwordHash = await hashPassword(input.password);
  const known = await withGlobal(
    ctx.pool,
    async (tx) => (await tx.db.select({ id: users.id, name: users.name }).from(users).where(eq(users.email, input.email)))[0],
  );
  if (known) return tellKnownAddress(ctx, input.email, known);
  const firmId = randomUUID();
  const { token, hash } = newToken();
  await withTenant(ctx.pool, firmId, async (tx) => {
    const [pending] = await tx.db
      .insert(pendingSignUps)
      .values({
        tokenHash: hash,
        firmId,
        email: input.email,
        name: input.name,
        firmName: input.firmName,
        passwordHash,
        expiresAt: minutesFromNow(ctx.now(), SIGN_UP_HOURS * 60),
      })
      .returning({ id: pendingSignUps.id });
    // Filed under the firm-to-be: the outbox keeps every mail under a firm id.
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `sign-up:${pending.id}`,
      tenantId: firmId,
      to: input.email,
      ...signUpConfirmMail({
        name: input.name,
        firmName: input.firmName,
        url: `${ctx.config.PUBLIC_URL}/sign-up/confirm?token=${token}`,
        hours: SIGN_UP_HOURS,
      }),
    });
  });
}

async function tellKnownAddress(ctx: AppContext, email: string, user: { id: string; name: string }): Promise<void> {
  const rows = await withLookup(ctx.pool, { userId: user.id }, (tx) =>
    tx.db
      .select({ tenantId: memberships.tenantId })
      .from(memberships)
      .where(eq(memberships.userId, user.id))
      .orderBy(asc(memberships.createdAt)),
  );
  const tenantId = rows[0]?.tenantId;
  if (!tenantId) return;
  await withTenant(ctx.pool, tenantId, (tx) =>
    enqueueMail(tx, ctx.queue, {
      purposeKey: knownAddressNoticeKey(user.id, ctx.now()),
      tenantId,
      to: email,
      ...signUpKnownAddressMail({
        name: user.name,
        signInUrl: `${ctx.config.PUBLIC_URL}/sign-in`,
        resetUrl: `${ctx.config.PUBLIC_URL}/forgot-password`,
      }),
    }),
  );
}

const linkProblem = (detail: string) => new HttpError(410, 'No longer valid', detail, [{ field: 'token', message: detail }]);

/** Follows a confirmation link: once, before it expires, it creates the firm and its owner (one transaction). */
export async function confirmSignUp(ctx: AppContext, token: string): Promise<StaffPrincipal> {
  const tokenHash = hashToken(token);
  const pending = await withGlobal(
    ctx.pool,
    async (tx) => (await tx.db.select().from(pendingSignUps).where(eq(pendingSignUps.tokenHash, tokenHash)))[0],
  );
  if (!pending) throw linkProblem('This sign-up link is not known. Start the sign-up again.');
  const userId = randomUUID();
  for (const slug of slugCandidates(pending.firmName)) {
    try {
      await createFirmWithOwner(ctx, { ...pending, firmId: pending.firmId, userId, slug, tokenHash });
      break;
    } catch (error) {
      if (isUniqueViolation(error, 'users_email_key')) throw emailTaken();
      if (!isSlugTaken(error)) throw error;
    }
  }
  const principal = await loadStaffPrincipal(ctx.pool, userId, pending.firmId);
  if (!principal) throw new Error('new owner not found');
  return principal;
}

async function createFirmWithOwner(
  ctx: AppContext,
  p: {
    firmId: string;
    userId: string;
    slug: string;
    tokenHash: string;
    email: string;
    name: string;
    firmName: string;
    passwordHash: string;
  },
): Promise<void> {
  await withTenant(ctx.pool, p.firmId, async (tx) => {
    // The link is spent in the same transaction that opens the firm: both happen, or neither.
    const [link] = await tx.db.select().from(pendingSignUps).where(eq(pendingSignUps.tokenHash, p.tokenHash)).for('update');
    if (!link || link.usedAt) throw linkProblem('This sign-up link was already used. Sign in instead.');
    if (link.expiresAt <= ctx.now()) throw linkProblem('This sign-up link has expired. Start the sign-up again.');
    await tx.db.update(pendingSignUps).set({ usedAt: ctx.now() }).where(eq(pendingSignUps.id, link.id));
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
 * locked (throttle.ts: each attempt is counted before the check, a right one given back). The hash is read through a security-definer function (password-store.ts).
 */
export async function signIn(ctx: AppContext, input: SignInRequest, address: string): Promise<StaffPrincipal> {
  await takeSignInAttempt(ctx, input.email, address);
  const user = await withGlobal(
    ctx.pool,
    async (tx) => (await tx.db.select({ id: users.id }).from(users).where(eq(users.email, input.email)))[0],
  );
  const passwordHash = user ? await passwordHashOf(ctx.pool, user.id) : null;
  if (!user || !passwordHash || !(await verifyPassword(passwordHash, input.password))) {
    if (!passwordHash) await verifyPassword(await decoyPasswordHash(), input.password);
    throw WRONG();
  }
  await passedSignIn(ctx, input.email, address);
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
