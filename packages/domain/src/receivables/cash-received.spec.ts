import { expectInputError } from '../errors/expect-input-error';
import { cashReceivedByMonth, monthsEnding } from './cash-received';

/** Cash basis — money counted when it comes in or goes out (common practice, no source). */
describe('cash received by month', () => {
  it('lists the twelve months ending with the given one, across a year end', () => {
    expect(monthsEnding('2026-02', 12)).toEqual([
      '2025-03',
      '2025-04',
      '2025-05',
      '2025-06',
      '2025-07',
      '2025-08',
      '2025-09',
      '2025-10',
      '2025-11',
      '2025-12',
      '2026-01',
      '2026-02',
    ]);
  });

  it('counts payments less refunds by their own dates, each with its count', () => {
    const r = cashReceivedByMonth({
      endMonth: '2026-03',
      months: 3,
      payments: [
        { date: '2026-01-31', amount: '100.00' },
        { date: '2026-02-01', amount: '250.50', count: 3 },
        { date: '2025-12-31', amount: '999.00' }, // before the window
      ],
      refunds: [{ date: '2026-03-02', amount: '50.50' }],
    });
    expect(
      r.months.map((m) => [m.month, m.received.toFixed(2), m.paymentCount, m.refunded.toFixed(2), m.refundCount, m.net.toFixed(2)]),
    ).toEqual([
      ['2026-01', '100.00', 1, '0.00', 0, '100.00'],
      ['2026-02', '250.50', 3, '0.00', 0, '250.50'],
      ['2026-03', '0.00', 0, '50.50', 1, '-50.50'],
    ]);
    expect([r.totals.received.toFixed(2), r.totals.refunded.toFixed(2), r.totals.net.toFixed(2)]).toEqual(['350.50', '50.50', '300.00']);
  });

  it('names bad fields', () => {
    expectInputError(() => monthsEnding('2026-13', 12), 'endMonth');
    expectInputError(
      () => cashReceivedByMonth({ endMonth: '2026-01', months: 1, payments: [{ date: '2026-01-01', amount: '-1' }], refunds: [] }),
      'payments[0].amount',
    );
    expectInputError(
      () => cashReceivedByMonth({ endMonth: '2026-01', months: 1, payments: [], refunds: [{ date: 'Jan 1', amount: '1' }] }),
      'refunds[0].date',
    );
  });
});
