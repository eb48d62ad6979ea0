import { AUDIT_KIND_RULES, AUDIT_KINDS, auditKindOf, type AuditEntry, type AuditListQuery, type AuditPage } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { decodeCursor, encodeCursor } from '../inquiries/cursor';
import { auditLink, auditSummary, type AuditData } from './summary';

/** Every exact name of every kind: a prefix never claims one of these for its own kind. */
const ALL_EXACT = AUDIT_KINDS.flatMap((kind) => AUDIT_KIND_RULES[kind].exact);

interface AuditRow {
  id: string;
  at: string;
  cursor_at: string;
  actor_kind: AuditEntry['actor']['kind'];
  actor_id: string | null;
  actor_name: string | null;
  actor_email: string | null;
  action: string;
  entity: string;
  entity_id: string | null;
  data: AuditData;
}

/** A LIKE pattern matching names that start with `prefix` ('_' and '%' taken literally; backslash is LIKE's escape). */
const likePrefix = (prefix: string) => `${prefix.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

const PORTAL_USER_OF_DATA = `case when a.data->>'portalUserId' ~ '^[0-9a-fA-F-]{36}$' then (a.data->>'portalUserId')::uuid end`;

/**
 * The firm's log, newest first, keyset over (created_at, id): one statement. Filters are ANDed;
 * days are the firm's calendar days (its time zone, from `firms`). Without a record the walk reads
 * `audit_log_tenant_created_idx` backwards; with one, `audit_log_entity_idx`.
 */
export async function listAudit(tx: TenantTx, q: AuditListQuery): Promise<AuditPage> {
  const values: unknown[] = [tx.tenantId];
  const add = (v: unknown) => `$${values.push(v)}`;
  const where: string[] = [];
  if (q.person) where.push(`a.actor_user_id = ${add(q.person)}::uuid`);
  if (q.record) where.push(`a.entity_id = ${add(q.record)}::uuid`);
  if (q.action) where.push(`a.action = ${add(q.action)}`);
  if (q.kind) {
    const rule = AUDIT_KIND_RULES[q.kind];
    // LIKE ANY over escaped prefixes is evaluated in the row filter itself (a subquery per row read twice as slow).
    where.push(
      `(a.action = any(${add(rule.exact)}::text[]) or (a.action <> all(${add(ALL_EXACT)}::text[])
        and a.action like any(${add(rule.prefixes.map(likePrefix))}::text[])))`,
    );
  }
  if (q.from) where.push(`a.created_at >= (${add(q.from)}::date::timestamp at time zone (select tz from firm))`);
  if (q.to) where.push(`a.created_at < ((${add(q.to)}::date + 1)::timestamp at time zone (select tz from firm))`);
  if (q.after) {
    const cursor = decodeCursor(q.after, 'timestamptz');
    where.push(`(a.created_at, a.id) < (${add(cursor.sortValue)}::timestamptz, ${add(cursor.id)}::uuid)`);
  }
  const { rows } = await tx.client.query<AuditRow>(
    `with firm as (select time_zone as tz from firms where id = $1),
     page as (
       select a.* from audit_log a
        where a.tenant_id = $1 ${where.map((w) => `and ${w}`).join(' ')}
        order by a.created_at desc, a.id desc limit ${add(q.limit + 1)})
     select a.id, to_char(a.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as at, a.created_at::text as cursor_at,
            a.actor_kind, coalesce(u.id, pu.id, a.actor_user_id) as actor_id,
            coalesce(u.name, pu.name) as actor_name, coalesce(u.email, pu.email) as actor_email,
            a.action, a.entity, a.entity_id, a.data
       from page a
       left join users u on a.actor_kind = 'staff' and u.id = a.actor_user_id
       left join portal_users pu on a.actor_kind = 'client' and pu.tenant_id = $1
             and pu.id = coalesce(a.actor_user_id, ${PORTAL_USER_OF_DATA})
      order by a.created_at desc, a.id desc`,
    values,
  );
  const page = rows.slice(0, q.limit);
  const last = page.at(-1);
  return {
    items: page.map(toEntry),
    nextCursor: rows.length > q.limit && last ? encodeCursor(last.cursor_at, last.id) : null,
  };
}

function toEntry(r: AuditRow): AuditEntry {
  return {
    id: r.id,
    at: r.at,
    actor: { kind: r.actor_kind, id: r.actor_id, name: r.actor_name, email: r.actor_email },
    action: r.action,
    kind: auditKindOf(r.action),
    entity: r.entity,
    entityId: r.entity_id,
    summary: auditSummary(r.action, r.data),
    link: auditLink(r.entity, r.entity_id, r.data),
  };
}
