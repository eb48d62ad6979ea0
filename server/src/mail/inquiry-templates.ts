import type { Language } from '@layerbook/contracts';
import { translator } from '../i18n/catalog';
import { render, RenderedMail } from './templates';

/** To the person who asked, in the firm's language (`language`; English when the caller does not say). */
export function inquiryAcknowledgementMail(p: { firmName: string; name: string; language?: Language }): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const firm = p.firmName;
  return render(
    t('mail.inquiryReceived.subject', { firm }),
    t('mail.inquiryReceived.heading'),
    [t('mail.hello', { name: p.name }), t('mail.inquiryReceived.body', { firm })],
    null,
    t('mail.inquiryReceived.footer', { firm }),
    language,
  );
}

export function inquiryNotificationMail(p: { firmName: string; prospect: string; rooms: string; url: string }): RenderedMail {
  return render(
    `New inquiry from ${p.prospect}`,
    `New inquiry: ${p.prospect}`,
    [`${p.prospect} sent an inquiry through the ${p.firmName} inquiry form.`, `Rooms and surfaces: ${p.rooms.slice(0, 300)}`],
    { label: 'Open the inquiry', url: p.url },
    'Answering quickly wins work.',
  );
}

export function followUpDigestMail(p: {
  name: string;
  firmName: string;
  items: Array<{ contactName: string; due: string; overdue: boolean }>;
  url: string;
}): RenderedMail {
  const lines = p.items.map((i) => `${i.contactName} — ${i.overdue ? `overdue since ${i.due}` : 'due today'}`);
  return render(
    `Follow-ups for today: ${p.items.length}`,
    `${p.items.length} follow-up${p.items.length === 1 ? '' : 's'} for today`,
    [`Good morning ${p.name},`, ...lines],
    { label: 'Open today', url: p.url },
    `Sent by Layerbook for ${p.firmName} each morning when follow-ups are due.`,
  );
}
