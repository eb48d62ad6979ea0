import type { InvoiceLine, ProgressTable } from '@layerbook/contracts';
import { type Cell, COLOURS, paragraph, row, sectionHeading, type Doc } from '../../proposals/pdf/page';
import type { BillingFormats } from './formats';
import type { PrintableInvoice } from './printable';

const strong = { font: 'strong' as const };

/** The columns of a progress invoice, in our own words, after the work's name. */
export const PROGRESS_COLUMNS = [
  'Scheduled value',
  'Done before',
  'Done this period',
  'Stored on site',
  'Done to date',
  '%',
  'Left to do',
  'Retainage held',
] as const;

const LABEL_SHARE = 0.18;
const NUMBER_SHARES = [0.11, 0.1, 0.1, 0.1, 0.11, 0.08, 0.11, 0.11] as const;

/** A deposit, stage, retainage or final invoice: what it bills, line by line. */
export function linesSection(doc: Doc, lines: readonly InvoiceLine[], f: BillingFormats): void {
  row(
    doc,
    [
      { text: 'Description', share: 0.75, ...strong },
      { text: 'Amount', share: 0.25, align: 'right', ...strong },
    ],
    { shaded: true },
  );
  for (const line of lines) {
    row(doc, [
      { text: line.note ? `${line.label}\n${line.note}` : line.label, share: 0.75 },
      { text: f.money(line.amount), share: 0.25, align: 'right' },
    ]);
  }
}

function progressRow(doc: Doc, label: string, values: readonly string[], opts: { shaded?: boolean; bold?: boolean } = {}): void {
  const font = opts.bold ? ('strong' as const) : ('text' as const);
  const cells: Cell[] = [
    { text: label, share: LABEL_SHARE, font },
    ...values.map((text, i): Cell => ({ text, share: NUMBER_SHARES[i], align: 'right', font })),
  ];
  row(doc, cells, { shaded: opts.shaded, size: 7.5 });
}

/** A progress invoice: the schedule of values as billed to the period's end, then how the amount due comes about. */
export function progressSection(doc: Doc, p: ProgressTable, f: BillingFormats): void {
  progressRow(doc, 'Work', PROGRESS_COLUMNS, { shaded: true, bold: true });
  for (const l of p.lines) {
    progressRow(doc, l.label, [
      f.money(l.scheduledValue),
      f.money(l.previousWork),
      f.money(l.thisPeriodWork),
      f.money(l.storedMaterials),
      f.money(l.completedToDate),
      `${l.percentComplete} %`,
      f.money(l.balanceToFinish),
      f.money(l.retainage),
    ]);
  }
  const rates = p.retainageRates;
  const held = [`Retainage: ${rates.workPercent} % of work done`, `${rates.storedPercent} % of materials stored on site`];
  if (rates.stopAtPercentComplete !== null) held.push(`no more held once the job is ${rates.stopAtPercentComplete} % done`);
  paragraph(doc, `${held.join(', ')}.`, 'italic', COLOURS.muted, 8.5);

  sectionHeading(doc, 'How this period adds up');
  const s = p.summary;
  summaryRows(doc, [
    ['Original contract sum', f.money(s.originalContractSum)],
    ['Change orders approved', f.money(s.changeOrders)],
    ['Contract sum to date', f.money(s.contractSumToDate)],
    ['Done to date, with materials stored on site', f.money(s.completedToDate)],
    ['Retainage held', f.money(s.retainage)],
    ['Earned, less retainage', f.money(s.earnedLessRetainage)],
    ['Billed before', f.money(s.previouslyBilled)],
    ['Due this period', f.money(s.dueThisPeriod)],
    ['Left to finish, retainage included', f.money(s.balanceToFinishWithRetainage)],
  ]);
}

/** Label on the left, amount on the right; the last row in bold when `boldLast`. */
export function summaryRows(doc: Doc, rows: ReadonlyArray<readonly [string, string]>, boldLast = false): void {
  rows.forEach(([label, value], i) => {
    const font = boldLast && i === rows.length - 1 ? ('strong' as const) : ('text' as const);
    row(
      doc,
      [
        { text: label, share: 0.7, font },
        { text: value, share: 0.3, align: 'right', font },
      ],
      { size: 9.5 },
    );
  });
}

/** The invoice's own totals: what it bills, the deposit taken off, the tax inside, what was paid or credited, and what is due. */
export function totalsSection(doc: Doc, inv: PrintableInvoice, f: BillingFormats): void {
  sectionHeading(doc, 'Summary');
  const rows: Array<readonly [string, string]> = [
    [inv.progress ? 'Earned this period, less retainage' : 'Subtotal', f.money(inv.subtotal)],
  ];
  if (!isZero(inv.depositCredit)) rows.push(['Deposit credit', f.minus(inv.depositCredit)]);
  rows.push(['Invoice total', f.money(inv.total)]);
  rows.push(['Tax included in the total', f.money(inv.taxIncluded)]);
  if (!isZero(inv.amountPaid)) rows.push(['Paid', f.minus(inv.amountPaid)]);
  if (!isZero(inv.amountCredited)) rows.push(['Credited', f.minus(inv.amountCredited)]);
  rows.push(['Amount due', f.money(inv.amountDue)]);
  summaryRows(doc, rows, true);
}

/** A decimal string that is zero ("0", "0.00", "-0.00"), without arithmetic. */
const isZero = (amount: string) => /^-?0*(\.0*)?$/.test(amount);
