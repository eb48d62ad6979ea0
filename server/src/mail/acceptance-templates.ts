import type { Language } from '@layerbook/contracts';
import { translator } from '../i18n/catalog';
import { render, RenderedMail } from './templates';

/** To each owner and office member: a client accepted; the job and its draft payment schedule exist. */
export function proposalAcceptedMail(p: {
  firmName: string;
  clientName: string;
  title: string;
  version: number;
  optionLabel: string;
  total: string;
  signedName: string;
  signedOn: string;
  url: string;
  /** the deposit invoice issued and sent at acceptance (the firm's billing setting), or null */
  depositNumber: string | null;
}): RenderedMail {
  return render(
    `${p.clientName} accepted ${p.title}`,
    'A proposal was accepted',
    [
      `${p.clientName} accepted version ${p.version} of "${p.title}", choosing "${p.optionLabel}" for ${p.total}.`,
      `Signed by typing the name "${p.signedName}" on ${p.signedOn}.`,
      p.depositNumber === null
        ? 'The job has been made with a draft payment schedule taken from the proposal. Check it before the deposit invoice goes out.'
        : `The job has been made with a payment schedule taken from the proposal, and deposit invoice ${p.depositNumber} was issued and e-mailed to the client, as your billing settings say. Check the rest of the schedule on the job.`,
    ],
    { label: 'Open the job', url: p.url },
    `You are receiving this as an owner or the office of ${p.firmName}.`,
  );
}

/** To the client, in their language (`language`; English when the caller does not say): a copy of what they accepted. */
export function proposalAcceptedClientMail(p: {
  firmName: string;
  clientName: string;
  title: string;
  version: number;
  optionLabel: string;
  total: string;
  signedName: string;
  signedOn: string;
  reference: string;
  url: string;
  language?: Language;
  /** the deposit invoice sent in its own e-mail at acceptance, or null */
  depositNumber: string | null;
}): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const firm = p.firmName;
  return render(
    t('mail.proposalAccepted.subject', { firm, title: p.title }),
    t('mail.proposalAccepted.heading'),
    [
      t('mail.hello', { name: p.clientName }),
      t('mail.proposalAccepted.accepted', { version: p.version, title: p.title, firm, option: p.optionLabel, total: p.total }),
      t('mail.proposalAccepted.signed', { signedName: p.signedName, signedOn: p.signedOn, reference: p.reference }),
      p.depositNumber === null
        ? t('mail.proposalAccepted.next', { firm })
        : t('mail.proposalAccepted.nextDepositSent', { firm, number: p.depositNumber }),
    ],
    { label: t('mail.proposalAccepted.action'), url: p.url },
    t('mail.proposalAccepted.footer', { firm }),
    language,
  );
}

/** To each owner and office member: the client declined or asked for changes. */
export function proposalAnsweredMail(p: {
  firmName: string;
  clientName: string;
  title: string;
  version: number;
  answer: 'declined' | 'changes_requested';
  comment: string;
  url: string;
}): RenderedMail {
  const declined = p.answer === 'declined';
  return render(
    declined ? `${p.clientName} declined ${p.title}` : `${p.clientName} asked for changes to ${p.title}`,
    declined ? 'A proposal was declined' : 'A client asked for changes',
    [
      declined
        ? `${p.clientName} declined version ${p.version} of "${p.title}".`
        : `${p.clientName} asked for changes to version ${p.version} of "${p.title}". Make a new version and send it when it is ready.`,
      p.comment ? `Their words: "${p.comment}"` : 'They left no comment.',
    ],
    { label: 'Open the estimate', url: p.url },
    `You are receiving this as an owner or the office of ${p.firmName}.`,
  );
}
