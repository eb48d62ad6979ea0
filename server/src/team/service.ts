import { INVITATION_DAYS } from '@layerbook/contracts';
import type { InvitationCreate, ItemList, Language, MemberStatus, StaffRole, TeamInvitation, TeamMember } from '@layerbook/contracts';
import { and, desc, eq, firms, invitations, isNull, memberships, sql, TenantTx, users } from '@layerbook/db';
import type { AppContext } from '../context';
import { recordAudit } from '../audit/record';
import { endMemberSessions } from '../auth/password-store';
import { endSessionsIfFactorMissing, risesIntoOffice } from '../auth/second-factor/rule-sessions';
import { minutesFromNow, newToken } from '../auth/tokens';
import type { StaffPrincipal } from '../http/principal';
import { conflict, notFound } from '../http/problem';
import { enqueueMail } from '../mail/outbox';
import { invitationMail } from '../mail/templates';

type InvitationRow = typeof invitations.$inferSelect;

function invitationStatus(inv: InvitationRow, now: Date): TeamInvitation['status'] {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  return inv.expiresAt <= now ? 'expired' : 'pending';
}

const toInvitation = (inv: InvitationRow, now: Date): TeamInvitation => ({
  id: inv.id,
  email: inv.email,
  role: inv.role,
  status: invitationStatus(inv, now),
  expiresAt: inv.expiresAt.toISOString(),
  createdAt: inv.createdAt.toISOString(),
});

async function members(tx: TenantTx, you: string): Promise<TeamMember[]> {
  const rows = await tx.db
    .select({
      id: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      status: memberships.status,
      language: memberships.language,
      hasSecondFactor: sql<boolean>`exists (select 1 from user_second_factors f where f.user_id = ${users.id} and f.confirmed_at is not null)`,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.tenantId, tx.tenantId))
    .orderBy(memberships.createdAt);
  return rows.map((r) => ({ ...r, isYou: r.userId === you }));
}

/** Everyone who has joined the firm, in the order they joined; `you` marks the one asking. */
export async function listMembers(tx: TenantTx, you: string): Promise<ItemList<TeamMember>> {
  return { items: await members(tx, you) };
}

/** Invitations still worth showing: waiting for an answer, or expired unanswered (newest first, at most 100). */
export async function listInvitations(tx: TenantTx, now: Date): Promise<ItemList<TeamInvitation>> {
  const invites = await tx.db
    .select()
    .from(invitations)
    .where(eq(invitations.tenantId, tx.tenantId))
    .orderBy(desc(invitations.createdAt))
    .limit(100);
  return {
    items: invites.map((inv) => toInvitation(inv, now)).filter((inv) => inv.status === 'pending' || inv.status === 'expired'),
  };
}

