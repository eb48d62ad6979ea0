import type { SnapshotOption } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import type { AppContext } from '../context';
import type { ClientPrincipal } from '../http/principal';
import { localeOf } from '../i18n/catalog';
import { proposalAcceptedClientMail, proposalAcceptedMail, proposalAnsweredMail } from '../mail/acceptance-templates';
import { firmDateTime, firmTimeZone } from '../mail/firm-time';
import { enqueueMail } from '../mail/outbox';
import { type AgreedContract, agreedLabel } from '../jobs/create-job';
import type { ClientVersionRow } from './client-proposals';

/** Active owners and office members: the people who act on a client's answer. */
async function officeRecipients(tx: TenantTx): Promise<Array<{ id: string; email: string }>> {
  const { rows } = await tx.client.query<{ id: string; email: string }>(
    `select u.id, u.email from memberships m join users u on u.id = m.user_id
      where m.tenant_id = $1 and m.status = 'active' and m.role in ('owner', 'office') order by u.id`,
    [tx.tenantId],
  );
  return rows;
}

const money = (locale: string, currency: string, amount: string) =>
  // Intl accepts a decimal string and formats it exactly; no float arithmetic happens here.
  new Intl.NumberFormat(locale, { style: 'currency', currency }).format(amount as unknown as number);

export async function mailAcceptance(
  tx: TenantTx,
  ctx: AppContext,
  p: {
    row: ClientVersionRow;
    option: SnapshotOption;
    agreed: AgreedContract;
    signedName: string;
    signedAt: Date;
    client: ClientPrincipal;
    jobId: string;
    /** the deposit invoice issued at acceptance, if the firm's setting issued one */
    depositInvoiceId: string | null;
  },
): Promise<void> {
  const snap = p.row.snapshot;
  const depositNumber =
    p.depositInvoiceId === null
      ? null
      : ((
          await tx.client.query<{ number_text: string | null }>(`select number_text from invoices where tenant_id = $1 and id = $2`, [
            tx.tenantId,
            p.depositInvoiceId,
          ])
        ).rows[0]?.number_text ?? null);
  const base = ctx.config.PUBLIC_URL;
  const timeZone = await firmTimeZone(tx, tx.tenantId);
  const common = {
    firmName: snap.firm.name,
    clientName: snap.client.name || p.client.name,
    title: snap.title,
    version: p.row.version,
    optionLabel: agreedLabel(p.option, p.agreed),
    total: money(snap.locale, snap.currency, p.agreed.total),
    signedName: p.signedName,
    signedOn: firmDateTime(p.signedAt, snap.locale, timeZone),
    depositNumber,
  };
  const clientLocale = localeOf(p.client.language, p.client.country);
  for (const staff of await officeRecipients(tx)) {
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `proposal-accepted:${p.row.id}:${staff.id}`,
      tenantId: tx.tenantId,
      to: staff.email,
      // "Open the job" opens the job the acceptance made, where the payment schedule is checked
      ...proposalAcceptedMail({ ...common, url: `${base}/jobs/${p.jobId}` }),
    });
  }
  await enqueueMail(tx, ctx.queue, {
    purposeKey: `proposal-accepted-client:${p.row.id}`,
    tenantId: tx.tenantId,
    to: p.client.email,
    sender: 'firm',
    // The client's copy in their language (the principal carries it), money and dates for it in the firm's country.
    ...proposalAcceptedClientMail({
      ...common,
      total: money(clientLocale, snap.currency, p.agreed.total),
      signedOn: firmDateTime(p.signedAt, clientLocale, timeZone),
      reference: p.row.snapshot_hash.slice(0, 12),
      url: `${base}/portal/proposals/${p.row.id}`,
      language: p.client.language,
    }),
  });
}

export async function mailAnswer(
  tx: TenantTx,
  ctx: AppContext,
  p: { row: ClientVersionRow; answer: 'declined' | 'changes_requested'; comment: string; client: ClientPrincipal },
): Promise<void> {
  const snap = p.row.snapshot;
  const purpose = p.answer === 'declined' ? 'proposal-declined' : 'proposal-changes';
  for (const staff of await officeRecipients(tx)) {
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `${purpose}:${p.row.id}:${staff.id}`,
      tenantId: tx.tenantId,
      to: staff.email,
      ...proposalAnsweredMail({
        firmName: snap.firm.name,
        clientName: snap.client.name || p.client.name,
        title: snap.title,
        version: p.row.version,
        answer: p.answer,
        comment: p.comment,
        url: `${ctx.config.PUBLIC_URL}/estimates/${p.row.estimate_id}`,
      }),
    });
  }
}
