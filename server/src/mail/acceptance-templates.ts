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
}): RenderedMail {
  return render(
    `${p.clientName} accepted ${p.title}`,
    'A proposal was accepted',
    [
      `${p.clientName} accepted version ${p.version} of "${p.title}", choosing "${p.optionLabel}" for ${p.total}.`,
      `Signed by typing the name "${p.signedName}" on ${p.signedOn}.`,
      'The job has been made with a draft payment schedule taken from the proposal. Check it before the deposit invoice goes out.',
    ],
    { label: 'Open the job', url: p.url },
    `You are receiving this as an owner or the office of ${p.firmName}.`,
  );
}

/** To the client: a copy of what they accepted. */
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
}): RenderedMail {
  return render(
    `You accepted the proposal from ${p.firmName}: ${p.title}`,
    'Thank you — your acceptance is recorded',
    [
      `Hello ${p.clientName},`,
      `You accepted version ${p.version} of "${p.title}" from ${p.firmName}, choosing "${p.optionLabel}" for ${p.total}.`,
      `Signed as "${p.signedName}" on ${p.signedOn}. Proposal reference: ${p.reference}.`,
      `${p.firmName} will be in touch about the deposit and the start date. You can read the proposal and download it as a PDF in your client portal at any time.`,
    ],
    { label: 'See the proposal', url: p.url },
    `You are receiving this because you accepted a proposal from ${p.firmName}. If this was not you, reply to the firm at once.`,
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
