import type { FirmSettings } from '@layerbook/contracts';
import { eq, firms, type TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { deleteFileRows, findFile, insertImageRow, type ObjectKeys, type StoredImage } from '../files/stored-files';
import { firmRow, toSettings } from './service';

/** `files.purpose` of a firm's logo. */
export const FIRM_LOGO_PURPOSE = 'firm-logo';

/** What a logo change leaves: the profile to answer, and the old logo's objects to delete once committed. */
export interface LogoChange {
  readonly firm: FirmSettings;
  readonly discarded: ObjectKeys;
}

/**
 * The previous logo's file row goes in the same transaction; its bytes after the commit (the caller's
 * part) — unless an issued invoice printed it: an issued document never changes, so its PDF (and its
 * credit note's and receipts') keeps the logo it was issued with, and the file stays for it.
 */
async function dropLogoRow(tx: TenantTx, fileId: string | null): Promise<ObjectKeys> {
  if (!fileId) return [];
  const printed = await tx.client.query(`select 1 from invoices where tenant_id = $1 and document->'firm'->>'logoFileId' = $2 limit 1`, [
    tx.tenantId,
    fileId,
  ]);
  if (printed.rowCount) return [];
  const file = await findFile(tx, fileId).catch(() => null);
  return file ? deleteFileRows(tx, [file]) : [];
}

/**
 * Makes the stored image the firm's logo (its bytes are already in the store: storeImageThen
 * removes them again if this throws), replacing the previous one.
 */
export async function setFirmLogo(tx: TenantTx, actor: Actor, stored: StoredImage, now: Date): Promise<LogoChange> {
  const before = await firmRow(tx, true);
  const file = await insertImageRow(tx, stored, FIRM_LOGO_PURPOSE, actor.kind === 'staff' ? actor.userId : null);
  const [updated] = await tx.db.update(firms).set({ logoFileId: file.id, updatedAt: now }).where(eq(firms.id, tx.tenantId)).returning();
  const discarded = await dropLogoRow(tx, before.logoFileId);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'firm.logo_changed',
    entity: 'firm',
    entityId: tx.tenantId,
    data: { fileId: file.id, previousFileId: before.logoFileId, contentType: file.contentType, sizeBytes: file.sizeBytes },
  });
  return { firm: toSettings(updated), discarded };
}

/** Removes the logo (a firm without one prints its name alone); removing none is not an error. */
export async function removeFirmLogo(tx: TenantTx, actor: Actor, now: Date): Promise<LogoChange> {
  const before = await firmRow(tx, true);
  if (!before.logoFileId) return { firm: toSettings(before), discarded: [] };
  const [updated] = await tx.db.update(firms).set({ logoFileId: null, updatedAt: now }).where(eq(firms.id, tx.tenantId)).returning();
  const discarded = await dropLogoRow(tx, before.logoFileId);
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'firm.logo_removed',
    entity: 'firm',
    entityId: tx.tenantId,
    data: { previousFileId: before.logoFileId },
  });
  return { firm: toSettings(updated), discarded };
}
