import type { ProposalSnapshot, SnapshotOption } from '@layerbook/contracts';
import type { Formats } from './format';
import { COLOURS, paragraph, row, sectionHeading, subHeading, type Doc } from './page';

const head = { font: 'strong' as const };

/** The options compared on one table, then the add-ons priced on their own. */
export function pricesSection(doc: Doc, s: ProposalSnapshot, f: Formats): void {
  sectionHeading(doc, s.options.length === 1 ? 'Price' : 'Options and prices');
  row(
    doc,
    [
      { text: 'Option', share: 0.4, ...head },
      { text: 'Price', share: 0.2, align: 'right', ...head },
      { text: 'Tax', share: 0.2, align: 'right', ...head },
      { text: 'Total', share: 0.2, align: 'right', ...head },
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
  if (s.options.length > 1)
    paragraph(
      doc,
      'Choose one option when you accept; the schedule and payments below follow the option chosen.',
      'italic',
      COLOURS.muted,
      9,
    );
  if (s.addOns.length) {
    subHeading(doc, 'Add-ons (priced separately, added only if you ask for them)');
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

function scheduleOf(doc: Doc, o: SnapshotOption, f: Formats): void {
  const sched = o.schedule;
  paragraph(
    doc,
    `Starts ${f.date(sched.startDate)}, finishes ${f.date(sched.finishDate)}: ${sched.workingDays} working day${sched.workingDays === 1 ? '' : 's'}, dry and cure times included.`,
  );
  for (const m of sched.milestones)
    row(
      doc,
      [
        { text: m.id === 'job' ? m.label : `${m.label} complete`, share: 0.7 },
        { text: f.date(m.date), share: 0.3, align: 'right' },
      ],
      { size: 9.5 },
    );
}

function paymentsOf(doc: Doc, o: SnapshotOption, f: Formats): void {
  row(
    doc,
    [
      { text: 'Payment', share: 0.45, ...head },
      { text: 'When', share: 0.3, ...head },
      { text: 'Amount', share: 0.25, align: 'right', ...head },
    ],
    { shaded: true, size: 9.5 },
  );
  for (const p of o.payments) {
    const label = p.percent !== null ? `${p.label} (${p.percent} %)` : p.label;
    const when = p.trigger.kind === 'acceptance' ? 'On acceptance' : `Expected ${f.date(p.expectedOn ?? o.schedule.finishDate)}`;
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
      { text: 'Total', share: 0.75, ...head },
      { text: f.money(o.total), share: 0.25, align: 'right', ...head },
    ],
    { size: 9.5 },
  );
  if (o.isDepositCapped)
    paragraph(
      doc,
      'The deposit is limited to the amount the law allows here; the rest moves to the final payment.',
      'italic',
      COLOURS.ochre,
      9,
    );
}

/** Per option: when the work happens and how it is paid for. */
export function scheduleAndPaymentsSection(doc: Doc, s: ProposalSnapshot, f: Formats): void {
  sectionHeading(doc, 'Schedule and payments');
  for (const o of s.options) {
    subHeading(doc, s.options.length === 1 ? 'Schedule' : `${o.label}: schedule`);
    scheduleOf(doc, o, f);
    subHeading(doc, s.options.length === 1 ? 'Payment schedule' : `${o.label}: payment schedule`);
    paymentsOf(doc, o, f);
  }
  if (s.depositRule) paragraph(doc, `Deposit rule: ${s.depositRule}.`, 'italic', COLOURS.ochre, 9);
}
