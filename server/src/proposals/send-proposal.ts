import type { ProposalVersionView } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { recordAudit } from '../audit/record';
import { createPortalLink } from '../auth/portal-auth';
import type { AppContext } from '../context';
import { localDate } from '../firms/local-date';
import { conflict } from '../http/problem';
import { enqueueMail } from '../mail/outbox';
import { proposalSentMail } from '../mail/proposal-templates';
import { ensurePortalAccount } from './client-portal-account';
import { assertEstimateOpen } from './estimates';
import { refuseDraftOlderThanEstimate, refuseNumbersChangedSinceSaved } from './estimate-freshness';
import { getVersion, lockVersion } from './proposal-versions';
import { snapshotHash } from './snapshot-hash';
import { longDate } from '../i18n/long-date';
import { localeOf } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';

/** A proposal e-mail may sit unread for a while, so its sign-in link lasts longer than a requested one. */
export const PROPOSAL_LINK_DAYS = 3;

/**
 * Sends a draft: from here the version is frozen, dated the day it is sent. In one transaction it is marked sent, older sent
 * versions are superseded (only the newest can be accepted), the estimate becomes "proposed", the
 * client gets a portal account if needed and the e-mail with a one-time sign-in link goes to the outbox.
 */
export async function sendVersion(tx: TenantTx, ctx: AppContext, actorUserId: string, id: string): Promise<ProposalVersionView> {
  const version = await lockVersion(tx, id);
  await assertEstimateOpen(tx, version.estimateId);
  if (version.status !== 'draft')
    throw conflict(
      `Version ${version.version} is ${version.status.replace('_', ' ')}; only a draft can be sent. Make a new version instead.`,
    );
  // the client gets the price the estimate has now, worked out from what the site and firm are now
  await refuseDraftOlderThanEstimate(tx, id, version.version);
  await refuseNumbersChangedSinceSaved(tx, version.estimateId);
  const est = (
    await tx.client.query<{ client_id: string }>(`select client_id from estimates where tenant_id = $1 and id = $2 for update`, [
      tx.tenantId,
      version.estimateId,
    ])
  ).rows[0];
  const firm = (
    await tx.client.query<{ name: string; time_zone: string }>(`select name, time_zone from firms where id = $1`, [tx.tenantId])
  ).rows[0];
  const today = localDate(firm.time_zone, ctx.now());
  if (version.expiresOn <= today)
    throw conflict('The offer would expire before it is read. Choose a later expiry date.', [
      { field: 'expiresOn', message: `Choose a day after today (${today}).` },
    ]);
  const client = (
    await tx.client.query<{ id: string; name: string; email: string }>(
      `select id, name, email from clients where tenant_id = $1 and id = $2`,
      [tx.tenantId, est.client_id],
    )
  ).rows[0];
  const account = await ensurePortalAccount(tx, client);

  const sentAt = ctx.now();
  // A proposal is dated the day it goes out, not the day its draft was made; its fingerprint follows.
  const snap = version.snapshot.issuedOn === today ? version.snapshot : { ...version.snapshot, issuedOn: today };
  const hash = snapshotHash(snap);
  await tx.client.query(
    `update proposal_versions set status = 'superseded' where tenant_id = $1 and estimate_id = $2 and status in ('sent', 'changes_requested') and id <> $3`,
    [tx.tenantId, version.estimateId, id],
  );
  await tx.client.query(
    `update proposal_versions set status = 'sent', sent_at = $3, snapshot = $4::jsonb, snapshot_hash = $5 where tenant_id = $1 and id = $2 and status = 'draft'`,
    [tx.tenantId, id, sentAt, JSON.stringify(snap), hash],
  );
  await tx.client.query(
    `update estimates set status = 'proposed', updated_at = $3 where tenant_id = $1 and id = $2 and status <> 'accepted'`,
    [tx.tenantId, version.estimateId, sentAt],
  );

  const { token } = await createPortalLink(tx, account.id, sentAt, PROPOSAL_LINK_DAYS * 24 * 60);
  const base = ctx.config.PUBLIC_URL;
  // In the client's language (theirs, else the firm's), the date for it in the firm's country.
  const reader = await clientReader(tx, client.id);
  await enqueueMail(tx, ctx.queue, {
    purposeKey: `proposal-sent:${id}`,
    tenantId: tx.tenantId,
    to: account.email,
    sender: 'firm',
    ...proposalSentMail({
      firmName: snap.firm.name,
      clientName: client.name,
      title: snap.title,
      version: version.version,
      expiresOn: longDate(snap.expiresOn, localeOf(reader.language, reader.country)),
      url: `${base}/portal/sign-in/link?token=${token}&next=/portal/proposals/${id}`,
      linkDays: PROPOSAL_LINK_DAYS,
      portalUrl: `${base}/portal/sign-in`,
      language: reader.language,
    }),
  });
  await recordAudit(tx, {
    actorUserId,
    actorKind: 'staff',
    action: 'proposal.sent',
    entity: 'proposal_version',
    entityId: id,
    data: { version: version.version, snapshotHash: hash, to: account.email },
  });
  return getVersion(tx, id);
}
