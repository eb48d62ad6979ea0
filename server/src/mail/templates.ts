import type { Language } from '@layerbook/contracts';
import { translator } from '../i18n/catalog';

/** Plain, readable e-mails: every message has an HTML and a plain-text part. */
export interface RenderedMail {
  readonly subject: string;
  readonly html: string;
  readonly text: string;
}

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

type Action = { label: string; url: string } | null;

function layout(heading: string, paragraphs: string[], action: Action, footer: string, language: Language): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${escape(p)}</p>`).join('');
  return `<!doctype html><html lang="${language}"><body style="margin:0;background:#f6f1e7;font-family:Georgia,serif;color:#2f2419">
<div style="max-width:560px;margin:0 auto;padding:28px 24px">
<p style="font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#6b4a2f;margin:0 0 18px">Layerbook</p>
<h1 style="font-size:22px;font-weight:600;margin:0 0 16px">${escape(heading)}</h1>
<div style="font-family:Arial,sans-serif;font-size:15px;line-height:1.5">${body}
${
  action
    ? `<p style="margin:22px 0"><a href="${escape(action.url)}" style="background:#6b4a2f;color:#fff;padding:11px 18px;border-radius:6px;text-decoration:none;display:inline-block">${escape(action.label)}</a></p>
<p style="font-size:13px;color:#5d5246">${escape(translator(language)('mail.layout.buttonFallback'))}<br>${escape(action.url)}</p>`
    : ''
}
<p style="font-size:13px;color:#5d5246;margin-top:24px">${escape(footer)}</p></div></div></body></html>`;
}

function plain(heading: string, paragraphs: string[], action: Action, footer: string): string {
  return [heading, '', ...paragraphs.flatMap((p) => [p, '']), ...(action ? [`${action.label}: ${action.url}`, ''] : []), footer, ''].join(
    '\n',
  );
}

/** One e-mail; `language` is the reader's (the words passed in are already theirs; the layout's own words follow it). */
export function render(
  subject: string,
  heading: string,
  paragraphs: string[],
  action: Action,
  footer: string,
  language: Language = 'en',
): RenderedMail {
  return { subject, html: layout(heading, paragraphs, action, footer, language), text: plain(heading, paragraphs, action, footer) };
}

/** The invitee is not a member yet, so the invitation goes out in the firm's language. */
export function invitationMail(p: {
  firmName: string;
  inviterName: string;
  role: 'owner' | 'office' | 'crew';
  url: string;
  days: number;
  language?: Language;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const names = { inviter: p.inviterName, firm: p.firmName };
  return render(
    t('mail.invitation.subject', names),
    t('mail.invitation.heading', names),
    [
      t('mail.invitation.invited', { ...names, role: t(`mail.invitation.roles.${p.role}`) }),
      t('mail.invitation.goodFor', { days: p.days }),
    ],
    { label: t('mail.invitation.action'), url: p.url },
    t('mail.invitation.footer'),
    language,
  );
}

export function passwordResetMail(p: { name: string; url: string; minutes: number; language?: Language }): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  return render(
    t('mail.passwordReset.subject'),
    t('mail.passwordReset.heading'),
    [t('mail.hello', { name: p.name }), t('mail.passwordReset.body', { minutes: p.minutes })],
    { label: t('mail.passwordReset.action'), url: p.url },
    t('mail.passwordReset.footer'),
    language,
  );
}

export function portalLinkMail(p: { name: string; firmName: string; url: string; minutes: number; language?: Language }): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  return render(
    t('mail.portalLink.subject', { firm: p.firmName }),
    t('mail.portalLink.heading', { firm: p.firmName }),
    [t('mail.hello', { name: p.name }), t('mail.portalLink.body', { minutes: p.minutes })],
    { label: t('mail.portalLink.action'), url: p.url },
    t('mail.portalLink.footer'),
    language,
  );
}
