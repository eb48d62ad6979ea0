import type { Language } from '@layerbook/contracts';
import { translator } from '../../i18n/catalog';
import { render, type RenderedMail } from '../../mail/templates';

/** To the client, in their language (English when the caller does not say): a change order to read and approve (or decline) in the portal. */
export function changeOrderSentMail(p: {
  firmName: string;
  clientName: string;
  jobTitle: string;
  number: number;
  title: string;
  amount: string;
  url: string;
  linkDays: number;
  portalUrl: string;
  language?: Language;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const firm = p.firmName;
  return render(
    t('mail.changeOrderSent.subject', { firm, number: p.number, title: p.title }),
    t('mail.changeOrderSent.heading', { firm }),
    [
      t('mail.hello', { name: p.clientName }),
      t('mail.changeOrderSent.written', { firm, number: p.number, title: p.title, job: p.jobTitle, amount: p.amount }),
      t('mail.changeOrderSent.howTo'),
      t('mail.changeOrderSent.linkOnce', { days: p.linkDays }),
    ],
    { label: t('mail.changeOrderSent.action'), url: p.url },
    t('mail.changeOrderSent.footer', { firm, portalUrl: p.portalUrl }),
    language,
  );
}

/** To the firm's office: the client answered a change order. */
export function changeOrderAnsweredMail(p: {
  firmName: string;
  clientName: string;
  jobTitle: string;
  number: number;
  title: string;
  isApproved: boolean;
  signedName: string | null;
  amount: string;
  comment: string;
  url: string;
}): RenderedMail {
  const word = p.isApproved ? 'approved' : 'declined';
  return render(
    `${p.clientName} ${word} change order #${p.number}: ${p.title}`,
    `Change order #${p.number} ${word}`,
    [
      p.isApproved
        ? `${p.clientName} approved change order #${p.number} on "${p.jobTitle}", signed "${p.signedName ?? ''}". The contract sum moved by ${p.amount} and the unbilled payments were spread again.`
        : `${p.clientName} declined change order #${p.number} on "${p.jobTitle}". Nothing about the job changed.`,
      ...(p.comment ? [`Their comment: "${p.comment}"`] : []),
    ],
    { label: 'Open the job', url: p.url },
    `You are receiving this because you work in the office of ${p.firmName}.`,
  );
}
