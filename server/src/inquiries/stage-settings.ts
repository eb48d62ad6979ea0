import { DEFAULT_STAGE_LIKELIHOOD, INQUIRY_STAGES, STAGE_LABELS } from '@layerbook/contracts';
import type { InquiryStage, ItemList, StageLikelihood } from '@layerbook/contracts';
import { eq, inquiryStageSettings, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';

/** The firm's likelihood per stage, falling back to the defaults for stages it has not set. */
export async function stageLikelihoods(tx: TenantTx): Promise<Record<InquiryStage, number>> {
  const rows = await tx.db.select().from(inquiryStageSettings).where(eq(inquiryStageSettings.tenantId, tx.tenantId));
  const result = { ...DEFAULT_STAGE_LIKELIHOOD };
  for (const row of rows) result[row.stage] = Number(row.likelihoodPercent);
  return result;
}

/** Every stage in order with its chance of ending in work, as GET/PUT /api/inquiries/stages answer. */
export async function listStageLikelihoods(tx: TenantTx): Promise<ItemList<StageLikelihood>> {
  const likelihood = await stageLikelihoods(tx);
  return { items: INQUIRY_STAGES.map((stage) => ({ stage, label: STAGE_LABELS[stage], likelihoodPercent: likelihood[stage] })) };
}

export async function saveStageLikelihoods(
  tx: TenantTx,
  actor: Actor,
  values: Readonly<Record<InquiryStage, number>>,
): Promise<ItemList<StageLikelihood>> {
  for (const stage of INQUIRY_STAGES) {
    const likelihoodPercent = values[stage].toFixed(2);
    await tx.db
      .insert(inquiryStageSettings)
      .values({ tenantId: tx.tenantId, stage, likelihoodPercent })
      .onConflictDoUpdate({ target: [inquiryStageSettings.tenantId, inquiryStageSettings.stage], set: { likelihoodPercent } });
  }
  const actorUserId = actor.kind === 'staff' ? actor.userId : null;
  await recordAudit(tx, {
    actorUserId,
    actorKind: actor.kind,
    action: 'inquiry_stages.likelihoods_changed',
    entity: 'firm',
    entityId: tx.tenantId,
    data: values,
  });
  return listStageLikelihoods(tx);
}
