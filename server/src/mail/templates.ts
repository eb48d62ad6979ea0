/** Plain, readable e-mails: every message has an HTML and a plain-text part. */
export interface RenderedMail {
  readonly subject: string;
  readonly html: string;
  readonly text: string;
}

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

type Action = { label: string; url: string } | null;

function layout(heading: string, paragraphs: string[], action: Action, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${escape(p)}</p>`).join('');
  return `<!doctype html><html><body style="margin:0;background:#f6f1e7;font-family:Georgia,serif;color:#2f2419">
<div style="max-width:560px;margin:0 auto;padding:28px 24px">
<p style="font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#6b4a2f;margin:0 0 18px">Layerbook</p>
<h1 style="font-size:22px;font-weight:600;margin:0 0 16px">${escape(heading)}</h1>
<div style="font-family:Arial,sans-serif;font-size:15px;line-height:1.5">${body}
${
  action
    ? `<p style="margin:22px 0"><a href="${escape(action.url)}" style="background:#6b4a2f;color:#fff;padding:11px 18px;border-radius:6px;text-decoration:none;display:inline-block">${escape(action.label)}</a></p>
<p style="font-size:13px;color:#5d5246">If the button does not work, paste this address into your browser:<br>${escape(action.url)}</p>`
    : ''
}
<p style="font-size:13px;color:#5d5246;margin-top:24px">${escape(footer)}</p></div></div></body></html>`;
}

function plain(heading: string, paragraphs: string[], action: Action, footer: string): string {
  return [heading, '', ...paragraphs.flatMap((p) => [p, '']), ...(action ? [`${action.label}: ${action.url}`, ''] : []), footer, ''].join(
    '\n',
  );
}

export function render(subject: string, heading: string, paragraphs: string[], action: Action, footer: string): RenderedMail {
  return { subject, html: layout(heading, paragraphs, action, footer), text: plain(heading, paragraphs, action, footer) };
}

const ROLE_WORDS = { owner: 'an owner', office: 'the office', crew: 'the crew' } as const;

export function invitationMail(p: {
  firmName: string;
  inviterName: string;
  role: keyof typeof ROLE_WORDS;
  url: string;
  days: number;
}): RenderedMail {
  return render(
    `${p.inviterName} invited you to ${p.firmName} on Layerbook`,
    `Join ${p.firmName} on Layerbook`,
    [
      `${p.inviterName} has invited you to join ${p.firmName} as ${ROLE_WORDS[p.role]}.`,
      `The invitation is good for ${p.days} days and works once.`,
    ],
    { label: 'Accept the invitation', url: p.url },
    'If you were not expecting this, you can ignore this e-mail.',
  );
}

export function passwordResetMail(p: { name: string; url: string; minutes: number }): RenderedMail {
  return render(
    'Reset your Layerbook password',
    'Choose a new password',
    [
      `Hello ${p.name},`,
      `Someone (hopefully you) asked to reset the password of this Layerbook account. The link works once, within ${p.minutes} minutes.`,
    ],
    { label: 'Choose a new password', url: p.url },
    'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  );
}

export function portalLinkMail(p: { name: string; firmName: string; url: string; minutes: number }): RenderedMail {
  return render(
    `Your sign-in link for ${p.firmName}`,
    `Sign in to your projects with ${p.firmName}`,
    [`Hello ${p.name},`, `Use this link to see your proposals, sample boards and invoices. It works once, within ${p.minutes} minutes.`],
    { label: 'Sign in', url: p.url },
    'If you did not ask for this, ignore this e-mail.',
  );
}
