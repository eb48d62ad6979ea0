import type { Language } from '@layerbook/contracts';
import { and, clients, eq, memberships, portalUsers, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { ClientPrincipal, StaffPrincipal } from '../http/principal';
import { conflict } from '../http/problem';

/** A staff member's own reading language at this firm; null follows the firm's language. */
export async function setOwnLanguage(tx: TenantTx, staff: StaffPrincipal, language: Language | null): Promise<void> {
  await tx.db
    .update(memberships)
    .set({ language })
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.id, staff.membershipId)));
  await recordAudit(tx, {
    actorUserId: staff.id,
    actorKind: 'staff',
    action: 'member.language_changed',
    entity: 'membership',
    entityId: staff.membershipId,
    data: { from: staff.ownLanguage, to: language },
  });
}

/**
 * The client's language (portal, e-mails, PDFs) is kept on their client record, so the office sees
 * and can change the same choice; a portal sign-in not filed under a client has nowhere to keep it.
 */
export async function setClientLanguage(tx: TenantTx, client: ClientPrincipal, language: Language | null): Promise<void> {
  const [user] = await tx.db
    .select({ clientId: portalUsers.clientId })
    .from(portalUsers)
    .where(and(eq(portalUsers.tenantId, tx.tenantId), eq(portalUsers.id, client.id)));
  if (!user?.clientId) {
    throw conflict('Your firm has not filed your sign-in under a client record yet; ask them to set your language.', [
      { field: 'language', message: 'Ask the firm to set your language.' },
    ]);
  }
  const [before] = await tx.db
    .select({ language: clients.language })
    .from(clients)
    .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, user.clientId)));
  await tx.db
    .update(clients)
    .set({ language })
    .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, user.clientId)));
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'client',
    action: 'client.language_changed',
    entity: 'client',
    entityId: user.clientId,
    data: { from: before?.language ?? null, to: language, portalUserId: client.id },
  });
}
