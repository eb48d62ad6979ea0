import { printingFor } from '../../billing/pdf/formats';
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

const capitalised = (s: string) => `${s.charAt(0).toUpperCase()}${s.slice(1)}`;
const withReference = (words: string, reference: string) => `${words}${reference ? ` ${reference}` : ''}`;

/**
 * A receipt PDF under the firm's heading (as its invoices), in the client's language: for a payment,
 * what was received, how, what went on the invoice and what was kept as credit; for a refund, what
 * was given back and how; both end with what is still due on the invoice on the day it is printed,
 * in the invoice's own currency (a card payment may come in another) — except on an invoice whose
 * payments were all given back, which the firm does not chase.
 */
export function renderReceiptPdf(r: PrintableReceipt, logo: Buffer | null): Promise<Buffer> {
  const inv = r.invoice;
  const d = inv.document;
  const { t, f } = printingFor(inv, r.currency);
  const inInvoiceCurrency = printingFor(inv, inv.currency).f;
  const w = (key: string, params?: Record<string, string>) => t(`pdf.receipt.${key}`, params);
  const isRefund = r.kind === 'refund';
  const invoiceNumber = inv.number ?? w('theInvoice');
  const { doc, done } = startDocument(
    `${isRefund ? w('refundName', { number: r.number }) : w('name', { number: r.number })} — ${d.jobTitle}`,
    d.firm.name,
  );
  const facts: Array<readonly [string, string]> = [
    [t('pdf.number'), r.number],
    [t('pdf.date'), f.date(r.on)],
    [t('pdf.forInvoice'), invoiceNumber],
  ];
  if (isRefund && r.payment.number) facts.push([t('pdf.payment'), r.payment.number]);
  documentHeading(doc, d, logo, { title: isRefund ? w('refundTitle') : w('title'), facts }, t);

  const invoiceWords = w('invoiceWords', { number: invoiceNumber, kind: t(`pdf.invoice.kinds.${inv.kind}`) });
  const stillDue: ReadonlyArray<readonly [string, string]> =
    inv.status === 'refunded'
      ? []
      : [[w('stillDue', { invoice: invoiceNumber, date: f.date(r.printedOn) }), inInvoiceCurrency.money(inv.amountDue)]];
  if (isRefund) {
    sectionHeading(doc, w('refundHeading', { number: r.number }));
    const how = r.method === 'card' ? w('backToCard') : withReference(w(`refundBy.${r.method}`), r.reference);
    const paid = r.payment.number ? w('paymentNumber', { number: r.payment.number }) : w('thePayment');
    row(doc, [
      {
        text: w('givenBackLine', { date: f.date(r.on), how, payment: paid, paidOn: f.date(r.payment.receivedOn), invoice: invoiceWords }),
        share: 0.7,
      },
      { text: f.minus(r.amount), share: 0.3, align: 'right' },
    ]);
    summaryRows(
      doc,
      [
        [w('givenBack'), f.money(r.amount)],
        [capitalised(w('paymentReceived', { payment: paid })), f.money(r.payment.amount)],
        [w('refundedAll'), f.money(r.payment.refunded)],
        ...stillDue,
      ],
      true,
    );
    doc.moveDown(0.6);
    if (r.reason) paragraph(doc, t('pdf.reason', { reason: r.reason }));
  } else {
    sectionHeading(doc, w('heading', { number: r.number }));
    row(doc, [
      {
        text: w('receivedLine', {
          method: withReference(w(`methods.${r.method}`), r.reference),
          date: f.date(r.on),
          invoice: invoiceWords,
        }),
        share: 0.7,
      },
      { text: f.money(r.amount), share: 0.3, align: 'right' },
    ]);
    const rows: Array<readonly [string, string]> = [[w('received'), f.money(r.amount)]];
    rows.push([w('appliedTo', { invoice: invoiceNumber }), f.money(r.payment.applied)]);
    if (!isZero(r.payment.credit)) rows.push([w('keptAsCredit', { client: d.client.name }), f.money(r.payment.credit)]);
    if (!isZero(r.payment.refunded)) rows.push([w('refundedSince'), f.minus(r.payment.refunded)]);
    rows.push(...stillDue);
    summaryRows(doc, rows, true);
    doc.moveDown(0.6);
    paragraph(doc, w('thanks'), 'strong', COLOURS.ink, 10.5);
  }
  if (d.footer) {
    doc.moveDown(0.6);
    paragraph(doc, d.footer, 'text', COLOURS.muted, 9);
  }
  footers(doc, `${d.firm.name} · ${r.number}`, t);
  doc.end();
  return done;
}
