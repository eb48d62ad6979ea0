import {
  and,
  asc,
  type Db,
  eq,
  isNull,
  memberships as membershipsTable,
  passwordResets,
  users,
  withGlobal,
  withLookup,
  withTenant,
} from '@layerbook/db';
import type { AppContext } from '../context';
import type { StaffPrincipal } from '../http/principal';
import { gone, notFound } from '../http/problem';
import { enqueueMail } from '../mail/outbox';
import { passwordResetMail } from '../mail/templates';
import { assertAcceptablePassword, hashPassword } from './passwords';
import { endStaffSessions, setPasswordHash } from './password-store';
import { memberReader } from '../i18n/reader';
import { firstActivePrincipal } from './staff-auth';
import { hashToken, minutesFromNow, newToken } from './tokens';

export const RESET_MINUTES = 30;
/** E-mailed sign-in and reset links per person an hour (common practice, no source). */
export const LINKS_PER_HOUR = 5;

/** Always succeeds from the caller's point of view, so it never reveals which e-mails have accounts. */
export async function requestPasswordReset(ctx: AppContext, email: string): Promise<void> {
  const user = await withGlobal(
    ctx.pool,
    async (tx) => (await tx.db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(eq(users.email, email)))[0],
  );
  if (!user) return;
  const memberships = await withLookup(ctx.pool, { userId: user.id }, (tx) =>
    tx.db
      .select({ tenantId: membershipsTable.tenantId })
      .from(membershipsTable)
      .where(eq(membershipsTable.userId, user.id))
      .orderBy(asc(membershipsTable.createdAt)),
  );
  const tenantId = memberships[0]?.tenantId;
  if (!tenantId) return;
  await withTenant(ctx.pool, tenantId, async (tx) => {
    // Someone asking for a stranger's address from many places must not fill that inbox: a few links
    // an hour per person, then nothing more (the answer was the same 202 before this ran).
    const recent = await tx.client.query<{ n: number }>(
      `select count(*)::int as n from password_resets where user_id = $1 and created_at > now() - interval '1 hour'`,
      [user.id],
    );
    if (recent.rows[0].n >= LINKS_PER_HOUR) return;
    // Only the newest link works: asking again voids every earlier one still open.
    await voidOpenResets(tx.db, user.id, ctx.now());
    const { token, hash } = newToken();
    const [reset] = await tx.db
      .insert(passwordResets)
      .values({ userId: user.id, tokenHash: hash, expiresAt: minutesFromNow(ctx.now(), RESET_MINUTES) })
      .returning({ id: passwordResets.id });
    const url = `${ctx.config.PUBLIC_URL}/reset-password?token=${token}`;
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `password-reset:${reset.id}`,
      tenantId,
      to: user.email,
      // In the language the person reads this firm in (their first firm's, where the link is sent from).
      ...passwordResetMail({ name: user.name, url, minutes: RESET_MINUTES, language: (await memberReader(tx, user.id)).language }),
    });
  });
}

export async function completePasswordReset(ctx: AppContext, token: string, password: string): Promise<StaffPrincipal> {
  assertAcceptablePassword(password, await resetHolder(ctx, token));
  const passwordHash = await hashPassword(password);
  const userId = await withGlobal(ctx.pool, async (tx) => {
    const reset = (
      await tx.db
        .select()
        .from(passwordResets)
        .where(eq(passwordResets.tokenHash, hashToken(token)))
        .for('update')
    )[0];
    if (!reset) throw notFound('reset link');
    if (reset.usedAt) throw gone('This reset link was already used or a newer one was sent. Ask for a new one.');
    if (reset.expiresAt <= ctx.now()) throw gone('This reset link has expired. Ask for a new one.');
    // This link and any other still open for the person: a completed reset leaves none usable.
    await voidOpenResets(tx.db, reset.userId, ctx.now());
    await setPasswordHash(tx.client, reset.userId, passwordHash);
    // Whoever held a session (perhaps the reason for the reset) is signed out everywhere.
    await endStaffSessions(tx.client, reset.userId);
    return reset.userId;
  });
  return firstActivePrincipal(ctx, userId);
}

type ResetWriter = Pick<Db, 'update'>;

/** Marks every unused reset link of a person as used (spent or voided alike). */
async function voidOpenResets(db: ResetWriter, userId: string, now: Date): Promise<void> {
  await db
    .update(passwordResets)
    .set({ usedAt: now })
    .where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt)));
}

/** Who a reset link belongs to, as the password's context words need them (nobody: the reset answers 404 next). */
async function resetHolder(ctx: AppContext, token: string): Promise<{ email: string; name: string; firmNames: string[] }> {
  const holder = await withGlobal(
    ctx.pool,
    async (tx) =>
      (
        await tx.db
          .select({ id: users.id, email: users.email, name: users.name })
          .from(passwordResets)
          .innerJoin(users, eq(users.id, passwordResets.userId))
          .where(eq(passwordResets.tokenHash, hashToken(token)))
      )[0],
  );
  if (!holder) return { email: '', name: '', firmNames: [] };
  const principal = await firstActivePrincipal(ctx, holder.id).catch(() => null);
  return { email: holder.email, name: holder.name, firmNames: principal ? [principal.firmName] : [] };
}
