import { withTenant } from '@layerbook/db';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import { createPortalLink } from '../auth/portal-auth';
import type { Config } from '../config';
import type { JobQueue } from '../queue/job-queue';
import { localeOf } from '../i18n/catalog';
import { longDate } from '../i18n/long-date';
import { portalUserReader } from '../i18n/reader';
import { enqueueMail } from '../mail/outbox';
import { proposalExpiringMail } from '../mail/proposal-templates';

/** Reminders go out this many days before a sent proposal's last day (common practice, no source). */
export const REMINDER_DAYS_BEFORE = 3;
const LINK_MINUTES = 3 * 24 * 60;

interface OpenVersion {
  id: string;
  version: number;
  title: string;
  expires_on: string;
  firm_name: string;
  portal_user_id: string;
  name: string;
  email: string;
}

/**
 * Reminds each client whose sent, undecided proposal ends within REMINDER_DAYS_BEFORE days of
 * the firm's local date. Runs with the firm's morning jobs; the purpose key sends once per version.
 * `now` starts the sign-in links' lifetime (the worker's clock, movable in tests).
 */
export async function sendProposalReminders(
  pool: Pool,
  queue: JobQueue,
  config: Config,
  job: { tenantId: string; localDate: string },
  logger: Logger,
  now: Date,
): Promise<number> {
  return withTenant(pool, job.tenantId, async (tx) => {
    const { rows } = await tx.client.query<OpenVersion>(
      `select v.id, v.version, v.snapshot->>'title' as title, v.expires_on::text as expires_on, f.name as firm_name, p.id as portal_user_id, p.name, p.email
         from proposal_versions v
         join estimates e on e.id = v.estimate_id and e.tenant_id = v.tenant_id
         join firms f on f.id = v.tenant_id
         join portal_users p on p.tenant_id = v.tenant_id and p.client_id = e.client_id and p.status = 'active'
        where v.tenant_id = $1 and v.status = 'sent'
          and v.expires_on >= $2::date and v.expires_on <= $2::date + $3::int`,
      [tx.tenantId, job.localDate, REMINDER_DAYS_BEFORE],
    );
    let queued = 0;
    for (const v of rows) {
      const purposeKey = `proposal-expiring:${v.id}:${v.portal_user_id}`;
      const { rows: sent } = await tx.client.query(`select 1 from mail_outbox where purpose_key = $1`, [purposeKey]);
      if (sent.length) continue;
      const link = await createPortalLink(tx, v.portal_user_id, now, LINK_MINUTES);
      const url = `${config.PUBLIC_URL}/portal/sign-in/link?token=${link.token}&next=${encodeURIComponent(`/portal/proposals/${v.id}`)}`;
      // In the client's language (theirs, else the firm's), the day written out for it, as the proposal's own e-mail.
      const reader = await portalUserReader(tx, v.portal_user_id);
      await enqueueMail(tx, queue, {
        purposeKey,
        tenantId: tx.tenantId,
        to: v.email,
        sender: 'firm',
        ...proposalExpiringMail({
          firmName: v.firm_name,
          clientName: v.name,
          title: v.title,
          version: v.version,
          expiresOn: longDate(v.expires_on, localeOf(reader.language, reader.country)),
          url,
          language: reader.language,
        }),
      });
      queued++;
    }
    if (queued) logger.info({ tenantId: job.tenantId, queued }, 'proposal reminders queued');
    return queued;
  });
}