export async function invite(ctx: AppContext, tx: TenantTx, actor: StaffPrincipal, input: InvitationCreate): Promise<TeamInvitation> {
  const now = ctx.now();
  const current = await members(tx, actor.id);
  if (current.some((m) => m.email === input.email)) {
    throw conflict('That person is already on the team.', [{ field: 'email', message: 'This person is already on the team.' }]);
  }
  const pending = await tx.db
    .select()
    .from(invitations)
    .where(
      and(
        eq(invitations.tenantId, tx.tenantId),
        eq(invitations.email, input.email),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    );
  if (pending.some((inv) => inv.expiresAt > now)) {
    throw conflict('That e-mail already has a pending invitation.', [
      { field: 'email', message: 'An invitation to this e-mail is already waiting. Revoke it to send a new one.' },
    ]);
  }
  const { token, hash } = newToken();
  const [inv] = await tx.db
    .insert(invitations)
    .values({
      tenantId: tx.tenantId,
      email: input.email,
      role: input.role,
      tokenHash: hash,
      invitedBy: actor.id,
      expiresAt: minutesFromNow(now, INVITATION_DAYS * 24 * 60),
    })
    .returning();
  const firm = (await tx.db.select({ name: firms.name, language: firms.language }).from(firms))[0];
  await enqueueMail(tx, ctx.queue, {
    purposeKey: `invitation:${inv.id}`,
    tenantId: tx.tenantId,
    to: input.email,
    ...invitationMail({
      firmName: firm?.name ?? '',
      inviterName: actor.name,
      role: input.role,
      url: `${ctx.config.PUBLIC_URL}/accept-invitation?token=${token}`,
      days: INVITATION_DAYS,
      language: firm?.language ?? 'en',
    }),
  });
  await recordAudit(tx, {
    actorUserId: actor.id,
    actorKind: 'staff',
    action: 'invitation.sent',
    entity: 'invitation',
    entityId: inv.id,
    data: { email: input.email, role: input.role },
  });
  return toInvitation(inv, now);
}

export async function revokeInvitation(ctx: AppContext, tx: TenantTx, actor: StaffPrincipal, id: string): Promise<void> {
  const updated = await tx.db
    .update(invitations)
    .set({ revokedAt: ctx.now() })
    .where(
      and(eq(invitations.tenantId, tx.tenantId), eq(invitations.id, id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)),
    )
    .returning({ id: invitations.id });
  if (!updated.length) throw notFound('pending invitation');
  await recordAudit(tx, { actorUserId: actor.id, actorKind: 'staff', action: 'invitation.revoked', entity: 'invitation', entityId: id });
}

/**
 * Changes a member's role or status, never leaving the firm without an active owner: the firm's
 * memberships are locked first, so two owners removing each other at once cannot both pass the
 * check. Someone deactivated, or no longer an owner, loses the invitations they sent that are still
 * open (an owner could otherwise invite another address of theirs and come back through it); someone
 * deactivated is signed out of this firm (their sessions in other firms stay), as is someone raised
 * into office or owner without the second factor the firm requires.
 */
export async function changeMember(
  tx: TenantTx,
  actor: StaffPrincipal,
  membershipId: string,
  change: { role?: StaffRole; status?: MemberStatus },
): Promise<TeamMember> {
  await tx.client.query(`select id from memberships where tenant_id = $1 order by id for update`, [tx.tenantId]);
  const all = await members(tx, actor.id);
  const target = all.find((m) => m.id === membershipId);
  if (!target) throw notFound('team member');
  const after = all.map((m) => (m.id === membershipId ? { ...m, ...change } : m));
  if (!after.some((m) => m.role === 'owner' && m.status === 'active')) {
    throw conflict(
      'The firm needs at least one active owner.',
      change.role ? [{ field: 'role', message: 'Make someone else an owner first.' }] : undefined,
    );
  }
  await tx.db
    .update(memberships)
    .set(change)
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.id, membershipId)));
  // Deactivated: signed out of this firm too, so reactivating does not bring old sessions back to life.
  if (change.status === 'deactivated') await endMemberSessions(tx.client, target.userId, tx.tenantId);
  // Raised into office or owner where the firm requires a second factor they have not set up: their
  // sessions (opened without one, as crew) end, and the next sign-in asks them to set one up.
  if (change.role && risesIntoOffice(target.role, change.role)) await endSessionsIfFactorMissing(tx, target.userId);
  const losesInviting = change.status === 'deactivated' || (change.role !== undefined && change.role !== 'owner');
  if (losesInviting) {
    await tx.db
      .update(invitations)
      .set({ revokedAt: sql`now()` })
      .where(
        and(
          eq(invitations.tenantId, tx.tenantId),
          eq(invitations.invitedBy, target.userId),
          isNull(invitations.acceptedAt),
          isNull(invitations.revokedAt),
        ),
      );
  }
  await recordAudit(tx, {
    actorUserId: actor.id,
    actorKind: 'staff',
    action: change.role ? 'member.role_changed' : `member.${change.status === 'active' ? 'reactivated' : 'deactivated'}`,
    entity: 'membership',
    entityId: membershipId,
    data: { from: { role: target.role, status: target.status }, to: change },
  });
  return { ...target, ...change };
}

/** The owner sets the language a member reads in (null = the firm's); the member may change it again themselves. */
export async function setMemberLanguage(
  tx: TenantTx,
  actor: StaffPrincipal,
  membershipId: string,
  language: Language | null,
): Promise<TeamMember> {
  const target = (await members(tx, actor.id)).find((m) => m.id === membershipId);
  if (!target) throw notFound('team member');
  const [before] = await tx.db
    .update(memberships)
    .set({ language })
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.id, membershipId)))
    .returning({ id: memberships.id });
  if (!before) throw notFound('team member');
  await recordAudit(tx, {
    actorUserId: actor.id,
    actorKind: 'staff',
    action: 'member.language_changed',
    entity: 'membership',
    entityId: membershipId,
    data: { to: language },
  });
  return { ...target, language };
}
