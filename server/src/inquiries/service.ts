import type { ActivityCreate, ActivityKind, InquiryCreate, InquiryStage, InquiryUpdate, StageMove } from '@layerbook/contracts';
import { and, eq, inArray, inquiries, inquiryActivities, memberships, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, notFound } from '../http/problem';

/**
 * The log and the audit name a staff member by their user id. A portal client is not a user, and
 * the public form and queue jobs are no one, so their lines carry no person (they read as the form
 * or the system).
 */
const staffUserId = (actor: Actor): string | null => (actor.kind === 'staff' ? actor.userId : null);

/** Only owner and office may be given an inquiry: crew cannot open inquiries (403), so one given to them would sit unseen. */
async function assertAssignable(tx: TenantTx, userId: string | null | undefined): Promise<void> {
  if (!userId) return;
  const found = await tx.db
    .select({ id: memberships.id })
    .from(memberships)
    .where(
      and(
        eq(memberships.tenantId, tx.tenantId),
        eq(memberships.userId, userId),
        eq(memberships.status, 'active'),
        inArray(memberships.role, ['owner', 'office']),
      ),
    );
  if (!found.length) throw badRequest([{ field: 'assigneeUserId', message: 'Choose an owner or office member of the team.' }]);
}

export async function logActivity(
  tx: TenantTx,
  actor: Actor,
  inquiryId: string,
  kind: ActivityKind,
  body = '',
  data: Record<string, unknown> = {},
): Promise<void> {
  await tx.db.insert(inquiryActivities).values({ tenantId: tx.tenantId, inquiryId, kind, body, data, actorUserId: staffUserId(actor) });
}

async function audit(tx: TenantTx, actor: Actor, action: string, inquiryId: string, data: Record<string, unknown>): Promise<void> {
  await recordAudit(tx, { actorUserId: staffUserId(actor), actorKind: actor.kind, action, entity: 'inquiry', entityId: inquiryId, data });
}

export async function createInquiry(tx: TenantTx, actor: Actor, input: InquiryCreate & { consentToContact?: boolean }): Promise<string> {
  await assertAssignable(tx, input.assigneeUserId);
  const [row] = await tx.db
    .insert(inquiries)
    .values({ ...input, tenantId: tx.tenantId, consentToContact: input.consentToContact ?? false })
    .returning({ id: inquiries.id });
  await logActivity(tx, actor, row.id, 'created', '', { source: input.source });
  return row.id;
}

/** The inquiry's row, locked for the change about to be made. */
async function lockInquiry(tx: TenantTx, id: string) {
  const row = (
    await tx.db
      .select()
      .from(inquiries)
      .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)))
      .for('update')
  )[0];
  if (!row) throw notFound('inquiry');
  return row;
}

export async function updateInquiry(tx: TenantTx, actor: Actor, id: string, patch: InquiryUpdate, now: Date): Promise<void> {
  const before = await lockInquiry(tx, id);
  // Checked only when it changes: a form sends the assignee back as it was, and one who has since
  // left the firm must not stop the office from changing the date or the value.
  const isReassigned = 'assigneeUserId' in patch && patch.assigneeUserId !== before.assigneeUserId;
  if (isReassigned) await assertAssignable(tx, patch.assigneeUserId);
  await tx.db
    .update(inquiries)
    .set({ ...patch, updatedAt: now })
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
  if (isReassigned) {
    const data = { from: before.assigneeUserId, to: patch.assigneeUserId ?? null };
    await logActivity(tx, actor, id, 'assignment', '', data);
    await audit(tx, actor, 'inquiry.reassigned', id, data);
  }
  if ('nextFollowUp' in patch && patch.nextFollowUp !== before.nextFollowUp) {
    await logActivity(tx, actor, id, 'follow_up', '', { from: before.nextFollowUp, to: patch.nextFollowUp ?? null });
  }
}

export async function moveStage(tx: TenantTx, actor: Actor, id: string, move: StageMove, now: Date): Promise<InquiryStage> {
  const before = await lockInquiry(tx, id);
  if (before.stage === move.stage) return before.stage;
  await tx.db
    .update(inquiries)
    .set({ stage: move.stage, lostReason: move.stage === 'lost' ? (move.lostReason ?? '') : '', stageChangedAt: now, updatedAt: now })
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
  const data = { from: before.stage, to: move.stage, ...(move.stage === 'lost' ? { lostReason: move.lostReason } : {}) };
  await logActivity(tx, actor, id, 'stage_change', move.lostReason ?? '', data);
  await audit(tx, actor, 'inquiry.stage_changed', id, data);
  return move.stage;
}

export async function addActivity(tx: TenantTx, actor: Actor, id: string, input: ActivityCreate, now: Date): Promise<void> {
  await lockInquiry(tx, id);
  await logActivity(tx, actor, id, input.kind, input.body);
  await tx.db
    .update(inquiries)
    .set({ updatedAt: now })
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
}
