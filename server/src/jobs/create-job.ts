import type { SnapshotOption, SnapshotPayment, SnapshotPrice } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { scheduleTotals } from '@layerbook/domain';
import { recordAudit } from '../audit/record';
import { ensureJobWork } from '../billing/work-items';

export interface AcceptedWork {
  readonly proposalVersionId: string;
  readonly estimateId: string;
  readonly clientId: string;
  readonly siteId: string;
  readonly inquiryId: string | null;
  readonly title: string;
  readonly currency: string;
  readonly option: SnapshotOption;
  /** the option with the add-ons the client took: the contract sum and the payments it makes */
  readonly agreed: AgreedContract;
  /** who signed: the client's portal account */
  readonly actorPortalUserId: string;
}

/** The contract an acceptance makes: the option's total with the add-ons taken, and its payments. */
export interface AgreedContract {
  readonly total: string;
  readonly tax: string;
  readonly addOns: readonly SnapshotPrice[];
  readonly payments: readonly SnapshotPayment[];
}

/** What the client took, in one line: the option's name and each add-on's ("Polished lime + Stencilled border"). */
export const agreedLabel = (option: SnapshotOption, agreed: AgreedContract): string =>
  [option.label, ...agreed.addOns.map((a) => a.label)].join(' + ');

/**
 * The job an acceptance makes, in the acceptance's transaction: the contract sum is the chosen
 * option's total with the add-ons taken, and the draft payment schedule is the option's payments as
 * the client read them (with add-ons, the later ones grown to carry them: acceptedSum). They must add
 * up to the total to the cent, or nothing is written. The job's work items and default schedule of
 * values are made with it.
 */
export async function createJobFromAcceptance(tx: TenantTx, work: AcceptedWork): Promise<string> {
  const { option, agreed } = work;
  const totals = scheduleTotals(
    agreed.payments.map((p) => ({ amount: p.amount, percent: null })),
    agreed.total,
  );
  if (!totals.isContractSum) {
    throw new Error(`payment schedule of option ${option.id} sums to ${totals.amount.toFixed(2)}, not ${agreed.total}`);
  }
  const { rows } = await tx.client.query<{ id: string }>(
    `insert into jobs (tenant_id, estimate_id, proposal_version_id, client_id, site_id, inquiry_id, title, accepted_variant_id, option_label, currency, contract_sum, original_contract_sum, contract_tax, start_date, finish_date)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $11, $12, $13, $14) returning id`,
    [
      tx.tenantId,
      work.estimateId,
      work.proposalVersionId,
      work.clientId,
      work.siteId,
      work.inquiryId,
      work.title,
      option.id,
      agreedLabel(option, agreed),
      work.currency,
      agreed.total,
      agreed.tax,
      option.schedule.startDate,
      option.schedule.finishDate,
    ],
  );
  const jobId = rows[0].id;
  for (const [position, p] of agreed.payments.entries()) {
    await tx.client.query(
      `insert into payment_schedule_lines (tenant_id, job_id, position, label, role, trigger, percent, amount, expected_on) values ($1, $2, $3, $4, $5, $6, $7, $8, $9)`,
      [tx.tenantId, jobId, position + 1, p.label, p.role, JSON.stringify(p.trigger), p.percent, p.amount, p.expectedOn],
    );
  }
  // What the crew marks done (each layer on each surface) and the default schedule of values.
  await ensureJobWork(tx, jobId);
  await recordAudit(tx, {
    actorUserId: null,
    actorKind: 'client',
    action: 'job.created',
    entity: 'job',
    entityId: jobId,
    data: {
      proposalVersionId: work.proposalVersionId,
      optionId: option.id,
      addOnIds: agreed.addOns.map((a) => a.id),
      contractSum: agreed.total,
      currency: work.currency,
      lines: agreed.payments.length,
      portalUserId: work.actorPortalUserId,
    },
  });
  return jobId;
}
