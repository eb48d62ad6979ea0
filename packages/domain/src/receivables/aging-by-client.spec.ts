import { ageReceivables } from './aging';
import { agingByClient } from './aging-by-client';

/** An aging report's per-customer rows sum each customer's invoices by bucket (common practice, no source). */
describe('aging by client', () => {
  it('sums each client’s invoices by bucket, retainage apart, largest first', () => {
    const report = ageReceivables(
      [
        { id: 'a1', dueDate: '2026-06-20', amount: '100.00' },
        { id: 'a2', dueDate: '2026-04-01', amount: '50.00', retainageHeld: '10.00' },
        { id: 'b1', dueDate: '2026-07-10', amount: '500.00', payments: ['120.00'] },
      ],
      '2026-06-30',
    );
    const clients = { a1: 'ann', a2: 'ann', b1: 'bob' } as Record<string, string>;
    const rows = agingByClient(report.invoices, (id) => clients[id]);
    expect(rows.map((r) => [r.clientId, r.total.toFixed(2), r.retainage.toFixed(2), r.invoiceCount])).toEqual([
      ['bob', '380.00', '0.00', 1],
      ['ann', '140.00', '10.00', 2],
    ]);
    expect(rows[1].buckets['1-30'].toFixed(2)).toBe('100.00');
    expect(rows[1].buckets['61-90'].toFixed(2)).toBe('40.00');
    // the client rows add up to the report
    expect(rows.reduce((s, r) => s.plus(r.total), report.total.minus(report.total)).toFixed(2)).toBe(report.total.toFixed(2));
  });
});
