import type { InquiryCreate, InquiryDetail, InquiryStage, InquiryUpdate, StageMove, ActivityCreate } from '@layerbook/contracts';
import { and, eq, firms, inquiries, inquiryActivities, memberships, TenantTx, users } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { localDate } from '../firms/local-date';
import { badRequest, notFound } from '../http/problem';
import { SUMMARY_COLUMNS, SUMMARY_FROM, SummaryRow, toSummary } from './rows';

export interface Actor {
  readonly userId: string | null;
  readonly kind: 'staff' | 'client' | 'system';
}

export interface FirmClock {
  readonly timeZone: string;
  readonly currency: string;
  readonly today: string;
}

/** The clock of a signed-in staff member's firm, without a query. */
export function staffClock(staff: { timeZone: string; currency: string }, now: Date): FirmClock {
  return { timeZone: staff.timeZone, currency: staff.currency, today: localDate(staff.timeZone, now) };
}

export async function firmClock(tx: TenantTx, now: Date): Promise<FirmClock> {
  const firm = (await tx.db.select({ timeZone: firms.timeZone, currency: firms.currency }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  if (!firm) throw notFound('firm');
  return { ...firm, today: localDate(firm.timeZone, now) };
}

async function assertAssignable(tx: TenantTx, userId: string | null | undefined): Promise<void> {
  if (!userId) return;
  const found = await tx.db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.userId, userId), eq(memberships.status, 'active')));
  if (!found.length) throw badRequest([{ field: 'assigneeUserId', message: 'Choose someone on the team.' }]);
}

export async function logActivity(
  tx: TenantTx,
  actor: Actor,
  inquiryId: string,
  kind: (typeof inquiryActivities.$inferInsert)['kind'],
  body = '',
  data: Record<string, unknown> = {},
): Promise<void> {
  await tx.db.insert(inquiryActivities).values({ tenantId: tx.tenantId, inquiryId, kind, body, data, actorUserId: actor.userId });
}

export async function createInquiry(tx: TenantTx, actor: Actor, input: InquiryCreate & { consentToContact?: boolean }): Promise<string> {
  await assertAssignable(tx, input.assigneeUserId);
  const [row] = await tx.db
    .insert(inquiries)
    .values({ ...input, tenantId: tx.tenantId, consentToContact: input.consentToContact ?? false })
    .returning({ id: inquiries.id });
  await logActivity(tx, actor, row!.id, 'created', '', { source: input.source });
  return row!.id;
}

export async function getInquiry(tx: TenantTx, id: string, today: string): Promise<InquiryDetail> {
  const { rows } = await tx.client.query(`select ${SUMMARY_COLUMNS}, i.year_built, i.rooms, i.finish_idea, i.timeline, i.budget_range,
      i.consent_to_contact, i.lost_reason, i.client_id, i.site_id ${SUMMARY_FROM} where i.tenant_id = $1 and i.id = $2`, [tx.tenantId, id]);
  const r = rows[0] as (SummaryRow & Record<string, unknown>) | undefined;
  if (!r) throw notFound('inquiry');
  const activities = await tx.db
    .select({ id: inquiryActivities.id, kind: inquiryActivities.kind, body: inquiryActivities.body, data: inquiryActivities.data, actorName: users.name, createdAt: inquiryActivities.createdAt })
    .from(inquiryActivities)
    .leftJoin(users, eq(users.id, inquiryActivities.actorUserId))
    .where(and(eq(inquiryActivities.tenantId, tx.tenantId), eq(inquiryActivities.inquiryId, id)))
    .orderBy(inquiryActivities.createdAt);
  return {
    ...toSummary(r, today),
    yearBuilt: (r['year_built'] as number | null) ?? null,
    rooms: r['rooms'] as string,
    finishIdea: r['finish_idea'] as string,
    timeline: r['timeline'] as string,
    budgetRange: r['budget_range'] as string,
    consentToContact: r['consent_to_contact'] as boolean,
    lostReason: r['lost_reason'] as string,
    clientId: (r['client_id'] as string | null) ?? null,
    siteId: (r['site_id'] as string | null) ?? null,
    activities: activities.reverse().map((a) => ({ ...a, data: a.data as Record<string, unknown>, createdAt: a.createdAt.toISOString() })),
  };
}

async function current(tx: TenantTx, id: string) {
  const row = (await tx.db.select().from(inquiries).where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id))).for('update'))[0];
  if (!row) throw notFound('inquiry');
  return row;
}

export async function updateInquiry(tx: TenantTx, actor: Actor, id: string, patch: InquiryUpdate): Promise<void> {
  const before = await current(tx, id);
  if ('assigneeUserId' in patch) await assertAssignable(tx, patch.assigneeUserId);
  await tx.db.update(inquiries).set({ ...patch, updatedAt: new Date() }).where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
  if ('assigneeUserId' in patch && patch.assigneeUserId !== before.assigneeUserId) {
    const data = { from: before.assigneeUserId, to: patch.assigneeUserId ?? null };
    await logActivity(tx, actor, id, 'assignment', '', data);
    await recordAudit(tx, { actorUserId: actor.userId, actorKind: actor.kind, action: 'inquiry.reassigned', entity: 'inquiry', entityId: id, data });
  }
  if ('nextFollowUp' in patch && patch.nextFollowUp !== before.nextFollowUp) {
    await logActivity(tx, actor, id, 'follow_up', '', { from: before.nextFollowUp, to: patch.nextFollowUp ?? null });
  }
}

export async function moveStage(tx: TenantTx, actor: Actor, id: string, move: StageMove): Promise<InquiryStage> {
  const before = await current(tx, id);
  if (before.stage === move.stage) return before.stage;
  await tx.db
    .update(inquiries)
    .set({ stage: move.stage, lostReason: move.stage === 'lost' ? (move.lostReason ?? '') : '', stageChangedAt: new Date(), updatedAt: new Date() })
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
  const data = { from: before.stage, to: move.stage, ...(move.stage === 'lost' ? { lostReason: move.lostReason } : {}) };
  await logActivity(tx, actor, id, 'stage_change', move.lostReason ?? '', data);
  await recordAudit(tx, { actorUserId: actor.userId, actorKind: actor.kind, action: 'inquiry.stage_changed', entity: 'inquiry', entityId: id, data });
  return move.stage;
}

export async function addActivity(tx: TenantTx, actor: Actor, id: string, input: ActivityCreate): Promise<void> {
  await current(tx, id);
  await logActivity(tx, actor, id, input.kind, input.body);
  await tx.db.update(inquiries).set({ updatedAt: new Date() }).where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.id, id)));
}
