import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { type PayApplicationInput, carryForward, computePayApplication, retainageRateFor } from './pay-application';

/**
 * DOMAIN.md §2.10 worked example [D]: application #2, retainage 10 % on work and on stored
 * materials. Arithmetic per the AIA G702/G703 summaries (help.aiacontracts.com), in our own labels.
 */
const APP2: PayApplicationInput = {
  currency: 'USD',
  originalContractSum: '48000.00',
  changeOrders: [
    { id: 'co1', number: 1, description: 'Faux beams', amount: '3200.00', status: 'approved' },
    { id: 'co2', number: 2, description: 'Stencil colour change', amount: '900.00', status: 'pending' },
  ],
  retainage: { work: 0.1, stored: 0.1 },
  previousCertified: '13320.00',
  lines: [
    {
      id: 'mob',
      label: 'Mobilization, protection, prep',
      scheduledValue: '6000',
      previousWork: '6000',
      thisPeriodWork: '0',
      storedMaterials: '0',
    },
    {
      id: 'walls',
      label: 'Venetian plaster, walls',
      scheduledValue: '22000',
      previousWork: '8800',
      thisPeriodWork: '8800',
      storedMaterials: '0',
    },
    {
      id: 'dome',
      label: 'Dome: lime plaster + glaze',
      scheduledValue: '14000',
      previousWork: '0',
      thisPeriodWork: '7000',
      storedMaterials: '0',
    },
    { id: 'frieze', label: 'Stenciled frieze', scheduledValue: '6000', previousWork: '0', thisPeriodWork: '0', storedMaterials: '1500' },
    { id: 'co1', label: 'CO #1 faux beams', scheduledValue: '3200', previousWork: '0', thisPeriodWork: '1600', storedMaterials: '0' },
  ],
};

