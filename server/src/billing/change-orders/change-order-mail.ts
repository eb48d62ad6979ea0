import { render, type RenderedMail } from '../../mail/templates';

/** To the client: a change order to read and approve (or decline) in the portal. */
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
}): RenderedMail {
  return render(
    `${p.firmName} sent you change order #${p.number}: ${p.title}`,
    `A change to your job with ${p.firmName}`,
    [
      `Hello ${p.clientName},`,
      `${p.firmName} has written up change order #${p.number}, "${p.title}", for "${p.jobTitle}". It changes the contract sum by ${p.amount}.`,
      `You can read it in your client portal and approve it with your typed name, or decline it. Nothing changes until you approve.`,
      `The button signs you in once, within ${p.linkDays} days.`,
    ],
    { label: 'Read the change order', url: p.url },
    `Link used or expired? Ask for a new one at ${p.portalUrl}. You are receiving this because ${p.firmName} is working for you.`,
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
