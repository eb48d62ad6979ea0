import type { Language } from '@layerbook/contracts';
import { TenantTx } from '@layerbook/db';
import { createPortalLink } from '../auth/portal-auth';
import type { AppContext } from '../context';
import { translator } from '../i18n/catalog';
import { clientReader } from '../i18n/reader';
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

export function boardDecisionMail(p: {
  clientName: string;
  label: string;
  round: number;
  decision: 'approved' | 'changes_requested';
  comment: string;
  url: string;
}): RenderedMail {
  const board = `"${p.label}" (round ${p.round})`;
  return p.decision === 'approved'
    ? render(
        `${p.clientName} approved the sample board ${board}`,
        'Sample board approved',
        [`${p.clientName} approved the sample board ${board}. It is now the control sample for the work.`],
        { label: 'Open the sample board', url: p.url },
        'Sent by Layerbook to the owners and office of your firm.',
      )
    : render(
        `${p.clientName} asked for changes to the sample board ${board}`,
        'Changes asked for on a sample board',
        [
          `${p.clientName} asked for changes to the sample board ${board}:`,
          p.comment,
          'Start the next round from the board when you are ready.',
        ],
        { label: 'Open the sample board', url: p.url },
        'Sent by Layerbook to the owners and office of your firm.',
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
  const { rows } = await tx.client.query<{ id: string; email: string }>(
    `select u.id, u.email from memberships m join users u on u.id = m.user_id
      where m.tenant_id = $1 and m.status = 'active' and m.role in ('owner', 'office') order by u.id`,
    [tx.tenantId],
  );
  const purpose = p.decision === 'approved' ? 'sample-approved' : 'sample-changes';
  for (const staff of rows) {
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
      }),
    });
  }
}
