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
  ])('bad input %# names its field', (input, field, message) => {
    expectInputError(() => computePayApplication(input), field, message);
  });
});
