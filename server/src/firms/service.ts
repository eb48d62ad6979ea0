import type { EstimatingSettings, FirmSettings, FirmSettingsUpdate, UnitSystem } from '@layerbook/contracts';
import { convertArea, convertLength } from '@layerbook/domain';
import { eq, firmEstimatingSettings, firms, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';
import { fileUrls } from '../files/stored-files';
import { checkCurrencyChange } from './currency-change';

export type FirmRow = typeof firms.$inferSelect;

export const toSettings = (f: FirmRow): FirmSettings => ({
  id: f.id,
  slug: f.slug,
  name: f.name,
  addressLine1: f.addressLine1,
  addressLine2: f.addressLine2,
  city: f.city,
  region: f.region,
  postalCode: f.postalCode,
  country: f.country,
  phone: f.phone,
  taxId: f.taxId,
  logoUrl: f.logoFileId ? fileUrls(f.logoFileId).downloadUrl : null,
  timeZone: f.timeZone,
  currency: f.currency,
  units: f.units,
  language: f.language,
  updatedAt: f.updatedAt.toISOString(),
});

export async function getFirm(tx: TenantTx): Promise<FirmSettings> {
  return toSettings(await firmRow(tx));
}

export async function firmRow(tx: TenantTx, lock = false): Promise<FirmRow> {
  const query = tx.db.select().from(firms).where(eq(firms.id, tx.tenantId));
  const firm = (await (lock ? query.for('update') : query))[0];
  if (!firm) throw notFound('firm');
  return firm;
}

/**
 * The firm's saved estimating settings hold three measures in its units: the height above which
 * scaffold is priced, the reach from the floor, and the smallest opening deducted. When the units
 * change they are converted (1 ft = 0.3048 m exactly, NIST SP 811 B.8), so they stay the same size
 * instead of 12 ft becoming 12 m. Rounded to 4 decimals: a tenth of a millimetre.
 */
async function convertEstimatingMeasures(tx: TenantTx, from: UnitSystem, to: UnitSystem): Promise<void> {
  const row = (await tx.db.select().from(firmEstimatingSettings).where(eq(firmEstimatingSettings.tenantId, tx.tenantId)).for('update'))[0];
  if (!row) return;
  const settings = row.settings as EstimatingSettings;
  const [a, b] = [from === 'metric' ? 'm' : 'ft', to === 'metric' ? 'm' : 'ft'] as const;
  const round = (n: number) => Math.round(n * 10_000) / 10_000;
  const converted: EstimatingSettings = {
    ...settings,
    scaffoldHeight: round(convertLength(settings.scaffoldHeight, a, b)),
    workingReach: round(convertLength(settings.workingReach, a, b)),
    minDeductedOpeningArea: round(convertArea(settings.minDeductedOpeningArea, a, b)),
  };
  await tx.db.update(firmEstimatingSettings).set({ settings: converted }).where(eq(firmEstimatingSettings.tenantId, tx.tenantId));
}

export async function updateFirm(tx: TenantTx, actor: Actor, input: FirmSettingsUpdate, now: Date): Promise<FirmSettings> {
  // Locked before the units and currency are compared: two saves at once (a double-clicked Save)
  // would both see the old units and convert the estimating measures twice.
  const before = toSettings(await firmRow(tx, true));
  if (input.currency !== undefined && input.currency !== before.currency) await checkCurrencyChange(tx, before.currency, input.currency);
  const [updated] = await tx.db
    .update(firms)
    .set({ ...input, updatedAt: now })
    .where(eq(firms.id, tx.tenantId))
    .returning();
  if (input.units !== undefined && input.units !== before.units) await convertEstimatingMeasures(tx, before.units, input.units);
  const changed = (Object.keys(input) as (keyof FirmSettingsUpdate)[]).filter((k) => before[k] !== input[k]);
  if (changed.length) {
    const actorUserId = actor.kind === 'staff' ? actor.userId : null;
    await recordAudit(tx, {
      actorUserId,
      actorKind: actor.kind,
      action: 'firm.settings_changed',
      entity: 'firm',
      entityId: tx.tenantId,
      data: { changed },
    });
  }
  return toSettings(updated);
}
