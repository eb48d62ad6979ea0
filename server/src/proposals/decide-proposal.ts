import type {
  ProposalSnapshot,
  SnapshotOption,
  PortalProposal,
  PortalProposalAccepted,
  ProposalAcceptance,
  ProposalChangeRequest,
  ProposalDecline,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { acceptedSum, DomainInputError, minorUnitDigits } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import { depositAtAcceptance } from '../billing/deposit-at-acceptance';
import type { AppContext } from '../context';
import { clientActor } from '../http/actor';
import type { ClientPrincipal } from '../http/principal';
import { badRequest, conflict, HttpError } from '../http/problem';
import { moveStage } from '../inquiries/service';
import { snapshotHash } from './snapshot-hash';
import { type AgreedContract, createJobFromAcceptance } from '../jobs/create-job';
import { clientWords, firmToday, isLatest, loadClientVersion, toPortalProposal, type ClientVersionRow } from './client-proposals';
import { mailAcceptance, mailAnswer } from './decision-mail';
import { longDate } from '../i18n/long-date';

/** Where the signature came from, kept with it. */
export interface SigningContext {
  readonly ip: string;
  readonly userAgent: string;
}

/**
 * The contract the client signs: the option, with the add-ons they ticked (acceptedSum). An add-on
 * the proposal does not offer, or one ticked twice, is a 400 naming it.
 */
function agreedContract(snapshot: ProposalSnapshot, option: SnapshotOption, addOnIds: readonly string[]): AgreedContract {
  try {
    const sum = acceptedSum(option, snapshot.addOns, addOnIds, snapshot.currency);
    const digits = minorUnitDigits(snapshot.currency);
    const byId = new Map(snapshot.addOns.map((a) => [a.id, a]));
    return {
      total: sum.total.toFixed(digits),
      tax: sum.tax.toFixed(digits),
      addOns: addOnIds.map((id) => byId.get(id)!),
      payments: option.payments.map((p, i) => ({ ...p, amount: sum.payments[i].amount.toFixed(digits), percent: sum.payments[i].percent })),
    };
  } catch (error) {
    if (error instanceof DomainInputError) throw badRequest([{ field: error.field, message: error.message }]);
    throw error;
  }
}

/** Why this version can take no answer now, as the client should read it (409), or null. */
function refusal(row: ClientVersionRow, today: string, checkExpiry: boolean): HttpError | null {
  if (row.status === 'accepted') return conflict('This proposal was already accepted.');
  if (!isLatest(row)) return conflict('A newer version of this proposal was sent; please read that one.');
  if (row.status === 'declined') return conflict('You declined this proposal. Ask the firm if you would like a new one.');
  if (row.status === 'changes_requested') return conflict('You asked for changes to this proposal; the firm will send a new version.');
  if (row.status !== 'sent') return conflict('This proposal cannot be answered.');
  if (checkExpiry && row.expires_on < today)
    return conflict(`This proposal expired on ${longDate(row.expires_on, row.snapshot.locale)}; ask the firm for a new one.`);
  return null;
}

/**
 * The client accepts one option with a typed signature. One transaction: the version is signed
 * (name, time, IP, browser), the job and its draft payment schedule are made from the snapshot,
 * the estimate and its inquiry are won, the audit log and the outbox get their rows; with the firm's
 * "issue and send" setting the deposit invoice is issued and e-mailed too (its id in the answer).
 */
export async function acceptProposal(
  tx: TenantTx,
  ctx: AppContext,
  client: ClientPrincipal,
  id: string,
  parseBody: () => ProposalAcceptance,
  signing: SigningContext,
): Promise<PortalProposalAccepted> {
  const row = await loadClientVersion(tx, client, id, true);
  const input = parseBody();
  const option = row.snapshot.options.find((o) => o.id === input.variantId);
  if (!option) throw badRequest([{ field: 'variantId', message: 'Choose one of the options in this proposal.' }]);
  const addOnIds = input.addOnIds ?? [];
  const agreed = agreedContract(row.snapshot, option, addOnIds);
  const now = ctx.now();
  const today = await firmToday(tx, now);
  const refused = refusal(row, today, true);
  if (refused) throw refused;
  // What the client read must be what was sent: recompute the fingerprint before signing it.
  const hash = snapshotHash(row.snapshot);
  if (hash !== row.snapshot_hash) {
    ctx.logger.error({ proposalVersionId: id }, 'proposal snapshot does not match its recorded hash');
    throw conflict('This proposal cannot be accepted as it stands. Ask the firm to send it again.');
  }

  await tx.client.query(
    `update proposal_versions set status = 'accepted', decided_at = $3, accepted_variant_id = $4, accepted_add_on_ids = $8, signed_name = $5, signed_ip = $6, signed_user_agent = $7
      where tenant_id = $1 and id = $2 and status = 'sent'`,
    [tx.tenantId, id, now, option.id, input.signedName, signing.ip, signing.userAgent.slice(0, 500), addOnIds],
  );
  await tx.client.query(
    `update proposal_versions set status = 'superseded' where tenant_id = $1 and estimate_id = $2 and status = 'draft'`,
    [tx.tenantId, row.estimate_id],
  );
  await tx.client.query(`update estimates set status = 'accepted', updated_at = $3 where tenant_id = $1 and id = $2`, [
    tx.tenantId,
    row.estimate_id,
    now,
  ]);
  const jobId = await createJobFromAcceptance(tx, {
    proposalVersionId: id,
    estimateId: row.estimate_id,
    clientId: row.client_id,
    siteId: row.site_id,
    inquiryId: row.inquiry_id,
    title: row.snapshot.title,
    currency: row.snapshot.currency,
    option,
    agreed,
    actorPortalUserId: client.id,
  });
  if (row.inquiry_id) await moveStage(tx, clientActor(client), row.inquiry_id, { stage: 'won' }, now);
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'client',
    action: 'proposal.accepted',
    entity: 'proposal_version',
    entityId: id,
    data: {
      version: row.version,
      optionId: option.id,
      addOnIds,
      total: agreed.total,
      signedName: input.signedName,
      ip: signing.ip,
      snapshotHash: hash,
      jobId,
      portalUserId: client.id,
    },
  });
  // Issuing holds the firm's invoice counter until this transaction commits: only the e-mails, which say
  // whether the deposit invoice went out, come after it.
  const depositInvoiceId = await depositAtAcceptance(tx, ctx, jobId, today, now);
  await mailAcceptance(tx, ctx, { row, option, agreed, signedName: input.signedName, signedAt: now, client, jobId, depositInvoiceId });
  return { ...toPortalProposal(await loadClientVersion(tx, client, id), today, clientWords(client)), depositInvoiceId };
}

