import { expectInputError } from '../errors/expect-input-error';
import { AGING_BUCKETS, ageReceivables, bucketDueDates, bucketFor } from './aging';
import { agingByClient } from './aging-by-client';

/** DOMAIN.md §2.12 [D]; buckets by days past due are an accounting convention (common practice). */
describe('receivables aging', () => {
  const report = ageReceivables(
    [
      { id: 'a', dueDate: '2025-07-10', amount: '2000.00' },
      { id: 'b', dueDate: '2025-06-20', amount: '1500.00' },
      { id: 'c', dueDate: '2025-05-15', amount: '3000.00' },
      { id: 'd', dueDate: '2025-04-10', amount: '800.00' },
      { id: 'e', dueDate: '2025-02-28', amount: '1200.00' },
    ],
    '2025-06-30',
  );

  it('puts each invoice in its bucket by days past due', () => {
    expect(report.invoices.map((i) => [i.id, i.daysPastDue, i.bucket])).toEqual([
      ['a', -10, 'current'],
      ['b', 10, '1-30'],
      ['c', 46, '31-60'],
      ['d', 81, '61-90'],
      ['e', 122, '90+'],
    ]);
    expect(Object.fromEntries(Object.entries(report.buckets).map(([k, v]) => [k, v.toFixed(2)]))).toEqual({
      current: '2000.00',
      '1-30': '1500.00',
      '31-60': '3000.00',
      '61-90': '800.00',
      '90+': '1200.00',
    });
    expect(report.total.toFixed(2)).toBe('8500.00');
  });

  it('keeps retainage apart and lets partial payments reduce the open balance', () => {
    const r = ageReceivables(
      [
        { id: 'pay-app', dueDate: '2025-06-01', amount: '18900.00', retainageHeld: '1890.00', payments: ['10000.00'] },
        { id: 'edge', dueDate: '2025-05-31', amount: '100.00' },
      ],
      '2025-06-30',
    );
    expect(r.invoices[0].open.toFixed(2)).toBe('7010.00');
    expect(r.invoices[0].bucket).toBe('1-30');
    expect(r.invoices[1].bucket).toBe('1-30'); // 30 days past due is still 1–30
    expect(r.retainage.toFixed(2)).toBe('1890.00');
    expect(r.total.toFixed(2)).toBe('7110.00');
  });

  it('30 days past due is the last day of 1–30; 31 opens 31–60; the due day itself is current (common practice, no source)', () => {
    expect([0, 1, 30, 31, 60, 61, 90, 91].map(bucketFor)).toEqual(['current', '1-30', '1-30', '31-60', '31-60', '61-90', '61-90', '90+']);
  });

  it('names bad fields', () => {
    expectInputError(() => ageReceivables([{ id: 'x', dueDate: 'June 1', amount: '1.00' }], '2025-06-30'), 'invoices[0].dueDate');
    expectInputError(
      () => ageReceivables([{ id: 'x', dueDate: '2025-06-01', amount: '1.00', payments: ['-2'] }], '2025-06-30'),
      'invoices[0].payments[0]',
    );
    expectInputError(() => ageReceivables([], 'today'), 'asOf');
  });
});

describe('an age as due dates', () => {
  const asOf = '2025-06-30';

  it('gives each age the due dates whose days past due fall in it, ends included (common practice, no source)', () => {
    expect(bucketDueDates('current', asOf)).toEqual({ from: '2025-06-30', to: null });
    expect(bucketDueDates('1-30', asOf)).toEqual({ from: '2025-05-31', to: '2025-06-29' });
    expect(bucketDueDates('31-60', asOf)).toEqual({ from: '2025-05-01', to: '2025-05-30' });
    expect(bucketDueDates('61-90', asOf)).toEqual({ from: '2025-04-01', to: '2025-04-30' });
    expect(bucketDueDates('90+', asOf)).toEqual({ from: null, to: '2025-03-31' });
  });

  it('agrees with the aging for every due date a year either side', () => {
    const due = (offset: number) => new Date(Date.UTC(2025, 5, 30 - offset)).toISOString().slice(0, 10);
    for (let days = -365; days <= 365; days++) {
      const [aged] = ageReceivables([{ id: 'x', dueDate: due(days), amount: '1.00' }], asOf).invoices;
      for (const bucket of AGING_BUCKETS) {
        const { from, to } = bucketDueDates(bucket, asOf);
        const inside = (from === null || due(days) >= from) && (to === null || due(days) <= to);
        expect([days, bucket, inside]).toEqual([days, bucket, aged.bucket === bucket]);
      }
    }
  });
});

describe('invoices due the same day summed first', () => {
  it('ages and counts the same as the invoices one by one', () => {
    const one = ageReceivables(
      [
        { id: 'a', dueDate: '2025-05-15', amount: '1000.00', retainageHeld: '100.00' },
        { id: 'b', dueDate: '2025-05-15', amount: '250.00' },
      ],
      '2025-06-30',
    );
    const summed = ageReceivables(
      [{ id: 'ab', dueDate: '2025-05-15', amount: '1250.00', retainageHeld: '100.00', invoiceCount: 2 }],
      '2025-06-30',
    );
    expect(summed.buckets['31-60'].toFixed(2)).toBe(one.buckets['31-60'].toFixed(2));
    expect(summed.retainage.toFixed(2)).toBe(one.retainage.toFixed(2));
    expect(agingByClient(summed.invoices, () => 'c')[0].invoiceCount).toBe(2);
    expectInputError(
      () => ageReceivables([{ id: 'x', dueDate: '2025-05-15', amount: '1.00', invoiceCount: 0 }], '2025-06-30'),
      'invoices[0].invoiceCount',
    );
  });
});
