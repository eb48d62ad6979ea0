import type { Language } from '@layerbook/contracts';
import { and, clients, eq, firms, memberships, portalUsers, sql, TenantTx } from '@layerbook/db';

/** Who reads a message or a document, and the firm's country for number and date conventions. */
export interface Reader {
  readonly language: Language;
  readonly country: string;
}

/** The firm's own language and country (for someone who is not a member or client yet). */
export async function firmReader(tx: TenantTx): Promise<Reader> {
  const [firm] = await tx.db.select({ language: firms.language, country: firms.country }).from(firms).where(eq(firms.id, tx.tenantId));
  return firm ?? { language: 'en', country: 'US' };
}

/** A client reads in their own language, else the firm's. */
export async function clientReader(tx: TenantTx, clientId: string): Promise<Reader> {
  const [row] = await tx.db
    .select({ language: sql<Language>`coalesce(${clients.language}, ${firms.language})`, country: firms.country })
    .from(clients)
    .innerJoin(firms, eq(firms.id, clients.tenantId))
    .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, clientId)));
  return row ?? firmReader(tx);
}

/** A portal sign-in reads in their client's language, else the firm's. */
export async function portalUserReader(tx: TenantTx, portalUserId: string): Promise<Reader> {
  const [row] = await tx.db
    .select({ language: sql<Language>`coalesce(${clients.language}, ${firms.language})`, country: firms.country })
    .from(portalUsers)
    .innerJoin(firms, eq(firms.id, portalUsers.tenantId))
    .leftJoin(clients, and(eq(clients.tenantId, portalUsers.tenantId), eq(clients.id, portalUsers.clientId)))
    .where(and(eq(portalUsers.tenantId, tx.tenantId), eq(portalUsers.id, portalUserId)));
  return row ?? firmReader(tx);
}

/** A staff member reads in their own choice at this firm, else the firm's. */
export async function memberReader(tx: TenantTx, userId: string): Promise<Reader> {
  const [row] = await tx.db
    .select({ language: sql<Language>`coalesce(${memberships.language}, ${firms.language})`, country: firms.country })
    .from(memberships)
    .innerJoin(firms, eq(firms.id, memberships.tenantId))
    .where(and(eq(memberships.tenantId, tx.tenantId), eq(memberships.userId, userId)));
  return row ?? firmReader(tx);
}
