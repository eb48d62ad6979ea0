import { INVOICE_KIND_LABELS, PAYMENT_METHOD_LABELS, type PaymentMethod } from '@layerbook/contracts';
import { billingFormats } from '../../billing/pdf/formats';
import { documentHeading } from '../../billing/pdf/heading';
import { summaryRows } from '../../billing/pdf/invoice-sections';
import { startDocument } from '../../billing/pdf/render-invoice';
import { filenameSlug } from '../../proposals/pdf/filename';
import { COLOURS, footers, paragraph, row, sectionHeading } from '../../proposals/pdf/page';
import type { PrintableReceipt } from './receipt-read';

/** `receipt-rct-0007-<job>.pdf`: safe ASCII for a Content-Disposition header. */
export function receiptFilename(number: string, jobTitle: string): string {
  return ['receipt', filenameSlug(number, 20), filenameSlug(jobTitle)].filter(Boolean).join('-') + '.pdf';
}

const isZero = (amount: string) => /^-?0*(\.0*)?$/.test(amount);

/** "Cheque 1042", "Card (online)", "Bank transfer TRF-88". */
const methodWords = (method: PaymentMethod, reference: string) => `${PAYMENT_METHOD_LABELS[method]}${reference ? ` ${reference}` : ''}`;

/**
 * A receipt PDF under the firm's heading (as its invoices): for a payment, what was received, how,
 * what went on the invoice and what was kept as credit; for a refund, what was given back and how;
 * both end with what is still due on the invoice on the day the receipt is printed.
 */
export function renderReceiptPdf(r: PrintableReceipt, logo: Buffer | null): Promise<Buffer> {
  const inv = r.invoice;
  const d = inv.document;
  const f = billingFormats(d.locale, r.currency);
  const isRefund = r.kind === 'refund';
  const invoiceNumber = inv.number ?? 'the invoice';
  const { doc, done } = startDocument(`${isRefund ? 'Refund receipt' : 'Receipt'} ${r.number} — ${d.jobTitle}`, d.firm.name);
  const facts: Array<readonly [string, string]> = [
    ['Number', r.number],
    ['Date', f.date(r.on)],
    ['For invoice', invoiceNumber],
  ];
  if (isRefund && r.payment.number) facts.push(['Payment', r.payment.number]);
  documentHeading(doc, d, logo, { title: isRefund ? 'REFUND RECEIPT' : 'RECEIPT', facts });

  const invoiceWords = `invoice ${invoiceNumber} (${INVOICE_KIND_LABELS[inv.kind]})`;
  if (isRefund) {
    sectionHeading(doc, `Refund ${r.number}`);
    const how =
      r.method === 'card'
        ? 'back to the card it was paid with'
        : `by ${PAYMENT_METHOD_LABELS[r.method].toLowerCase()}${r.reference ? ` ${r.reference}` : ''}`;
    const paid = r.payment.number ? `payment ${r.payment.number}` : 'the payment';
    row(doc, [
      { text: `Given back on ${f.date(r.on)} ${how}, from ${paid} of ${f.date(r.payment.receivedOn)} on ${invoiceWords}`, share: 0.7 },
      { text: f.minus(r.amount), share: 0.3, align: 'right' },
    ]);
    summaryRows(
      doc,
      [
        ['Given back', f.money(r.amount)],
        [`${paid[0].toUpperCase()}${paid.slice(1)} received`, f.money(r.payment.amount)],
        ['Refunded on that payment in all', f.money(r.payment.refunded)],
        [`Still due on ${invoiceNumber} on ${f.date(r.printedOn)}`, f.money(inv.amountDue)],
      ],
      true,
    );
    doc.moveDown(0.6);
    if (r.reason) paragraph(doc, `Reason: ${r.reason}`);
  } else {
    sectionHeading(doc, `Receipt ${r.number}`);
    row(doc, [
      { text: `${methodWords(r.method, r.reference)}, received ${f.date(r.on)}, for ${invoiceWords}`, share: 0.7 },
      { text: f.money(r.amount), share: 0.3, align: 'right' },
    ]);
    const rows: Array<readonly [string, string]> = [['Received', f.money(r.amount)]];
    rows.push([`Applied to ${invoiceNumber}`, f.money(r.payment.applied)]);
    if (!isZero(r.payment.credit)) rows.push([`Kept as credit for ${d.client.name}`, f.money(r.payment.credit)]);
    if (!isZero(r.payment.refunded)) rows.push(['Refunded since', f.minus(r.payment.refunded)]);
    rows.push([`Still due on ${invoiceNumber} on ${f.date(r.printedOn)}`, f.money(inv.amountDue)]);
    summaryRows(doc, rows, true);
    doc.moveDown(0.6);
    paragraph(doc, 'Thank you for your payment.', 'strong', COLOURS.ink, 10.5);
  }
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${r.number}`);
  doc.end();
  return done;
}
