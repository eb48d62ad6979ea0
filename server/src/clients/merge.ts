import type { ClientDetail, ClientMatch, ClientMatchReason } from '@layerbook/contracts';
import { and, clients, eq, type TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest, notFound } from '../http/problem';
import { firmReader } from '../i18n/reader';
import { fieldsFromDuplicate, type MergedFields } from './merge-fields';
import { phoneDigits } from './phone';
import { getClient } from './service';

interface MatchRow {
  id: string;
  kind: ClientMatch['kind'];
  is_company: boolean;
  name: string;
  email: string;
  phone: string;
  created_at: Date;
  by_email: boolean;
  by_phone: boolean;
  by_name: boolean;
}

/**
 * Clients of the firm that may be the same person: the same e-mail (any case), the same phone
 * digits or the same name (any case, spaces squeezed). Blank values match nothing.
 */
export async function findClientMatches(
  tx: TenantTx,
  who: { email: string; phone: string; name: string },
  exceptId: string | null = null,
): Promise<ClientMatch[]> {
  const email = who.email.trim().toLowerCase();
  const phone = phoneDigits(who.phone);
  const name = who.name.trim().replace(/\s+/g, ' ').toLowerCase();
  if (!email && !phone && !name) return [];
  const { rows } = await tx.client.query<MatchRow>(
    `select * from (
       select id, kind, is_company, name, email, phone, created_at,
              ($2 <> '' and lower(trim(email)) = $2) as by_email,
              ($3 <> '' and regexp_replace(phone, '\\D', '', 'g') = $3) as by_phone,
              ($4 <> '' and lower(regexp_replace(trim(name), '\\s+', ' ', 'g')) = $4) as by_name
         from clients where tenant_id = $1 and ($5::uuid is null or id <> $5::uuid)
     ) c where by_email or by_phone or by_name
     order by by_email desc, by_phone desc, created_at, id limit 20`,
    [tx.tenantId, email, phone, name, exceptId],
  );
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    isCompany: r.is_company,
    name: r.name,
    email: r.email,
    phone: r.phone,
    createdAt: r.created_at.toISOString(),
    matchedOn: (['email', 'phone', 'name'] as const).filter((k) => r[`by_${k}`]) satisfies ClientMatchReason[],
  }));
}

/** Clients that may be the same as this one (the client page offers them to merge into). */
export async function matchesOfClient(tx: TenantTx, id: string): Promise<ClientMatch[]> {
  const { rows } = await tx.client.query<{ email: string; phone: string; name: string }>(
    `select email, phone, name from clients where tenant_id = $1 and id = $2`,
    [tx.tenantId, id],
  );
  const client = rows[0];
  if (!client) throw notFound('client');
  return findClientMatches(tx, client, id);
}

/**
 * Every table that points at a client, in the order they are moved (the merge spec checks the list
 * against the database's foreign keys). An issued invoice's document keeps the name it was issued to.
 */
export const CLIENT_TABLES = [
  'client_contacts',
  'sites',
  'inquiries',
  'estimates',
  'jobs',
  'sample_boards',
  'portal_users',
  'invoices',
  'payments',
  'refunds',
  'client_credits',
  'checkout_sessions',
] as const;

/**
 * Merges a duplicate into the client to keep, in the caller's transaction: contacts, sites,
 * inquiries, estimates, jobs, sample boards, portal access and the billing (invoices, payments,
 * refunds, credits, checkouts; the cash figures follow by their triggers) move to the kept client,
 * which also takes what only the duplicate knew (fieldsFromDuplicate: blank fields filled, its notes
 * added); the duplicate is deleted, and the audit log records what moved and what was taken.
 * Another firm's id answers 404.
 */
export async function mergeClient(tx: TenantTx, actor: Actor, id: string, intoClientId: string, now: Date): Promise<ClientDetail> {
  if (id === intoClientId) throw badRequest([{ field: 'intoClientId', message: 'Choose another client to keep.' }]);
  const { rows } = await tx.client.query<MergedFields & { id: string }>(
    `select id, name, email, phone, notes, language from clients where tenant_id = $1 and id = any($2::uuid[]) order by id for update`,
    [tx.tenantId, [id, intoClientId]],
  );
  const merged = rows.find((r) => r.id === id);
  const kept = rows.find((r) => r.id === intoClientId);
  if (!merged) throw notFound('client');
  if (!kept) throw notFound('client to keep');
  // Worked out before anything moves: notes too long together refuse the merge with nothing written.
  const { patch, taken } = fieldsFromDuplicate(kept, merged, (await firmReader(tx)).language);
  const moved: Record<string, number> = {};
  for (const table of CLIENT_TABLES) {
    const res = await tx.client.query(`update ${table} set client_id = $3 where tenant_id = $1 and client_id = $2`, [
      tx.tenantId,
      id,
      intoClientId,
    ]);
    moved[table] = res.rowCount ?? 0;
  }
  await tx.client.query(`delete from clients where tenant_id = $1 and id = $2`, [tx.tenantId, id]);
  if (Object.keys(patch).length > 0) {
    await tx.db
      .update(clients)
      .set({ ...patch, updatedAt: now })
      .where(and(eq(clients.tenantId, tx.tenantId), eq(clients.id, intoClientId)));
  }
  await recordAudit(tx, {
    actorUserId: actor.kind === 'staff' ? actor.userId : null,
    actorKind: actor.kind,
    action: 'client.merged',
    entity: 'client',
    entityId: intoClientId,
    data: { mergedClientId: id, mergedName: merged.name, moved, taken },
  });
  return getClient(tx, intoClientId);
}
