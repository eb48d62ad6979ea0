import type { Language } from '@layerbook/contracts';
import { translator } from '../../i18n/catalog';
import { render, type RenderedMail } from '../../mail/templates';

/** What a receipt e-mail names, formatted already (money through formatMoney, dates for the client's language and the firm's country). */
export interface ReceiptMailFacts {
  readonly kind: 'payment' | 'refund';
  readonly firmName: string;
  readonly clientName: string;
  /** "RCT-0007" */
  readonly number: string;
  /** "INV-0007" */
  readonly invoiceNumber: string;
  readonly jobTitle: string;
  readonly amount: string;
  /** "by cheque 1042", "by card", "back to your card" */
  readonly how: string;
  readonly on: string;
  /** still due on the invoice, formatted; null when nothing is */
  readonly amountDue: string | null;
  /** the firm gave back all that was paid on the invoice: it is not chased, so the e-mail says nothing of what is due */
  readonly isInvoiceRefunded: boolean;
  /** payments: what was kept as credit, formatted; null when nothing */
  readonly credit: string | null;
  /** refunds: the payment's receipt number it gives back from */
  readonly paymentNumber: string | null;
  readonly reason: string;
  /** the invoice in the portal, where the receipt downloads */
  readonly url: string;
  /** a refund that went back to a card (it takes days to show) */
  readonly toCard: boolean;
  /** the client's language; English when left out */
  readonly language?: Language;
}

/** "Receipt RCT-0007 — Kiln Lane Plaster": a payment received or a refund given back, and where the PDF is. */
export function receiptMail(p: ReceiptMailFacts): RenderedMail {
  const language = p.language ?? 'en';
  const t = translator(language);
  const names = { firm: p.firmName, amount: p.amount, how: p.how, on: p.on, invoice: p.invoiceNumber, job: p.jobTitle };
  const due = p.isInvoiceRefunded
    ? []
    : [
        p.amountDue
          ? t('mail.receipt.stillDue', { amount: p.amountDue, invoice: p.invoiceNumber })
          : t('mail.receipt.nothingDue', { invoice: p.invoiceNumber }),
      ];
  const lines =
    p.kind === 'payment'
      ? [t('mail.receipt.received', names), ...(p.credit ? [t('mail.receipt.credit', { credit: p.credit })] : []), ...due]
      : [
          p.paymentNumber ? t('mail.receipt.givenBackFrom', { ...names, payment: p.paymentNumber }) : t('mail.receipt.givenBack', names),
          ...(p.reason ? [t('mail.receipt.reason', { reason: p.reason })] : []),
          ...(p.toCard ? [t('mail.receipt.cardDelay')] : []),
          ...due,
        ];
  return render(
    t('mail.receipt.subject', { number: p.number, firm: p.firmName }),
    t(p.kind === 'payment' ? 'mail.receipt.headingPayment' : 'mail.receipt.headingRefund', { number: p.number }),
    [t('mail.hello', { name: p.clientName }), ...lines, t('mail.receipt.onPortal', { number: p.number })],
    { label: t('mail.receipt.action'), url: p.url },
    t('mail.receipt.footer', { firm: p.firmName }),
    language,
  );
}
