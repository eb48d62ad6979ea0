import { defaultEstimatingSettings, type EstimatingSettings, type EstimatingSettingsView } from '@layerbook/contracts';
import { eq, firmEstimatingSettings, firms, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { decimalsMessage, fitsCurrency } from '../billing/money';
import type { Actor } from '../http/actor';
import { badRequest } from '../http/problem';

export async function getEstimatingSettings(tx: TenantTx): Promise<EstimatingSettingsView> {
  const firm = (await tx.db.select({ units: firms.units, currency: firms.currency }).from(firms).where(eq(firms.id, tx.tenantId)))[0];
  const row = (await tx.db.select().from(firmEstimatingSettings).where(eq(firmEstimatingSettings.tenantId, tx.tenantId)))[0];
  return {
    // The column holds what estimatingSettings parsed when it was saved.
    settings: row ? (row.settings as EstimatingSettings) : defaultEstimatingSettings(firm.units),
    isDefault: !row,
    lengthUnit: firm.units === 'metric' ? 'm' : 'ft',
    currency: firm.currency,
  };
}

/** The settings' money amounts with their field names (a minimum charge or rounding step left out is none). */
export function estimatingAmounts(settings: EstimatingSettings): Array<{ field: string; label: string; amount: string }> {
  const amounts = [
    { field: 'labourRate', label: 'The labour rate', amount: settings.labourRate },
    { field: 'minimumCharge', label: 'The minimum charge', amount: settings.minimumCharge },
    {
      field: 'rounding.increment',
      label: 'The rounding step',
      amount: settings.rounding.kind === 'nearest' ? settings.rounding.increment : null,
    },
  ];
  return amounts.filter((a): a is { field: string; label: string; amount: string } => a.amount !== null);
}

export async function saveEstimatingSettings(
  tx: TenantTx,
  actor: Actor,
  settings: EstimatingSettings,
  now: Date,
): Promise<EstimatingSettingsView> {
  // Money finer than the firm's currency would be rounded away quietly in every price (yen have no cents).
  // The firm's row is share-locked so a currency change waits for this save and then checks what it stored.
  const { currency } = (await tx.db.select({ currency: firms.currency }).from(firms).where(eq(firms.id, tx.tenantId)).for('share'))[0];
  const tooFine = estimatingAmounts(settings).filter((a) => !fitsCurrency(a.amount, currency));
  if (tooFine.length) throw badRequest(tooFine.map((a) => ({ field: a.field, message: decimalsMessage(currency) })));
  await tx.db
    .insert(firmEstimatingSettings)
    .values({ tenantId: tx.tenantId, settings })
    .onConflictDoUpdate({ target: firmEstimatingSettings.tenantId, set: { settings, updatedAt: now } });
  // Prices follow from these numbers, so every change is kept (QUALITY.md: audit money rules).
  const actorUserId = actor.kind === 'staff' ? actor.userId : null;
  await recordAudit(tx, {
    actorUserId,
    actorKind: actor.kind,
    action: 'firm.estimating_settings_changed',
    entity: 'firm',
    entityId: tx.tenantId,
    data: { settings },
  });
  return getEstimatingSettings(tx);
}
