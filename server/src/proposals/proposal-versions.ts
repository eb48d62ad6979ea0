import { loadLibrary } from '../jobs/sheet/load-sheet';
import {
  DEFAULT_PROPOSAL_TERMS,
  type ItemList,
  type ProposalCreate,
  type ProposalSnapshot,
  type ProposalTerms,
  type ProposalUpdate,
  type ProposalVersionStatus,
  type ProposalVersionSummary,
  type ProposalVersionView,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { type DepositCapRule, DomainInputError } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import { toDepositCapRule } from '../billing/settings';
import { localDate } from '../firms/local-date';
import { badRequest, conflict, notFound } from '../http/problem';
import { ACCEPTED_ESTIMATE_IS_READ_ONLY, assertEstimateOpen } from './estimates';
import { refuseNumbersChangedSinceSaved } from './estimate-freshness';
import { buildSnapshot, type ProposalChoice } from './build-snapshot';
import { loadProposalSources, type ProposalSources } from './proposal-sources';
import { snapshotHash } from './snapshot-hash';

/**
 * The firm's limit on deposits, as it chose it in its billing settings for its jurisdiction
 * (e.g. California's lesser of $1,000 or 10 %; "none" is a choice). Every schedule passes through here.
 */
export function depositCapRule(sources: ProposalSources): DepositCapRule {
  return toDepositCapRule(sources.depositCap);
}

const COLUMNS = `id, estimate_id, version, status, snapshot, snapshot_hash, expires_on::text as expires_on, sent_at, decided_at,
  accepted_variant_id, accepted_add_on_ids, signed_name, client_comment, created_at`;

/** The columns COLUMNS selects, as PostgreSQL hands them over (the client's reads add to it). */
export interface VersionRow {
  id: string;
  estimate_id: string;
  version: number;
  status: ProposalVersionStatus;
  snapshot: ProposalSnapshot;
  snapshot_hash: string;
  expires_on: string;
  sent_at: Date | null;
  decided_at: Date | null;
  accepted_variant_id: string | null;
  accepted_add_on_ids: string[];
  signed_name: string | null;
  client_comment: string;
  created_at: Date;
}

function summary(r: VersionRow): ProposalVersionSummary {
  return {
    id: r.id,
    estimateId: r.estimate_id,
    version: r.version,
    status: r.status,
    title: r.snapshot.title,
    snapshotHash: r.snapshot_hash,
    expiresOn: r.expires_on,
    sentAt: r.sent_at?.toISOString() ?? null,
    decidedAt: r.decided_at?.toISOString() ?? null,
    createdAt: r.created_at.toISOString(),
  };
}

const view = (r: VersionRow): ProposalVersionView => ({
  ...summary(r),
  snapshot: r.snapshot,
  acceptedVariantId: r.accepted_variant_id,
  acceptedAddOnIds: r.accepted_add_on_ids,
  signedName: r.signed_name,
  clientComment: r.client_comment,
});

export async function getVersion(tx: TenantTx, id: string, lock = false): Promise<ProposalVersionView> {
  const { rows } = await tx.client.query<VersionRow>(
    `select ${COLUMNS} from proposal_versions where tenant_id = $1 and id = $2 ${lock ? 'for update' : ''}`,
    [tx.tenantId, id],
  );
  if (!rows[0]) throw notFound('proposal');
  return view(rows[0]);
}

export async function listVersions(tx: TenantTx, estimateId?: string): Promise<ItemList<ProposalVersionSummary>> {
  const { rows } = await tx.client.query<VersionRow>(
    `select ${COLUMNS} from proposal_versions where tenant_id = $1 ${estimateId ? 'and estimate_id = $2 order by version desc' : 'order by created_at desc'} limit 200`,
    estimateId ? [tx.tenantId, estimateId] : [tx.tenantId],
  );
  return { items: rows.map(summary) };
}

/** The offer must stand past today in the firm's calendar (and not for more than a year). */
function checkExpiry(expiresOn: string, today: string): void {
  if (expiresOn <= today) throw badRequest([{ field: 'expiresOn', message: `Choose a day after today (${today}).` }]);
  const yearOn = `${Number(today.slice(0, 4)) + 1}${today.slice(4)}`;
  if (expiresOn > yearOn) throw badRequest([{ field: 'expiresOn', message: 'Choose a day within a year.' }]);
}

function mergeTerms(base: ProposalTerms, change: Partial<ProposalTerms> | undefined): ProposalTerms {
  const terms = { ...base, ...change };
  if (terms.depositPercent + terms.progressPercent > 100) {
    throw badRequest([
      {
        field: 'terms.progressPercent',
        message: `The deposit and the progress payment add up to more than 100 % (${terms.depositPercent + terms.progressPercent} %).`,
      },
    ]);
  }
  return terms;
}

/** Builds the snapshot; an engine refusal of the payment lines is a 400 naming its field. */
function snapshotFor(sources: ProposalSources, choice: Omit<ProposalChoice, 'depositCap'>): { snapshot: ProposalSnapshot; hash: string } {
  try {
    const snapshot = buildSnapshot(sources, { ...choice, depositCap: depositCapRule(sources) });
    return { snapshot, hash: snapshotHash(snapshot) };
  } catch (error) {
    if (error instanceof DomainInputError)
      throw badRequest([{ field: error.field, message: error.message }], `The payment schedule cannot be made: ${error.message}`);
    throw error;
  }
}

/**
 * Version N+1 of the proposal for an estimate, as a draft made from its saved numbers. Older
 * drafts are superseded: only the newest draft can be sent. An accepted proposal takes no new version.
 */
export async function createVersion(tx: TenantTx, actorUserId: string, input: ProposalCreate, now: Date): Promise<ProposalVersionView> {
  const sources = await loadProposalSources(tx, input.estimateId);
  const today = localDate(sources.firm.timeZone, now);
  checkExpiry(input.expiresOn, today);
  const accepted = await tx.client.query(
    `select 1 from proposal_versions where tenant_id = $1 and estimate_id = $2 and status = 'accepted'`,
    [tx.tenantId, input.estimateId],
  );
  if (accepted.rowCount) throw conflict(ACCEPTED_ESTIMATE_IS_READ_ONLY);
  await refuseLibraryChangedSincePriced(tx, input.estimateId);
  await refuseNumbersChangedSinceSaved(tx, input.estimateId);
  const terms = mergeTerms(DEFAULT_PROPOSAL_TERMS, input.terms);
  const { snapshot, hash } = snapshotFor(sources, {
    issuedOn: today,
    expiresOn: input.expiresOn,
    terms,
    exclusions: input.exclusions ?? [],
    // the estimate's notes for the client, unless the office wrote the proposal's own; internal notes never
    notes: input.notes ?? sources.estimate.clientNotes,
  });
  await tx.client.query(
    `update proposal_versions set status = 'superseded' where tenant_id = $1 and estimate_id = $2 and status = 'draft'`,
    [tx.tenantId, input.estimateId],
  );
  const { rows } = await tx.client.query<{ id: string; version: number }>(
    `insert into proposal_versions (tenant_id, estimate_id, version, status, snapshot, snapshot_hash, expires_on, created_by, result)
     select $1, $2, coalesce(max(version), 0) + 1, 'draft', $3, $4, $5, $6,
            (select e.result from estimates e where e.tenant_id = $1 and e.id = $2)
       from proposal_versions where tenant_id = $1 and estimate_id = $2
     returning id, version`,
    [tx.tenantId, input.estimateId, JSON.stringify(snapshot), hash, input.expiresOn, actorUserId],
  );
  const made = rows[0];
  await keepLibrary(tx, made.id);
  await recordAudit(tx, {
    actorUserId,
    actorKind: 'staff',
    action: 'proposal.created',
    entity: 'proposal_version',
    entityId: made.id,
    data: { estimateId: input.estimateId, version: made.version, snapshotHash: hash },
  });
  return getVersion(tx, made.id);
}

/**
 * The rows the estimate's saved result names, share-locked (products before the finish systems naming
 * them, the order every library writer takes) so none changes between this check and keepLibrary,
 * each with whether it was edited since the estimate was priced. Only edits count: the database
 * stamps a new row with its own clock, the server stamps edits and saves with its own, and a row the
 * saved result names existed when it was saved.
 */
const NAMED_BY_RESULT = (table: 'products' | 'finish_systems', path: string) =>
  `select r.name, r.updated_at > e.computed_at and r.updated_at <> r.created_at as is_changed
     from ${table} r, estimates e
    where r.tenant_id = $1 and e.tenant_id = $1 and e.id = $2
      and r.id::text in (select jsonb_path_query(e.result, '${path}') #>> '{}')
    order by r.name, r.id
      for share of r`;
const PRODUCTS_NAMED = NAMED_BY_RESULT('products', '$.variants[*].result.products[*].productId');
const SYSTEMS_NAMED = NAMED_BY_RESULT('finish_systems', '$.variants[*].result.surfaces[*].finishSystemId');

/**
 * A version keeps the finish systems and products as they are when it is made (keepLibrary), beside
 * the quantities, price and day plan the estimate's last save worked out from them. One edited since
 * would reach the crew's sheet with waits and mixes the price never counted, so the version waits
 * (409 `estimateId`, as for an estimate saved in the other unit) until the estimate is saved again.
 */
async function refuseLibraryChangedSincePriced(tx: TenantTx, estimateId: string): Promise<void> {
  const products = await tx.client.query<{ name: string; is_changed: boolean }>(PRODUCTS_NAMED, [tx.tenantId, estimateId]);
  const systems = await tx.client.query<{ name: string; is_changed: boolean }>(SYSTEMS_NAMED, [tx.tenantId, estimateId]);
  const changed = [...systems.rows, ...products.rows].filter((r) => r.is_changed).map((r) => `"${r.name}"`);
  if (!changed.length) return;
  throw conflict(
    `The finish systems changed since this estimate was priced (${changed.join(', ')} edited since). Open the estimate and save it again first, so the proposal keeps the layers its price was worked out from.`,
    [{ field: 'estimateId', message: 'The finish systems changed since this estimate was priced; save the estimate again.' }],
  );
}

/** Keeps with the version the finish systems and products its options use, as they are now (no prices). */
async function keepLibrary(tx: TenantTx, versionId: string): Promise<void> {
  const { rows } = await tx.client.query<{
    result: { variants?: Array<{ result: { surfaces: Parameters<typeof loadLibrary>[1] } }> } | null;
  }>(`select result from proposal_versions where tenant_id = $1 and id = $2`, [tx.tenantId, versionId]);
  const surfaces = (rows[0]?.result?.variants ?? []).flatMap((v) => v.result.surfaces);
  const library = await loadLibrary(tx, surfaces);
  await tx.client.query(`update proposal_versions set library = $3 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    versionId,
    JSON.stringify(library),
  ]);
}

/**
 * A version locked for a change, its estimate's row locked first: the order every writer of an
 * estimate's versions takes (the client's acceptance locks the estimate with the version it decides,
 * then marks the newer draft superseded). Locking the version first deadlocked a send against an
 * acceptance of the older version.
 */
export async function lockVersion(tx: TenantTx, id: string): Promise<ProposalVersionView> {
  const { estimateId } = await getVersion(tx, id);
  await tx.client.query(`select 1 from estimates where tenant_id = $1 and id = $2 for update`, [tx.tenantId, estimateId]);
  return getVersion(tx, id, true);
}

/**
 * Changes a draft: expiry, terms, exclusions, notes. The snapshot is rebuilt from the estimate's
 * current numbers. A sent (or decided) version is frozen: 409, make a new version instead.
 */
export async function updateDraft(
  tx: TenantTx,
  actorUserId: string,
  id: string,
  change: ProposalUpdate,
  now: Date,
): Promise<ProposalVersionView> {
  const current = await lockVersion(tx, id);
  await assertEstimateOpen(tx, current.estimateId);
  if (current.status !== 'draft')
    throw conflict(`Version ${current.version} is ${current.status.replace('_', ' ')} and cannot change. Make a new version instead.`);
  const sources = await loadProposalSources(tx, current.estimateId);
  await refuseLibraryChangedSincePriced(tx, current.estimateId);
  await refuseNumbersChangedSinceSaved(tx, current.estimateId);
  const today = localDate(sources.firm.timeZone, now);
  const expiresOn = change.expiresOn ?? current.expiresOn;
  if (change.expiresOn) checkExpiry(expiresOn, today);
  const prev = current.snapshot;
  const { snapshot, hash } = snapshotFor(sources, {
    issuedOn: today,
    expiresOn,
    terms: mergeTerms(prev.terms, change.terms),
    exclusions: change.exclusions ?? prev.exclusions,
    notes: change.notes ?? prev.notes,
  });
  await tx.client.query(
    `update proposal_versions v set snapshot = $3, snapshot_hash = $4, expires_on = $5,
            result = (select e.result from estimates e where e.tenant_id = v.tenant_id and e.id = v.estimate_id)
      where v.tenant_id = $1 and v.id = $2`,
    [tx.tenantId, id, JSON.stringify(snapshot), hash, expiresOn],
  );
  await keepLibrary(tx, id);
  await recordAudit(tx, {
    actorUserId,
    actorKind: 'staff',
    action: 'proposal.updated',
    entity: 'proposal_version',
    entityId: id,
    data: { version: current.version, snapshotHash: hash },
  });
  return getVersion(tx, id);
}
