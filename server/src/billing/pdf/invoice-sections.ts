import type { InvoiceLine, ProgressTable } from '@layerbook/contracts';
import { type Cell, COLOURS, paragraph, row, sectionHeading, type Doc } from '../../proposals/pdf/page';
import { translator, type Translate } from '../../i18n/catalog';
import type { BillingFormats } from './formats';
import type { PrintableInvoice } from './printable';

const strong = { font: 'strong' as const };

/** The columns of a progress invoice, in our own words, after the work's name (keys under pdf.invoice.progress.columns). */
const PROGRESS_COLUMNS = ['scheduledValue', 'previousWork', 'thisPeriod', 'stored', 'toDate', 'percent', 'leftToDo', 'retainage'] as const;

const LABEL_SHARE = 0.18;
const NUMBER_SHARES = [0.11, 0.1, 0.1, 0.1, 0.11, 0.08, 0.11, 0.11] as const;

/** A deposit, stage, retainage or final invoice: what it bills, line by line. */
export function linesSection(doc: Doc, lines: readonly InvoiceLine[], f: BillingFormats, t: Translate = translator('en')): void {
  row(
    doc,
    [
      { text: t('pdf.invoice.description'), share: 0.75, ...strong },
      { text: t('pdf.invoice.amount'), share: 0.25, align: 'right', ...strong },
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
export function progressSection(doc: Doc, p: ProgressTable, f: BillingFormats, t: Translate = translator('en')): void {
  const w = (key: string, params?: Record<string, string | number>) => t(`pdf.invoice.progress.${key}`, params);
  progressRow(
    doc,
    w('work'),
    PROGRESS_COLUMNS.map((c) => w(`columns.${c}`)),
    { shaded: true, bold: true },
  );
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
  const held = [w('retainageRates', { work: rates.workPercent }), w('storedRate', { stored: rates.storedPercent })];
  if (rates.stopAtPercentComplete !== null) held.push(w('stopAt', { percent: rates.stopAtPercentComplete }));
  paragraph(doc, `${held.join(', ')}.`, 'italic', COLOURS.muted, 8.5);

  sectionHeading(doc, w('addsUp'));
  const s = p.summary;
  summaryRows(doc, [
    [w('originalContractSum'), f.money(s.originalContractSum)],
    [w('changeOrders'), f.money(s.changeOrders)],
    [w('contractSumToDate'), f.money(s.contractSumToDate)],
    [w('completedToDate'), f.money(s.completedToDate)],
    [w('retainage'), f.money(s.retainage)],
    [w('earnedLessRetainage'), f.money(s.earnedLessRetainage)],
    [w('previouslyBilled'), f.money(s.previouslyBilled)],
    [w('dueThisPeriod'), f.money(s.dueThisPeriod)],
    ...(s.retainageReleased ? [[w('retainageReleased'), f.money(s.retainageReleased)] as const] : []),
    [w('balanceToFinish'), f.money(s.balanceToFinishWithRetainage)],
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
export function totalsSection(doc: Doc, inv: PrintableInvoice, f: BillingFormats, t: Translate = translator('en')): void {
  const w = (key: string) => t(`pdf.invoice.totals.${key}`);
  sectionHeading(doc, w('heading'));
  const rows: Array<readonly [string, string]> = [[inv.progress ? w('earned') : w('subtotal'), f.money(inv.subtotal)]];
  if (!isZero(inv.depositCredit)) rows.push([w('depositCredit'), f.minus(inv.depositCredit)]);
  rows.push([w('total'), f.money(inv.total)]);
  rows.push([w('taxIncluded'), f.money(inv.taxIncluded)]);
  if (!isZero(inv.amountPaid)) rows.push([w('paid'), f.minus(inv.amountPaid)]);
  if (!isZero(inv.amountCredited)) rows.push([w('credited'), f.minus(inv.amountCredited)]);
  rows.push([w('due'), f.money(inv.amountDue)]);
  summaryRows(doc, rows, true);
}

/** A decimal string that is zero ("0", "0.00", "-0.00"), without arithmetic. */
const isZero = (amount: string) => /^-?0*(\.0*)?$/.test(amount);
