import type { Language } from '@layerbook/contracts';
import { TenantTx } from '@layerbook/db';
import { createPortalLink } from '../auth/portal-auth';
import type { AppContext } from '../context';
import { translator } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';
import { officeRecipients } from '../mail/office-recipients';
import { enqueueMail } from '../mail/outbox';
import { render, RenderedMail } from '../mail/templates';
import type { BoardRow } from './boards';

/** To the client, in their language (English when the caller does not say): a board to look at in the portal. */
export function boardShownMail(p: {
  firmName: string;
  name: string;
  label: string;
  round: number;
  url: string;
  /** how many days the button's one-time sign-in works */
  linkDays: number;
  portalUrl: string;
  language?: Language;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const firm = p.firmName;
  return render(
    t('mail.boardShown.subject', { firm }),
    t('mail.boardShown.heading', { firm }),
    [
      t('mail.hello', { name: p.name }),
      t(p.round > 1 ? 'mail.boardShown.madeRound' : 'mail.boardShown.made', { firm, label: p.label, round: p.round }),
      t('mail.boardShown.linkOnce', { days: p.linkDays }),
    ],
    { label: t('mail.boardShown.action'), url: p.url },
    t('mail.boardShown.footer', { portalUrl: p.portalUrl }),
    language,
  );
}

/** To someone in the firm's office, in the language they read (English when the caller does not say): the client's answer on a board. */
export function boardDecisionMail(p: {
  clientName: string;
  label: string;
  round: number;
  decision: 'approved' | 'changes_requested';
  comment: string;
  url: string;
  language?: Language;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const facts = { client: p.clientName, label: p.label, round: p.round };
  const action = { label: t('mail.boardDecision.action'), url: p.url };
  const footer = t('mail.boardDecision.footer');
  return p.decision === 'approved'
    ? render(
        t('mail.boardDecision.approvedSubject', facts),
        t('mail.boardDecision.approvedHeading'),
        [t('mail.boardDecision.approved', facts)],
        action,
        footer,
        language,
      )
    : render(
        t('mail.boardDecision.changesSubject', facts),
        t('mail.boardDecision.changesHeading'),
        [t('mail.boardDecision.changes', facts), p.comment, t('mail.boardDecision.nextRound')],
        action,
        footer,
        language,
      );
}

/** How long the board e-mail's button signs the client in (once), as a change order's does. */
export const BOARD_LINK_DAYS = 3;

/**
 * Mails each active portal login of the board's client, with a one-time sign-in link that opens the
 * board (a client shown a board is often new to the portal); returns how many were queued.
 */
export async function mailBoardShown(tx: TenantTx, ctx: AppContext, p: { board: BoardRow; firmName: string }): Promise<number> {
  const { rows } = await tx.client.query<{ id: string; email: string; name: string }>(
    `select id, email, name from portal_users where tenant_id = $1 and client_id = $2 and status = 'active' order by id`,
    [tx.tenantId, p.board.clientId],
  );
  // In the client's language (theirs, else the firm's).
  const { language } = await clientReader(tx, p.board.clientId);
  const base = ctx.config.PUBLIC_URL;
  for (const user of rows) {
    const { token } = await createPortalLink(tx, user.id, ctx.now(), BOARD_LINK_DAYS * 24 * 60);
    await enqueueMail(tx, ctx.queue, {
      // One e-mail per board and person, even if the request is retried.
      purposeKey: `sample-shown:${p.board.id}:${user.id}`,
      tenantId: tx.tenantId,
      to: user.email,
      sender: 'firm',
      ...boardShownMail({
        firmName: p.firmName,
        name: user.name,
        label: p.board.label,
        round: p.board.round,
        url: `${base}/portal/sign-in/link?token=${token}&next=/portal/boards/${p.board.id}`,
        linkDays: BOARD_LINK_DAYS,
        portalUrl: `${base}/portal/sign-in`,
        language,
      }),
    });
  }
  return rows.length;
}

/** Mails the active owners and office members, who act on the client's answer. */
export async function mailBoardDecision(
  tx: TenantTx,
  ctx: AppContext,
  p: { board: BoardRow; clientName: string; decision: 'approved' | 'changes_requested'; comment: string },
): Promise<void> {
  const purpose = p.decision === 'approved' ? 'sample-approved' : 'sample-changes';
  for (const staff of await officeRecipients(tx)) {
    await enqueueMail(tx, ctx.queue, {
      purposeKey: `${purpose}:${p.board.id}:${staff.id}`,
      tenantId: tx.tenantId,
      to: staff.email,
      ...boardDecisionMail({
        clientName: p.clientName,
        label: p.board.label,
        round: p.board.round,
        decision: p.decision,
        comment: p.comment,
        url: `${ctx.config.PUBLIC_URL}/samples/${p.board.id}`,
        language: staff.reader.language,
      }),
    });
  }
}
