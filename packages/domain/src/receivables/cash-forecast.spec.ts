import { expectInputError } from '../errors/expect-input-error';
import { cashForecast } from './cash-forecast';

describe('cash forecast by ISO week (common practice, DOMAIN.md §2.14)', () => {
  const forecast = cashForecast({
    asOf: '2025-06-30', // a Monday
    weeks: 4,
    currency: 'USD',
    openInvoices: [
      { id: 'late', date: '2025-05-15', amount: '3000.00' },
      { id: 'soon', date: '2025-07-10', amount: '2000.00' },
    ],
    milestones: [{ id: 'plaster', date: '2025-07-16', amount: '5000.00', probability: 0.8 }],
    pipelineDeposits: [
      { id: 'sample', date: '2025-07-06', amount: '1000.00', probability: 0.7 },
      { id: 'far', date: '2025-09-01', amount: '1000.00', probability: 0.5 },
    ],
  });

  it('buckets receipts into weeks starting Monday; overdue money lands in the first week', () => {
    expect(
      forecast.weeks.map((w) => [
        w.weekStart,
        w.isoWeek,
        w.invoices.toFixed(2),
        w.milestones.toFixed(2),
        w.pipeline.toFixed(2),
        w.total.toFixed(2),
      ]),
    ).toEqual([
      ['2025-06-30', '2025-W27', '3000.00', '0.00', '700.00', '3700.00'],
      ['2025-07-07', '2025-W28', '2000.00', '0.00', '0.00', '2000.00'],
      ['2025-07-14', '2025-W29', '0.00', '4000.00', '0.00', '4000.00'],
      ['2025-07-21', '2025-W30', '0.00', '0.00', '0.00', '0.00'],
    ]);
    expect(forecast.beyondHorizon.toFixed(2)).toBe('500.00');
    expect(Object.values(forecast.beyond).map((d) => d.toFixed(2))).toEqual(['0.00', '0.00', '500.00']);
  });

  it('names bad fields', () => {
    expectInputError(
      () => cashForecast({ asOf: '2025-06-30', weeks: 0, currency: 'USD', openInvoices: [], milestones: [], pipelineDeposits: [] }),
      'weeks',
    );
    expectInputError(
      () =>
        cashForecast({
          asOf: '2025-06-30',
          weeks: 2,
          currency: 'USD',
          openInvoices: [],
          milestones: [{ id: 'm', date: '2025-07-01', amount: '5', probability: 2 }],
          pipelineDeposits: [],
        }),
      'milestones[0].probability',
    );
  });
});
