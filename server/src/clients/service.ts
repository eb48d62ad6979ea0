import type {
  ClientCreate,
  ClientDetail,
  ClientListQuery,
  ClientSummary,
  ClientUpdate,
  ContactCreate,
  ContactView,
  KeysetPage,
  SiteCreate,
  SiteUpdate,
  SiteView,
} from '@layerbook/contracts';
import { and, clientContacts, clients, desc, eq, inquiries, sites, TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { firmReader } from '../i18n/reader';
import type { Actor } from '../http/actor';
import { notFound } from '../http/problem';
import { decodeCursor, encodeCursor } from '../inquiries/cursor';
import { phoneDigitsSql, phoneSearchDigits } from './phone';

type ClientRow = typeof clients.$inferSelect;
type SiteRow = typeof sites.$inferSelect;
type ContactRow = typeof clientContacts.$inferSelect;

const toSummary = (c: Pick<ClientRow, keyof ClientSummary>): ClientSummary => ({
  id: c.id,
  kind: c.kind,
  isCompany: c.isCompany,
  name: c.name,
  email: c.email,
  phone: c.phone,
  createdAt: c.createdAt.toISOString(),
});

/** Lead rules apply to target housing built before 1978 (40 CFR 745, TSCA §401(17)); unknown stays unknown. */
export const toSite = (s: SiteRow): SiteView => ({
  id: s.id,
  clientId: s.clientId,
  label: s.label,
  addressLine1: s.addressLine1,
  addressLine2: s.addressLine2,
  city: s.city,
  region: s.region,
  postalCode: s.postalCode,
  country: s.country,
  yearBuilt: s.yearBuilt,
  accessNotes: s.accessNotes,
  isPre1978: s.yearBuilt === null ? null : s.yearBuilt < 1978,
});

const toContact = (c: ContactRow): ContactView => ({ id: c.id, name: c.name, email: c.email, phone: c.phone, roleTitle: c.roleTitle });

export async function createClient(tx: TenantTx, actor: Actor, input: ClientCreate): Promise<ClientSummary> {
  const [row] = await tx.db
    .insert(clients)
    .values({ ...input, tenantId: tx.tenantId })
    .returning();
  const actorUserId = actor.kind === 'staff' ? actor.userId : null;
  await recordAudit(tx, { actorUserId, actorKind: actor.kind, action: 'client.created', entity: 'client', entityId: row.id });
  return toSummary(row);
}

export async function updateClient(tx: TenantTx, id: string, patch: ClientUpdate, now: Date): Promise<ClientSummary> {
  const [row] = await tx.db
    .update(clients)
    .set({ ...patch, updatedAt: now })
    .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, id)))
    .returning();
  if (!row) throw notFound('client');
  if (patch.email !== undefined) {
    // Portal access follows the client's address: an old or mistyped address stops seeing their
    // proposals and boards (and stops getting sign-in links) the moment the office corrects it.
    await tx.client.query(
      `update portal_users set status = 'disabled' where tenant_id = $1 and client_id = $2 and email <> $3 and status = 'active'`,
      [tx.tenantId, id, row.email],
    );
    await tx.client.query(
      `update portal_users set status = 'active' where tenant_id = $1 and client_id = $2 and email = $3 and status = 'disabled'`,
      [tx.tenantId, id, row.email],
    );
  }
  return toSummary(row);
}

/** One row of the client list query: the summary's columns plus the cursor's exact timestamp text. */
interface ClientListRow {
  id: string;
  kind: ClientRow['kind'];
  is_company: boolean;
  name: string;
  email: string;
  phone: string;
  created_at: Date;
  cursor_at: string;
}