/** The client declines, or asks for changes: the version closes and the office hears of it. */
export async function answerProposal(
  tx: TenantTx,
  ctx: AppContext,
  client: ClientPrincipal,
  id: string,
  answer: 'declined' | 'changes_requested',
  parseBody: () => ProposalDecline | ProposalChangeRequest,
): Promise<PortalProposal> {
  const row = await loadClientVersion(tx, client, id, true);
  const comment = parseBody().comment ?? '';
  const now = ctx.now();
  const today = await firmToday(tx, now);
  // Asking for changes to (or declining) an expired offer still tells the firm something useful.
  const refused = refusal(row, today, false);
  if (refused) throw refused;
  await tx.client.query(
    `update proposal_versions set status = $3, client_comment = $4, decided_at = $5 where tenant_id = $1 and id = $2 and status = 'sent'`,
    [tx.tenantId, id, answer, comment, now],
  );
  if (answer === 'declined') {
    await tx.client.query(
      `update estimates set status = 'declined', updated_at = $3 where tenant_id = $1 and id = $2 and status <> 'accepted'`,
      [tx.tenantId, row.estimate_id, now],
    );
  }
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'client',
    action: answer === 'declined' ? 'proposal.declined' : 'proposal.changes_requested',
    entity: 'proposal_version',
    entityId: id,
    data: { version: row.version, comment, portalUserId: client.id },
  });
  await mailAnswer(tx, ctx, { row, answer, comment, client });
  return toPortalProposal(await loadClientVersion(tx, client, id), today, clientWords(client));
}
