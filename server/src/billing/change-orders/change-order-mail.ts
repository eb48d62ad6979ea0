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

/** To someone in the firm's office, in the language they read (English when the caller does not say): the client answered a change order. */
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
  language?: Language;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const facts = {
    client: p.clientName,
    number: p.number,
    title: p.title,
    job: p.jobTitle,
    signedName: p.signedName ?? '',
    amount: p.amount,
  };
  const answer = p.isApproved ? 'approved' : 'declined';
  return render(
    t(`mail.changeOrderAnswered.${answer}Subject`, facts),
    t(`mail.changeOrderAnswered.${answer}Heading`, facts),
    [t(`mail.changeOrderAnswered.${answer}`, facts), ...(p.comment ? [t('mail.changeOrderAnswered.comment', { comment: p.comment })] : [])],
    { label: t('mail.changeOrderAnswered.action'), url: p.url },
    t('mail.changeOrderAnswered.footer', { firm: p.firmName }),
    language,
  );
}