/** Newest first, keyset over (created_at, id), so a deep page costs the same as the first. */
export async function listClients(tx: TenantTx, q: ClientListQuery): Promise<KeysetPage<ClientSummary>> {
  const values: unknown[] = [tx.tenantId];
  const where = ['tenant_id = $1'];
  const add = (v: unknown) => `$${values.push(v)}`;
  if (q.kind) where.push(`kind = ${add(q.kind)}`);
  if (q.q) {
    const like = add(`%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
    // A number as caller ID shows it finds the client however their phone was typed.
    const digits = phoneSearchDigits(q.q);
    const byDigits = digits ? ` or ${phoneDigitsSql('phone')} like ${add(`%${digits}%`)}` : '';
    where.push(`(name ilike ${like} or email ilike ${like} or phone ilike ${like}${byDigits})`);
  }
  if (q.after) {
    const c = decodeCursor(q.after, 'timestamptz');
    where.push(`(created_at, id) < (${add(c.sortValue)}::timestamptz, ${add(c.id)}::uuid)`);
  }
  const { rows } = await tx.client.query<ClientListRow>(
    `select id, kind, is_company, name, email, phone, created_at, created_at::text as cursor_at
       from clients where ${where.join(' and ')} order by created_at desc, id desc limit ${add(q.limit + 1)}`,
    values,
  );
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  return {
    items: page.map((r) =>
      toSummary({ id: r.id, kind: r.kind, isCompany: r.is_company, name: r.name, email: r.email, phone: r.phone, createdAt: r.created_at }),
    ),
    nextCursor: rows.length > q.limit && last ? encodeCursor(last.cursor_at, last.id) : null,
  };
}

export async function getClient(tx: TenantTx, id: string): Promise<ClientDetail> {
  const client = (
    await tx.db
      .select()
      .from(clients)
      .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, id)))
  )[0];
  if (!client) throw notFound('client');
  // One connection runs one query at a time, so these run in turn.
  const contacts = await tx.db
    .select()
    .from(clientContacts)
    .where(and(eq(clientContacts.tenantId, tx.tenantId), eq(clientContacts.clientId, id)))
    .orderBy(clientContacts.createdAt);
  const siteRows = await tx.db
    .select()
    .from(sites)
    .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.clientId, id)))
    .orderBy(sites.createdAt);
  const linked = await tx.db
    .select({ id: inquiries.id, contactName: inquiries.contactName, stage: inquiries.stage, createdAt: inquiries.createdAt })
    .from(inquiries)
    .where(and(eq(inquiries.tenantId, tx.tenantId), eq(inquiries.clientId, id)))
    .orderBy(desc(inquiries.createdAt));
  return {
    ...toSummary(client),
    notes: client.notes,
    language: client.language,
    contacts: contacts.map(toContact),
    sites: siteRows.map(toSite),
    inquiries: linked.map((i) => ({ ...i, createdAt: i.createdAt.toISOString() })),
  };
}

/**
 * The client exists, and stays until our new row points at it: `for key share` waits for a merge
 * that is removing it and then finds it gone (404), where a plain read would let the insert fail
 * on the foreign key (500). It does not hold up ordinary edits of the client.
 */
async function assertClient(tx: TenantTx, clientId: string): Promise<void> {
  const found = await tx.db
    .select({ id: clients.id })
    .from(clients)
    .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, clientId)))
    .for('key share');
  if (!found.length) throw notFound('client');
}

export async function addContact(tx: TenantTx, clientId: string, input: ContactCreate): Promise<ContactView> {
  await assertClient(tx, clientId);
  const [row] = await tx.db
    .insert(clientContacts)
    .values({ ...input, clientId, tenantId: tx.tenantId })
    .returning();
  return toContact(row);
}

/** A site whose country is not given is in the firm's country. */
export async function addSite(tx: TenantTx, clientId: string, input: SiteCreate): Promise<SiteView> {
  await assertClient(tx, clientId);
  const country = input.country ?? (await firmReader(tx)).country;
  const [row] = await tx.db
    .insert(sites)
    .values({ ...input, country, clientId, tenantId: tx.tenantId })
    .returning();
  return toSite(row);
}

export async function updateSite(tx: TenantTx, siteId: string, patch: SiteUpdate): Promise<SiteView> {
  const [row] = await tx.db
    .update(sites)
    .set(patch)
    .where(and(eq(sites.tenantId, tx.tenantId), eq(sites.id, siteId)))
    .returning();
  if (!row) throw notFound('site');
  return toSite(row);
}
