import { render, RenderedMail } from './templates';

export function inquiryAcknowledgementMail(p: { firmName: string; name: string }): RenderedMail {
  return render(
    `${p.firmName} received your inquiry`,
    'Thank you — we have your inquiry',
    [
      `Hello ${p.name},`,
      `${p.firmName} has your request and will be in touch soon to talk about the work and, if it helps, to arrange a visit.`,
    ],
    null,
    `You are receiving this because you sent an inquiry to ${p.firmName}.`,
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
    `Sent by Layerbook for ${p.firmName} each working morning when follow-ups are due.`,
  );
}
