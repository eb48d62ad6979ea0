import { DEFAULT_STAGE_LIKELIHOOD, INQUIRY_STAGES, InquiryStage } from '@layerbook/contracts';
import { eq, inquiryStageSettings, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';

/** The firm's likelihood per stage, falling back to the defaults for stages it has not set. */
export async function stageLikelihoods(tx: TenantTx): Promise<Record<InquiryStage, number>> {
  const rows = await tx.db.select().from(inquiryStageSettings).where(eq(inquiryStageSettings.tenantId, tx.tenantId));
  const result = { ...DEFAULT_STAGE_LIKELIHOOD };
  for (const row of rows) result[row.stage] = Number(row.likelihoodPercent);
  return result;
}

export async function saveStageLikelihoods(tx: TenantTx, actorUserId: string, values: Record<InquiryStage, number>): Promise<Record<InquiryStage, number>> {
  for (const stage of INQUIRY_STAGES) {
    const likelihoodPercent = values[stage].toFixed(2);
    await tx.db
      .insert(inquiryStageSettings)
      .values({ tenantId: tx.tenantId, stage, likelihoodPercent })
      .onConflictDoUpdate({ target: [inquiryStageSettings.tenantId, inquiryStageSettings.stage], set: { likelihoodPercent } });
  }
  await recordAudit(tx, { actorUserId, actorKind: 'staff', action: 'inquiry_stages.likelihoods_changed', entity: 'firm', entityId: tx.tenantId, data: values });
  return stageLikelihoods(tx);
}
