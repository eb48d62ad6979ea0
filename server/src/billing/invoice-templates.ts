import type { Language } from '@layerbook/contracts';
import { translator } from '../i18n/catalog';
import { render, type RenderedMail } from '../mail/templates';

/** What every invoice e-mail names: formatted already (money through formatMoney, dates for the client's language and the firm's country). */
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
  /** the client's language (theirs, else the firm's); English when left out */
  readonly language?: Language;
}

const wordsOf = (p: InvoiceMailFacts) => translator(p.language ?? 'en');

function linkWords(p: InvoiceMailFacts): string[] {
  const t = wordsOf(p);
  return [p.linkDays === null ? t('mail.invoice.linkSignIn') : t('mail.invoice.linkOnce', { days: p.linkDays })];
}

const footer = (p: InvoiceMailFacts) => wordsOf(p)('mail.invoice.footer', { portalUrl: p.portalUrl, firm: p.firmName });

/** The invoice, just issued: "Invoice INV-0007 from Kiln Lane Plaster: $1,000.00 due December 15, 2026". */
export function invoiceIssuedMail(p: InvoiceMailFacts): RenderedMail {
  const t = wordsOf(p);
  const names = { number: p.number, firm: p.firmName, amount: p.amountDue, dueOn: p.dueOn };
  return render(
    t('mail.invoice.issued.subject', names),
    t('mail.invoice.issued.heading', names),
    [
      t('mail.hello', { name: p.clientName }),
      t('mail.invoice.issued.sent', { ...names, kind: p.kindLabel, job: p.jobTitle }),
      t('mail.invoice.issued.amountDue', { ...names, terms: p.termsText }),
      ...linkWords(p),
    ],
    { label: t('mail.invoice.open'), url: p.url },
    footer(p),
    p.language ?? 'en',
  );
}

/** A reminder's words by its step: a few days before, on the day, or after the due date. */
export function reminderWords(
  step: string,
  p: Pick<InvoiceMailFacts, 'number' | 'firmName' | 'amountDue' | 'dueOn' | 'language'>,
): { subject: string; heading: string; lead: string } {
  const t = translator(p.language ?? 'en');
  const when = step.startsWith('before:') ? 'before' : step === 'due' ? 'due' : 'after';
  const names = { number: p.number, firm: p.firmName, amount: p.amountDue, dueOn: p.dueOn };
  return {
    subject: t(`mail.invoice.reminder.${when}.subject`, names),
    heading: t(`mail.invoice.reminder.${when}.heading`, names),
    lead: t(`mail.invoice.reminder.${when}.lead`, names),
  };
}

export function invoiceReminderMail(p: InvoiceMailFacts, step: string): RenderedMail {
  const t = wordsOf(p);
  const words = reminderWords(step, p);
  return render(
    words.subject,
    words.heading,
    [
      t('mail.hello', { name: p.clientName }),
      words.lead,
      t('mail.invoice.reminder.forJob', { job: p.jobTitle, kind: p.kindLabel }),
      ...linkWords(p),
    ],
    { label: t('mail.invoice.open'), url: p.url },
    footer(p),
    p.language ?? 'en',
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
  const t = wordsOf(p);
  const names = { creditNote: p.creditNoteNumber, firm: p.firmName, number: p.number };
  return render(
    t('mail.invoice.creditNote.subject', names),
    t('mail.invoice.creditNote.heading', names),
    [
      t('mail.hello', { name: p.clientName }),
      t('mail.invoice.creditNote.cancelled', { ...names, job: p.jobTitle, voidedAt: p.voidedAt, amount: p.amount }),
      t('mail.invoice.creditNote.reason', { reason: p.reason }),
      t(p.linkDays === null ? 'mail.invoice.creditNote.owesNothingSignIn' : 'mail.invoice.creditNote.owesNothingOpen', names),
    ],
    { label: t('mail.invoice.creditNote.action'), url: p.url },
    footer(p),
    p.language ?? 'en',
  );
}
