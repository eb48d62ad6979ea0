import type { InquiryActivity, InquiryDetail } from '@layerbook/contracts';
import { and, desc, eq, inquiryActivities, TenantTx, users } from '@layerbook/db';
import { notFound } from '../http/problem';
import { DETAIL_COLUMNS, DetailRow, SUMMARY_COLUMNS, SUMMARY_FROM, toDetail } from './rows';

/** The log of one inquiry, newest first. */
async function activitiesOf(tx: TenantTx, inquiryId: string): Promise<InquiryActivity[]> {
  const rows = await tx.db
    .select({
      id: inquiryActivities.id,
      kind: inquiryActivities.kind,
      body: inquiryActivities.body,
      data: inquiryActivities.data,
      actorName: users.name,
      createdAt: inquiryActivities.createdAt,
    })
    .from(inquiryActivities)
    .leftJoin(users, eq(users.id, inquiryActivities.actorUserId))
    .where(and(eq(inquiryActivities.tenantId, tx.tenantId), eq(inquiryActivities.inquiryId, inquiryId)))
    .orderBy(desc(inquiryActivities.createdAt));
  return rows.map((a) => ({ ...a, data: a.data as Record<string, unknown>, createdAt: a.createdAt.toISOString() }));
}

/** One inquiry with its log; `today` (the firm's calendar day) decides what is overdue. */
export async function getInquiry(tx: TenantTx, id: string, today: string): Promise<InquiryDetail> {
  const { rows } = await tx.client.query<DetailRow>(
    `select ${SUMMARY_COLUMNS}, ${DETAIL_COLUMNS} ${SUMMARY_FROM} where i.tenant_id = $1 and i.id = $2`,
    [tx.tenantId, id],
  );
  const row = rows[0];
  if (!row) throw notFound('inquiry');
  return toDetail(row, today, await activitiesOf(tx, id));
}
