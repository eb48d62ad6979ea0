import { defaultEstimatingSettings, EstimatingSettings } from '@layerbook/contracts';
import { eq, firmEstimatingSettings, firms, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';

export interface EstimatingSettingsView {
  readonly settings: EstimatingSettings;
  /** true until the owner saves the firm's own values */
  readonly isDefault: boolean;
  readonly lengthUnit: 'ft' | 'm';
  readonly currency: string;
}

export async function getEstimatingSettings(tx: TenantTx): Promise<EstimatingSettingsView> {
  const firm = (await tx.db.select({ units: firms.units, currency: firms.currency }).from(firms).where(eq(firms.id, tx.tenantId)))[0]!;
  const row = (await tx.db.select().from(firmEstimatingSettings).where(eq(firmEstimatingSettings.tenantId, tx.tenantId)))[0];
  return {
    settings: row ? (row.settings as EstimatingSettings) : defaultEstimatingSettings(firm.units),
    isDefault: !row,
    lengthUnit: firm.units === 'metric' ? 'm' : 'ft',
    currency: firm.currency,
  };
}

export async function saveEstimatingSettings(tx: TenantTx, actorUserId: string, settings: EstimatingSettings): Promise<EstimatingSettingsView> {
  await tx.db
    .insert(firmEstimatingSettings)
    .values({ tenantId: tx.tenantId, settings })
    .onConflictDoUpdate({ target: firmEstimatingSettings.tenantId, set: { settings, updatedAt: new Date() } });
  // Prices follow from these numbers, so every change is kept (QUALITY.md: audit money rules).
  await recordAudit(tx, { actorUserId, actorKind: 'staff', action: 'firm.estimating_settings_changed', entity: 'firm', entityId: tx.tenantId, data: { settings } });
  return getEstimatingSettings(tx);
}
