import type {
  PortalChangeOrderLink,
  PortalProposal,
  PortalProposalSummary,
  ProposalSnapshot,
  ProposalVersionStatus,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { localDate } from '../firms/local-date';
import type { ClientPrincipal } from '../http/principal';
import { notFound } from '../http/problem';
import type { WordsReader } from '../billing/invoice-words';
import { localeOf } from '../i18n/catalog';
import type { VersionRow } from './proposal-versions';
import { snapshotForReader } from './snapshot-words';

/**
 * What a signed-in client may read: versions that were sent (never drafts) of estimates for the
 * client their portal account belongs to. Anything else is "not found", never "forbidden".
 */
export async function clientIdOf(tx: TenantTx, client: ClientPrincipal): Promise<string | null> {
  const { rows } = await tx.client.query<{ client_id: string | null }>(
    `select client_id from portal_users where tenant_id = $1 and id = $2`,
    [tx.tenantId, client.id],
  );
  return rows[0]?.client_id ?? null;
}

export async function firmToday(tx: TenantTx, now: Date): Promise<string> {
  const { rows } = await tx.client.query<{ time_zone: string }>(`select time_zone from firms where id = $1`, [tx.tenantId]);
  return localDate(rows[0].time_zone, now);
}

export interface ClientVersionRow extends Omit<VersionRow, 'created_at'> {
  /** the highest version number sent for the same estimate */
  newest_sent: number;
  client_id: string;
  site_id: string;
  inquiry_id: string | null;
  /** the firm's time zone: the client reads the signing time in it, as on the signed copy */
  time_zone: string;
}

/** One readable version for this client, optionally locked for a decision; 404 otherwise. */
export async function loadClientVersion(tx: TenantTx, client: ClientPrincipal, id: string, lock = false): Promise<ClientVersionRow> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) throw notFound('proposal');
  const { rows } = await tx.client.query<ClientVersionRow>(
    `select v.id, v.estimate_id, v.version, v.status, v.snapshot, v.snapshot_hash, v.expires_on::text as expires_on, v.sent_at, v.decided_at,
            v.accepted_variant_id, v.accepted_add_on_ids, v.signed_name, v.client_comment, e.client_id, e.site_id, e.inquiry_id,
            (select max(o.version) from proposal_versions o where o.tenant_id = v.tenant_id and o.estimate_id = v.estimate_id and o.sent_at is not null)::int as newest_sent,
            (select f.time_zone from firms f where f.id = v.tenant_id) as time_zone
       from proposal_versions v join estimates e on e.tenant_id = v.tenant_id and e.id = v.estimate_id
      where v.tenant_id = $1 and v.id = $2 and v.sent_at is not null and e.client_id = $3
      ${lock ? 'for update of v, e' : ''}`,
    [tx.tenantId, id, clientId],
  );
  if (!rows[0]) throw notFound('proposal');
  return rows[0];
}

export const isLatest = (row: ClientVersionRow): boolean => row.status !== 'superseded' && row.version >= row.newest_sent;

export function toPortalProposal(row: ClientVersionRow, today: string, reader?: WordsReader): PortalProposal {
  return {
    id: row.id,
    version: row.version,
    status: row.status,
    expiresOn: row.expires_on,
    isExpired: row.expires_on < today,
    isLatest: isLatest(row),
    snapshot: reader ? snapshotForReader(reader, row.snapshot) : row.snapshot,
    decidedAt: row.decided_at?.toISOString() ?? null,
    timeZone: row.time_zone,
    acceptedVariantId: row.accepted_variant_id,
    acceptedAddOnIds: row.accepted_add_on_ids,
    signedName: row.signed_name,
    clientComment: row.client_comment,
  };
}

/** How a signed-in client reads a proposal's words: their language, money and dates for it in the firm's country. */
export const clientWords = (client: ClientPrincipal): WordsReader => ({
  language: client.language,
  locale: localeOf(client.language, client.country),
});

export async function getClientProposal(tx: TenantTx, client: ClientPrincipal, id: string, now: Date): Promise<PortalProposal> {
  const row = await loadClientVersion(tx, client, id);
  return toPortalProposal(row, await firmToday(tx, now), clientWords(client));
}

/** Each estimate of this client that has a sent proposal, with its newest sent version. */
export async function listClientProposals(tx: TenantTx, client: ClientPrincipal, now: Date): Promise<PortalProposalSummary[]> {
  const clientId = await clientIdOf(tx, client);
  if (!clientId) return [];
  const { rows } = await tx.client.query<{
    estimate_id: string;
    title: string;
    site: ProposalSnapshot['site'];
    id: string;
    version: number;
    status: ProposalVersionStatus;
    expires_on: string;
    sent_at: Date | null;
  }>(
    `select distinct on (e.id) e.id as estimate_id, v.snapshot->>'title' as title, v.snapshot->'site' as site, v.id, v.version, v.status, v.expires_on::text as expires_on, v.sent_at, e.created_at
       from estimates e join proposal_versions v on v.tenant_id = e.tenant_id and v.estimate_id = e.id and v.sent_at is not null
      where e.tenant_id = $1 and e.client_id = $2
      order by e.id, v.version desc`,
    [tx.tenantId, clientId],
  );
  const changeOrders = await clientChangeOrders(tx, clientId);
  const today = await firmToday(tx, now);
  return rows
    .sort((a, b) => (b.sent_at?.getTime() ?? 0) - (a.sent_at?.getTime() ?? 0))
    .map((r) => ({
      estimateId: r.estimate_id,
      title: r.title,
      siteAddress: r.site.addressLines.join(', '),
      latest: {
        id: r.id,
        version: r.version,
        status: r.status,
        expiresOn: r.expires_on,
        isExpired: r.expires_on < today,
        sentAt: r.sent_at?.toISOString() ?? null,
      },
      changeOrders: changeOrders.get(r.estimate_id) ?? [],
    }));
}

/** The change orders sent on the client's jobs, by the estimate each job came from. */
async function clientChangeOrders(tx: TenantTx, clientId: string): Promise<Map<string, PortalChangeOrderLink[]>> {
  const { rows } = await tx.client.query<PortalChangeOrderLink & { estimate_id: string }>(
    `select j.estimate_id, c.id, c.number, c.title, c.status, c.amount::text as amount, j.currency
       from change_orders c join jobs j on j.tenant_id = c.tenant_id and j.id = c.job_id
      where c.tenant_id = $1 and j.client_id = $2 and c.status <> 'draft'
      order by c.status = 'sent' desc, c.number`,
    [tx.tenantId, clientId],
  );
  const byEstimate = new Map<string, PortalChangeOrderLink[]>();
  for (const { estimate_id, ...link } of rows) byEstimate.set(estimate_id, [...(byEstimate.get(estimate_id) ?? []), link]);
  return byEstimate;
}
