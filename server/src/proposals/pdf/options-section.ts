import type { ProposalSnapshot, SnapshotOption } from '@layerbook/contracts';
import type { Translate } from '../../i18n/catalog';
import type { Formats } from './format';
import { COLOURS, paragraph, row, sectionHeading, subHeading, type Doc } from './page';

const head = { font: 'strong' as const };

/** The options compared on one table, then the add-ons priced on their own. */
export function pricesSection(doc: Doc, s: ProposalSnapshot, f: Formats, t: Translate): void {
  sectionHeading(doc, s.options.length === 1 ? t('pdf.proposal.price') : t('pdf.proposal.optionsAndPrices'));
  row(
    doc,
    [
      { text: t('pdf.proposal.option'), share: 0.4, ...head },
      { text: t('pdf.proposal.price'), share: 0.2, align: 'right', ...head },
      { text: t('pdf.proposal.tax'), share: 0.2, align: 'right', ...head },
      { text: t('pdf.proposal.total'), share: 0.2, align: 'right', ...head },
    ],
    { shaded: true },
  );
  for (const o of s.options) {
    row(doc, [
      { text: o.label, share: 0.4 },
      { text: f.money(o.price), share: 0.2, align: 'right' },
      { text: f.money(o.tax), share: 0.2, align: 'right' },
      { text: f.money(o.total), share: 0.2, align: 'right', font: 'strong' },
    ]);
  }
  if (s.options.length > 1) paragraph(doc, t('pdf.proposal.chooseOne'), 'italic', COLOURS.muted, 9);
  if (s.addOns.length) {
    subHeading(doc, t('pdf.proposal.addOns'));
    for (const a of s.addOns) {
      row(doc, [
        { text: a.label, share: 0.4 },
        { text: f.money(a.price), share: 0.2, align: 'right' },
        { text: f.money(a.tax), share: 0.2, align: 'right' },
        { text: f.money(a.total), share: 0.2, align: 'right' },
      ]);
    }
  }
}

function scheduleOf(doc: Doc, o: SnapshotOption, f: Formats, t: Translate): void {
  const sched = o.schedule;
  const span = { start: f.date(sched.startDate), finish: f.date(sched.finishDate), days: sched.workingDays };
  paragraph(doc, t(sched.workingDays === 1 ? 'pdf.proposal.startsOneDay' : 'pdf.proposal.starts', span));
  for (const m of sched.milestones)
    row(
      doc,
      [
        { text: m.id === 'job' ? m.label : t('pdf.proposal.milestoneComplete', { label: m.label }), share: 0.7 },
        { text: f.date(m.date), share: 0.3, align: 'right' },
      ],
      { size: 9.5 },
    );
}

function paymentsOf(doc: Doc, o: SnapshotOption, f: Formats, t: Translate): void {
  row(
    doc,
    [
      { text: t('pdf.proposal.payment'), share: 0.45, ...head },
      { text: t('pdf.proposal.when'), share: 0.3, ...head },
      { text: t('pdf.proposal.amount'), share: 0.25, align: 'right', ...head },
    ],
    { shaded: true, size: 9.5 },
  );
  for (const p of o.payments) {
    const label = p.percent !== null ? `${p.label} (${p.percent} %)` : p.label;
    const when =
      p.trigger.kind === 'acceptance'
        ? t('pdf.proposal.onAcceptance')
        : t('pdf.proposal.expected', { date: f.date(p.expectedOn ?? o.schedule.finishDate) });
    row(
      doc,
      [
        { text: label, share: 0.45 },
        { text: when, share: 0.3 },
        { text: f.money(p.amount), share: 0.25, align: 'right' },
      ],
      { size: 9.5 },
    );
  }
  row(
    doc,
    [
      { text: t('pdf.proposal.total'), share: 0.75, ...head },
      { text: f.money(o.total), share: 0.25, align: 'right', ...head },
    ],
    { size: 9.5 },
  );
  if (o.isDepositCapped) paragraph(doc, t('pdf.proposal.depositCapped'), 'italic', COLOURS.ochre, 9);
}

/** Per option: when the work happens and how it is paid for. */
export function scheduleAndPaymentsSection(doc: Doc, s: ProposalSnapshot, f: Formats, t: Translate): void {
  sectionHeading(doc, t('pdf.proposal.scheduleAndPayments'));
  const single = s.options.length === 1;
  for (const o of s.options) {
    subHeading(doc, single ? t('pdf.proposal.schedule') : t('pdf.proposal.optionSchedule', { option: o.label }));
    scheduleOf(doc, o, f, t);
    subHeading(doc, single ? t('pdf.proposal.paymentSchedule') : t('pdf.proposal.optionPaymentSchedule', { option: o.label }));
    paymentsOf(doc, o, f, t);
  }
  if (s.depositRule) paragraph(doc, t('pdf.proposal.depositRule', { rule: s.depositRule }), 'italic', COLOURS.ochre, 9);
}
