import { render, RenderedMail } from './templates';

export function proposalSentMail(p: {
  firmName: string;
  clientName: string;
  title: string;
  version: number;
  expiresOn: string;
  url: string;
  linkDays: number;
  portalUrl: string;
}): RenderedMail {
  return render(
    `${p.firmName} sent you a proposal: ${p.title}`,
    `A proposal from ${p.firmName}`,
    [
      `Hello ${p.clientName},`,
      `${p.firmName} has sent you a proposal for "${p.title}" (version ${p.version}). It sets out the scope room by room, the options with their prices, the schedule and the payment schedule.`,
      `You can read it, download it as a PDF, accept an option or ask for changes in your client portal. The offer stands until ${p.expiresOn}.`,
      `The button signs you in once, within ${p.linkDays} days.`,
    ],
    { label: 'Read the proposal', url: p.url },
    `Link used or expired? Ask for a new one at ${p.portalUrl}. You are receiving this because ${p.firmName} prepared a proposal for you.`,
  );
}
