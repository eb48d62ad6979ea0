import type { InvitationAccept, InvitationPreview } from '@layerbook/contracts';
import { and, eq, firms, invitations, memberships, users, withLookup, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';
import type { StaffPrincipal } from '../http/principal';
import { badRequest, conflict, gone, notFound } from '../http/problem';
import { recordAudit } from '../audit/record';
import { loadStaffPrincipal } from './staff-principal';
import { passwordHashOf } from './password-store';
import { passedSignIn, takeSignInAttempt } from './throttle';
import { assertAcceptablePassword, hashPassword, verifyPassword } from './passwords';
import { hashToken } from './tokens';

type InvitationRow = typeof invitations.$inferSelect;

function assertUsable(inv: InvitationRow, now: Date): void {
  if (inv.revokedAt) throw gone('This invitation was withdrawn. Ask the firm for a new one.');
  if (inv.acceptedAt) throw gone('This invitation was already used. Sign in instead.');
  if (inv.expiresAt <= now) throw gone('This invitation has expired. Ask the firm for a new one.');
}

async function findByToken(ctx: AppContext, token: string): Promise<InvitationRow> {
  const tokenHash = hashToken(token);
  const inv = await withLookup(
    ctx.pool,
    { tokenHash },
    async (tx) => (await tx.db.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)))[0],
  );
  if (!inv) throw notFound('invitation');
  return inv;
}

export async function previewInvitation(ctx: AppContext, token: string): Promise<InvitationPreview> {
  const inv = await findByToken(ctx, token);
  assertUsable(inv, ctx.now());
  const { firm, account } = await withTenant(ctx.pool, inv.tenantId, async (tx) => ({
    firm: (await tx.db.select({ name: firms.name }).from(firms))[0],
    account: (await tx.db.select({ id: users.id }).from(users).where(eq(users.email, inv.email)))[0],
  }));
  // Only the holder of the e-mailed link learns whether its own address has an account.
  return { firmName: firm?.name ?? '', email: inv.email, role: inv.role, hasAccount: account !== undefined };
}

const accountExists = () =>
  conflict('This e-mail already has a Layerbook account.', [
    { field: 'password', message: 'This e-mail already has an account: enter its current password to join.' },
  ]);

/**
 * Joins the firm: a new person sets their password here; someone who already has a Layerbook
 * account proves it is theirs with their existing password.
 */
export async function acceptInvitation(ctx: AppContext, input: InvitationAccept, address: string): Promise<StaffPrincipal> {
  const found = await findByToken(ctx, input.token);
  assertUsable(found, ctx.now());
  const existing = await withTenant(
    ctx.pool,
    found.tenantId,
    async (tx) => (await tx.db.select({ id: users.id }).from(users).where(eq(users.email, found.email)))[0],
  );
  let passwordHash: string | null = null;
  if (existing) {
    // The same throttle as sign-in: an invitation link must not become a way to guess a password.
    await takeSignInAttempt(ctx, found.email, address);
    if (!(await verifyPassword((await passwordHashOf(ctx.pool, existing.id)) ?? '', input.password))) {
      throw accountExists();
    }
    await passedSignIn(ctx, found.email, address);
  } else {
    if (!input.name) throw badRequest([{ field: 'name', message: 'Enter a name.' }]);
    const firm = await withTenant(ctx.pool, found.tenantId, async (tx) => (await tx.db.select({ name: firms.name }).from(firms))[0]);
    assertAcceptablePassword(input.password, { email: found.email, name: input.name, firmNames: firm ? [firm.name] : [] });
    passwordHash = await hashPassword(input.password);
  }
  const userId = await withTenant(ctx.pool, found.tenantId, async (tx) => {
    const inv = (await tx.db.select().from(invitations).where(eq(invitations.id, found.id)).for('update'))[0];
    if (!inv) throw notFound('invitation');
    assertUsable(inv, ctx.now());
    let id = existing?.id;
    if (!id) {
      // Another firm's invitation to the same address may make the account at this very moment: on
      // conflict nothing is written and the person is asked for that account's password (409), as if
      // it had been there before.
      const [created] = await tx.db
        .insert(users)
        .values({ email: inv.email, name: input.name!, passwordHash: passwordHash! })
        .onConflictDoNothing({ target: users.email })
        .returning({ id: users.id });
      if (!created) throw accountExists();
      id = created.id;
    }
    const already = await tx.db
      .select()
      .from(memberships)
      .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.userId, id)));
    if (already.length) throw conflict('You are already on this team. Sign in instead.');
    await tx.db.insert(memberships).values({ tenantId: tx.tenantId, userId: id, role: inv.role });
    await tx.db.update(invitations).set({ acceptedAt: ctx.now() }).where(eq(invitations.id, inv.id));
    await recordAudit(tx, {
      actorUserId: id,
      actorKind: 'staff',
      action: 'invitation.accepted',
      entity: 'invitation',
      entityId: inv.id,
      data: { role: inv.role },
    });
    return id;
  });
  const principal = await loadStaffPrincipal(ctx.pool, userId, found.tenantId);
  if (!principal) throw new Error('joined member not found');
  return principal;
}
