import { render, type RenderedMail } from '../mail/templates';

/** What every invoice e-mail names: formatted already (money through formatMoney, dates in the firm's locale). */
export interface InvoiceMailFacts {
  readonly firmName: string;
  readonly clientName: string;
  /** "INV-0007" */
  readonly number: string;
  /** "Deposit", "Progress invoice" … */
  readonly kindLabel: string;
  readonly jobTitle: string;
  /** the amount due now, formatted */
  readonly amountDue: string;
  /** the due date, formatted */
  readonly dueOn: string;
  readonly termsText: string;
  /** the button: a one-time sign-in link that opens the invoice, or the invoice's portal address */
  readonly url: string;
  /** how long a one-time link works (null: the plain portal address) */
  readonly linkDays: number | null;
  /** where the client asks for a new sign-in link */
  readonly portalUrl: string;
}

function linkWords(p: InvoiceMailFacts): string[] {
  return p.linkDays === null
    ? ['Sign in to your client portal to read it and download the PDF.']
    : [`The button signs you in once, within ${p.linkDays} days, and opens the invoice; you can download the PDF there.`];
}

const footer = (p: InvoiceMailFacts) =>
  `Link used or expired? Ask for a new one at ${p.portalUrl}. You are receiving this because ${p.firmName} is doing work for you.`;

/** The invoice, just issued: "Invoice INV-0007 from Kiln Lane Plaster: $1,000.00 due December 15, 2026". */
export function invoiceIssuedMail(p: InvoiceMailFacts): RenderedMail {
  return render(
    `Invoice ${p.number} from ${p.firmName}: ${p.amountDue} due ${p.dueOn}`,
    `Invoice ${p.number} from ${p.firmName}`,
    [
      `Hello ${p.clientName},`,
      `${p.firmName} has sent you invoice ${p.number} (${p.kindLabel}) for "${p.jobTitle}".`,
      `Amount due: ${p.amountDue}, by ${p.dueOn}. Terms: ${p.termsText}.`,
      ...linkWords(p),
    ],
    { label: 'Open the invoice', url: p.url },
    footer(p),
  );
}

/** A reminder's words by its step: a few days before, on the day, or after the due date. */
export function reminderWords(step: string, p: Pick<InvoiceMailFacts, 'number' | 'firmName' | 'amountDue' | 'dueOn'>) {
  if (step.startsWith('before:')) {
    return {
      subject: `Reminder: invoice ${p.number} from ${p.firmName} is due ${p.dueOn}`,
      heading: 'A friendly reminder',
      lead: `Invoice ${p.number} for ${p.amountDue} is due on ${p.dueOn}. If you have already paid, thank you, and please ignore this note.`,
    };
  }
  if (step === 'due') {
    return {
      subject: `Invoice ${p.number} from ${p.firmName} is due today: ${p.amountDue}`,
      heading: 'Your invoice is due today',
      lead: `Invoice ${p.number} for ${p.amountDue} is due today, ${p.dueOn}. If you have already paid, thank you, and please ignore this note.`,
    };
  }
  return {
    subject: `Invoice ${p.number} from ${p.firmName} was due ${p.dueOn}: ${p.amountDue} still open`,
    heading: 'Your invoice is past its due date',
    lead: `Invoice ${p.number} was due on ${p.dueOn} and ${p.amountDue} is still open. If your payment is on its way, thank you; if something is wrong with the invoice, reply to this e-mail and ${p.firmName} will look at it.`,
  };
}

export function invoiceReminderMail(p: InvoiceMailFacts, step: string): RenderedMail {
  const words = reminderWords(step, p);
  return render(
    words.subject,
    words.heading,
    [`Hello ${p.clientName},`, words.lead, `The invoice is for "${p.jobTitle}" (${p.kindLabel}).`, ...linkWords(p)],
    { label: 'Open the invoice', url: p.url },
    footer(p),
  );
}

export interface CreditNoteMailFacts extends InvoiceMailFacts {
  /** "CN-0002" */
  readonly creditNoteNumber: string;
  /** the amount credited, formatted */
  readonly amount: string;
  readonly reason: string;
  /** when the invoice was voided, in the firm's zone */
  readonly voidedAt: string;
}

/** The invoice was voided: its credit note, why, and that nothing is owed on it. */
export function creditNoteMail(p: CreditNoteMailFacts): RenderedMail {
  return render(
    `Credit note ${p.creditNoteNumber} from ${p.firmName}: invoice ${p.number} is cancelled`,
    `Invoice ${p.number} is cancelled`,
    [
      `Hello ${p.clientName},`,
      `${p.firmName} cancelled invoice ${p.number} for "${p.jobTitle}" on ${p.voidedAt} with credit note ${p.creditNoteNumber} for ${p.amount}.`,
      `Reason: ${p.reason}`,
      `You owe nothing on invoice ${p.number}. ${p.linkDays === null ? 'Sign in to your client portal' : 'Open your client portal'} to see the credit note and your statement.`,
    ],
    { label: 'See the credit note', url: p.url },
    footer(p),
  );
}
