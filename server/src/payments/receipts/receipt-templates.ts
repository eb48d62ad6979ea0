import { render, type RenderedMail } from '../../mail/templates';

/** What a receipt e-mail names, formatted already (money through formatMoney, dates in the firm's locale). */
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
  /** payments: what was kept as credit, formatted; null when nothing */
  readonly credit: string | null;
  /** refunds: the payment's receipt number it gives back from */
  readonly paymentNumber: string | null;
  readonly reason: string;
  /** the invoice in the portal, where the receipt downloads */
  readonly url: string;
}

/** "Receipt RCT-0007 — Kiln Lane Plaster": a payment received or a refund given back, and where the PDF is. */
export function receiptMail(p: ReceiptMailFacts): RenderedMail {
  const due = p.amountDue
    ? `${p.amountDue} is still due on invoice ${p.invoiceNumber}.`
    : `Nothing is due on invoice ${p.invoiceNumber} now.`;
  const lines =
    p.kind === 'payment'
      ? [
          `${p.firmName} received ${p.amount} from you ${p.how} on ${p.on} for invoice ${p.invoiceNumber} ("${p.jobTitle}"). Thank you.`,
          ...(p.credit ? [`${p.credit} of it was more than the invoice asked and is kept as credit on your account.`] : []),
          due,
        ]
      : [
          `${p.firmName} gave back ${p.amount} ${p.how} on ${p.on}${p.paymentNumber ? `, from your payment ${p.paymentNumber}` : ''} on invoice ${p.invoiceNumber} ("${p.jobTitle}").`,
          ...(p.reason ? [`Reason: ${p.reason}`] : []),
          ...(p.how.includes('card') ? ['A refund to a card can take several business days to show on your statement.'] : []),
          due,
        ];
  return render(
    `Receipt ${p.number} — ${p.firmName}`,
    p.kind === 'payment' ? `Payment received: receipt ${p.number}` : `Refund sent: receipt ${p.number}`,
    [
      `Hello ${p.clientName},`,
      ...lines,
      `Your receipt ${p.number} is on the invoice's page in your client portal, ready to download as a PDF.`,
    ],
    { label: 'See the receipt', url: p.url },
    `You are receiving this because ${p.firmName} is doing work for you. Sign in to your client portal to open the link.`,
  );
}
