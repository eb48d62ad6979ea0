import type { FirmSettings, FirmSettingsUpdate } from '@layerbook/contracts';
import { eq, firms, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { conflict, notFound } from '../http/problem';
import { fileUrls } from '../files/stored-files';

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

export async function updateFirm(tx: TenantTx, actor: Actor, input: FirmSettingsUpdate, now: Date): Promise<FirmSettings> {
  const before = await getFirm(tx);
  if (input.currency !== undefined && input.currency !== before.currency) await refuseCurrencyChangeOnceBilled(tx, before.currency);
  const [updated] = await tx.db
    .update(firms)
    .set({ ...input, updatedAt: now })
    .where(eq(firms.id, tx.tenantId))
    .returning();
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

/**
 * The firm's money (its cash view, its reports) is kept in one currency: once an invoice is issued or
 * a payment recorded, the currency stays (409 naming it). Before that — a firm setting up — it may change.
 */
async function refuseCurrencyChangeOnceBilled(tx: TenantTx, currency: string): Promise<void> {
  const { rowCount } = await tx.client.query(
    `select 1 where exists (select 1 from invoices where tenant_id = $1 and status <> 'draft')
                 or exists (select 1 from payments where tenant_id = $1)`,
    [tx.tenantId],
  );
  if (!rowCount) return;
  const message = `Invoices and payments are already kept in ${currency}: the firm's currency can no longer change.`;
  throw conflict(message, [{ field: 'currency', message }]);
}
