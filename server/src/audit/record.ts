import { auditLog, TenantTx } from '@layerbook/db';

export interface AuditEntry {
  readonly actorUserId: string | null;
  readonly actorKind: 'staff' | 'client' | 'system';
  readonly action: string;
  readonly entity: string;
  readonly entityId?: string | null;
  readonly data?: Record<string, unknown>;
}

/** Appends to the firm's audit log in the same transaction as the change it records. */
export async function recordAudit(tx: TenantTx, entry: AuditEntry): Promise<void> {
  await tx.db.insert(auditLog).values({
    tenantId: tx.tenantId,
    actorUserId: entry.actorUserId,
    actorKind: entry.actorKind,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId ?? null,
    data: entry.data ?? {},
  });
}
