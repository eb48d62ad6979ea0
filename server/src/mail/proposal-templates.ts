import type { Language } from '@layerbook/contracts';
import { translator } from '../i18n/catalog';
import { render, RenderedMail } from './templates';

/** What every e-mail about one proposal version names: who sends, to whom, which version, until when, the link. */
interface ProposalMailFacts {
  firmName: string;
  clientName: string;
  title: string;
  version: number;
  /** the offer's last day, written out for the reader */
  expiresOn: string;
  url: string;
}

/** To the client, in their language (`language`; English when the caller does not say). */
export function proposalSentMail(
  p: ProposalMailFacts & {
    linkDays: number;
    portalUrl: string;
    language?: Language;
  },
): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const firm = p.firmName;
  return render(
    t('mail.proposalSent.subject', { firm, title: p.title }),
    t('mail.proposalSent.heading', { firm }),
    [
      t('mail.hello', { name: p.clientName }),
      t('mail.proposalSent.sent', { firm, title: p.title, version: p.version }),
      t('mail.proposalSent.howTo', { expiresOn: p.expiresOn }),
      t('mail.proposalSent.linkOnce', { days: p.linkDays }),
    ],
    { label: t('mail.proposalSent.action'), url: p.url },
    t('mail.proposalSent.footer', { firm, portalUrl: p.portalUrl }),
    language,
  );
}

/** To the client before a sent proposal lapses, in their language; `expiresOn` written out for them. */
export function proposalExpiringMail(p: ProposalMailFacts & { language: Language }): RenderedMail {
  const t = translator(p.language);
  const words = { firm: p.firmName, title: p.title, version: p.version, expiresOn: p.expiresOn };
  return render(
    t('mail.proposalExpiring.subject', words),
    t('mail.proposalExpiring.heading', words),
    [t('mail.hello', { name: p.clientName }), t('mail.proposalExpiring.body', words)],
    { label: t('mail.proposalExpiring.action'), url: p.url },
    t('mail.proposalExpiring.linkOnce'),
    p.language,
  );
}