describe('payment application arithmetic', () => {
  const app = computePayApplication(APP2);
  const s = app.summary;

  it('reproduces lines 1–9 of the worked example', () => {
    expect(
      [
        s.originalContractSum,
        s.netChangeOrders,
        s.contractSumToDate,
        s.completedAndStoredToDate,
        s.retainage,
        s.earnedLessRetainage,
        s.previousCertified,
        s.currentDue,
        s.balanceToFinishWithRetainage,
      ].map((x) => x.toFixed(2)),
    ).toEqual(['48000.00', '3200.00', '51200.00', '33700.00', '3370.00', '30330.00', '13320.00', '17010.00', '20870.00']);
    expect([s.retainageOnWork.toFixed(2), s.retainageOnStored.toFixed(2)]).toEqual(['3220.00', '150.00']);
  });

  it('reproduces the line columns and totals', () => {
    expect(
      app.lines.map((l) => [
        l.completedAndStored.toNumber(),
        l.shareComplete.times(100).toNumber(),
        l.balanceToFinish.toNumber(),
        l.retainage.toNumber(),
      ]),
    ).toEqual([
      [6000, 100, 0, 600],
      [17600, 80, 4400, 1760],
      [7000, 50, 7000, 700],
      [1500, 25, 4500, 150],
      [1600, 50, 1600, 160],
    ]);
    const t = app.totals;
    expect(
      [t.scheduledValue, t.previousWork, t.thisPeriodWork, t.storedMaterials, t.completedAndStored, t.balanceToFinish, t.retainage].map(
        (x) => x.toNumber(),
      ),
    ).toEqual([51200, 14800, 17400, 1500, 33700, 17500, 3370]);
    expect(t.shareComplete.times(100).toFixed(1)).toBe('65.8');
  });

  it('cross-check: with one retainage rate and nothing stored before, due = (work this period + stored) × (1 − r)', () => {
    expect(new Decimal(17400 + 1500).times(0.9).equals(s.currentDue)).toBe(true);
  });

  it('carries forward: this period moves into previous work; previous totals never change', () => {
    const next = carryForward(app);
    expect(next.map((l) => new Decimal(l.previousWork).toNumber())).toEqual([6000, 17600, 7000, 0, 1600]);
    const app3 = computePayApplication({ ...APP2, lines: next, previousCertified: s.earnedLessRetainage });
    expect(app3.summary.currentDue.toFixed(2)).toBe('0.00');
  });

  it('retainage steps down after 50 % complete (Saxton & Stump 2019, retainage refresher)', () => {
    const steps = [
      { fromShareComplete: 0, rate: 0.1 },
      { fromShareComplete: 0.5, rate: 0.05 },
    ];
    expect(retainageRateFor(0.3, steps).toString()).toBe('0.1');
    expect(retainageRateFor(0.658, steps).toString()).toBe('0.05');
  });

  it('billing never exceeds the contract (property): completed ≤ scheduled on every line', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 100 })), {
          minLength: 1,
          maxLength: 8,
        }),
        (parts) => {
          const lines = parts.map(([d, e, f], i) => {
            const c = 100;
            const prev = Math.min(d, c);
            const now = Math.min(e, c - prev);
            const stored = Math.min(f, c - prev - now);
            return {
              id: `l${i}`,
              label: `Line ${i}`,
              scheduledValue: String(c),
              previousWork: String(prev),
              thisPeriodWork: String(now),
              storedMaterials: String(stored),
            };
          });
          const a = computePayApplication({
            ...APP2,
            originalContractSum: String(100 * lines.length),
            changeOrders: [],
            lines,
            previousCertified: '0',
          });
          expect(a.summary.earnedLessRetainage.lessThanOrEqualTo(a.summary.contractSumToDate)).toBe(true);
          expect(a.summary.completedAndStoredToDate.lessThanOrEqualTo(a.summary.contractSumToDate)).toBe(true);
          expect(a.summary.balanceToFinishWithRetainage.isNegative()).toBe(false);
        },
      ),
    );
  });

  it('the line retainage adds up to the summary retainage, split by largest remainder (common practice, no source)', () => {
    // three lines of $33.35 at 10 %: each exact share is $3.335; the summary is 10 % of $100.05 = $10.01
    // (half up), so rounding each line alone would print $3.34 three times = $10.02
    const line = (id: string) => ({
      id,
      label: id,
      scheduledValue: '33.35',
      previousWork: '0',
      thisPeriodWork: '33.35',
      storedMaterials: '0',
    });
    const a = computePayApplication({
      ...APP2,
      originalContractSum: '100.05',
      changeOrders: [],
      lines: [line('a'), line('b'), line('c')],
      previousCertified: '0',
    });
    expect(a.summary.retainage.toFixed(2)).toBe('10.01');
    expect(a.lines.map((l) => l.retainage.toFixed(2))).toEqual(['3.34', '3.34', '3.33']);
    expect(a.totals.retainage.toFixed(2)).toBe('10.01');
  });

  it('line retainage always sums to the summary retainage (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 1, max: 1_000_000 }), fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 100 })), {
          minLength: 1,
          maxLength: 8,
        }),
        fc.integer({ min: 0, max: 100 }),
        fc.integer({ min: 0, max: 100 }),
        (parts, work, stored) => {
          const lines = parts.map(([cents, donePct, storedPct], i) => {
            const c = new Decimal(cents).div(100);
            const done = c.times(donePct).div(100).toDecimalPlaces(2, Decimal.ROUND_DOWN);
            const kept = Decimal.min(c.times(storedPct).div(100).toDecimalPlaces(2, Decimal.ROUND_DOWN), c.minus(done));
            return { id: `l${i}`, label: `Line ${i}`, scheduledValue: c, previousWork: '0', thisPeriodWork: done, storedMaterials: kept };
          });
          const sum = lines.reduce((t, l) => t.plus(l.scheduledValue), new Decimal(0));
          const a = computePayApplication({
            ...APP2,
            originalContractSum: sum,
            changeOrders: [],
            lines,
            retainage: { work: work / 100, stored: stored / 100 },
            previousCertified: '0',
          });
          const lineSum = a.lines.reduce((t, l) => t.plus(l.retainage), new Decimal(0));
          expect(lineSum.equals(a.summary.retainage)).toBe(true);
          expect(a.totals.retainage.equals(a.summary.retainage)).toBe(true);
        },
      ),
    );
  });

  it.each([
    // previously certified, current due, flagged (common practice, no source: an over-certified
    // application owes money back and must say so rather than show zero)
    ['13320.00', '17010.00', false],
    ['30330.00', '0.00', false],
    ['31000.00', '-670.00', true],
  ])('after %s certified the amount due is %s, over-certified %s', (previousCertified, due, flagged) => {
    const a = computePayApplication({ ...APP2, previousCertified });
    expect(a.summary.currentDue.toFixed(2)).toBe(due);
    expect(a.summary.isOverCertified).toBe(flagged);
  });

  describe('retainage that stops at a chosen share complete (common contract term; common practice, no source)', () => {
    // one $10,000 line, 10 % retainage, retainage stops at 50 % complete
    const one = (previous: string, now: string, stored = '0'): PayApplicationInput => ({
      currency: 'USD',
      originalContractSum: '10000.00',
      changeOrders: [],
      retainage: { work: 0.1, stored: 0.1, stopAtShareComplete: 0.5 },
      previousCertified: '0',
      lines: [
        { id: 'walls', label: 'Walls', scheduledValue: '10000', previousWork: previous, thisPeriodWork: now, storedMaterials: stored },
      ],
    });
    it.each([
      // previous work, this period, stored, retainage held, stopped
      ['0', '3000', '0', '300.00', false],
      ['3000', '1999', '0', '499.90', false],
      ['3000', '2000', '0', '500.00', true],
      ['3000', '4000', '0', '500.00', true],
      ['7000', '3000', '0', '500.00', true],
      ['3000', '0', '4000', '500.00', true],
      ['4000', '0', '500', '450.00', false],
    ])('previous %s + this period %s + stored %s → retainage %s (stopped %s)', (previous, now, stored, held, stopped) => {
      const a = computePayApplication(one(previous, now, stored));
      expect(a.summary.retainage.toFixed(2)).toBe(held);
      expect(a.lines[0].retainage.toFixed(2)).toBe(held);
      expect(a.summary.isRetainageStopped).toBe(stopped);
    });

    it('never releases what was held as the job goes on (property)', () => {
      fc.assert(
        fc.property(fc.array(fc.integer({ min: 0, max: 3000 }), { minLength: 1, maxLength: 8 }), (steps) => {
          let previous = new Decimal(0);
          let held = new Decimal(0);
          for (const step of steps) {
            const now = Decimal.min(new Decimal(step), new Decimal(10000).minus(previous));
            const a = computePayApplication(one(previous.toString(), now.toString()));
            expect(a.summary.retainage.greaterThanOrEqualTo(held)).toBe(true);
            expect(a.summary.retainage.lessThanOrEqualTo('500')).toBe(true);
            held = a.summary.retainage;
            previous = previous.plus(now);
          }
        }),
      );
    });

    it('keeps the worked example unchanged without a stop, and caps it at 50 % of the contract with one', () => {
      const capped = computePayApplication({ ...APP2, retainage: { work: 0.1, stored: 0.1, stopAtShareComplete: 0.5 } });
      // 50 % of $51,200 = $25,600 of work carries 10 %; the stored frieze is past the stop
      expect([capped.summary.retainageOnWork.toFixed(2), capped.summary.retainageOnStored.toFixed(2)]).toEqual(['2560.00', '0.00']);
      expect(capped.lines.reduce((t, l) => t.plus(l.retainage), new Decimal(0)).toFixed(2)).toBe('2560.00');
      expect(capped.summary.isRetainageStopped).toBe(true);
      expect(s.isRetainageStopped).toBe(false);
    });
  });

  it.each([
    [{ ...APP2, originalContractSum: '47000.00' }, 'lines', /not the contract sum to date/],
    [
      { ...APP2, lines: [{ ...APP2.lines[0], thisPeriodWork: '1' }, ...APP2.lines.slice(1)] },
      'lines[0].thisPeriodWork',
      /more than the scheduled value/,
    ],
    [{ ...APP2, lines: [{ ...APP2.lines[0], storedMaterials: '-5' }, ...APP2.lines.slice(1)] }, 'lines[0].storedMaterials', /negative/],
    [{ ...APP2, retainage: { work: 1.2, stored: 0.1 } }, 'retainage.work', /more than 100 %/],
    [{ ...APP2, lines: [] }, 'lines', /empty/],
    [{ ...APP2, retainage: { work: 0.1, stored: 0.1, stopAtShareComplete: 1.5 } }, 'retainage.stopAtShareComplete', /more than 100 %/],
  ])('bad input %# names its field', (input, field, message) => {
    expectInputError(() => computePayApplication(input), field, message);
  });
});
