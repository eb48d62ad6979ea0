import Decimal from 'decimal.js';
import { expectInputError } from '../errors/expect-input-error';
import { type StatementEntry, jobStatement } from './statement';

const text = (s: ReturnType<typeof jobStatement>): object => ({
  lines: s.lines.map((l) => `${l.on} ${l.kind} ${l.ref} +${l.charge.toFixed(2)} −${l.credit.toFixed(2)} = ${l.balance.toFixed(2)}`),
  invoiced: s.invoiced.toFixed(2),
  credited: s.credited.toFixed(2),
  paid: s.paid.toFixed(2),
  balanceDue: s.balanceDue.toFixed(2),
  unbilled: s.unbilled.toFixed(2),
});

// A running-balance statement of account, charges before receipts on one day (common practice, no source).
describe('job statement', () => {
  it('orders by date, invoices before payments on one day, with a running balance and totals', () => {
    const entries: StatementEntry[] = [
      { kind: 'payment', on: '2027-03-01', ref: 'Check 1042', amount: '1000.00' },
      { kind: 'invoice', on: '2027-03-12', ref: 'INV-0012', amount: '4000.00' },
      { kind: 'invoice', on: '2027-03-01', ref: 'INV-0007', amount: '1000.00' },
      { kind: 'creditNote', on: '2027-03-20', ref: 'CN-0001', amount: '4000.00' },
      { kind: 'invoice', on: '2027-03-20', ref: 'INV-0015', amount: '3800.00' },
      { kind: 'payment', on: '2027-03-25', ref: 'Transfer', amount: '2000.00' },
    ];
    expect(text(jobStatement({ contractSum: '12000.00', currency: 'USD', entries }))).toEqual({
      lines: [
        '2027-03-01 invoice INV-0007 +1000.00 −0.00 = 1000.00',
        '2027-03-01 payment Check 1042 +0.00 −1000.00 = 0.00',
        '2027-03-12 invoice INV-0012 +4000.00 −0.00 = 4000.00',
        '2027-03-20 invoice INV-0015 +3800.00 −0.00 = 7800.00',
        '2027-03-20 creditNote CN-0001 +0.00 −4000.00 = 3800.00',
        '2027-03-25 payment Transfer +0.00 −2000.00 = 1800.00',
      ],
      invoiced: '8800.00',
      credited: '4000.00',
      paid: '3000.00',
      balanceDue: '1800.00',
      // 12,000 − (8,800 − 4,000)
      unbilled: '7200.00',
    });
  });

  it('a refund gives back part of a payment: a negative credit, the balance owed rises, paid is payments less refunds', () => {
    // common practice, no source: money returned to a customer reverses part of their payment on the account
    const s = jobStatement({
      contractSum: '3000.00',
      currency: 'USD',
      entries: [
        { kind: 'refund', on: '2027-05-10', ref: 'Refund to card', amount: '250.00' },
        { kind: 'invoice', on: '2027-05-01', ref: 'INV-0001', amount: '1000.00' },
        { kind: 'payment', on: '2027-05-02', ref: 'Card', amount: '1000.00' },
      ],
    });
    expect(text(s)).toEqual({
      lines: [
        '2027-05-01 invoice INV-0001 +1000.00 −0.00 = 1000.00',
        '2027-05-02 payment Card +0.00 −1000.00 = 0.00',
        '2027-05-10 refund Refund to card +0.00 −-250.00 = 250.00',
      ],
      invoiced: '1000.00',
      credited: '0.00',
      paid: '750.00',
      balanceDue: '250.00',
      unbilled: '2000.00',
    });
  });

  it('an empty statement owes nothing and has the whole contract to bill', () => {
    expect(text(jobStatement({ contractSum: '5000.00', currency: 'USD', entries: [] }))).toMatchObject({
      balanceDue: '0.00',
      unbilled: '5000.00',
    });
  });

  it('DOMAIN.md §2.11: invoice balance = contract sum to date − payments received − credits (a fully billed job)', () => {
    // contract 12,000 + change order 800 = 12,800 billed in full; a 300.00 goodwill credit; 9,000 paid
    const s = jobStatement({
      contractSum: '12800.00',
      currency: 'USD',
      entries: [
        { kind: 'invoice', on: '2027-04-01', ref: 'INV-0001', amount: '1000.00' },
        { kind: 'invoice', on: '2027-04-15', ref: 'INV-0002', amount: '6000.00' },
        { kind: 'payment', on: '2027-04-20', ref: 'Check', amount: '7000.00' },
        { kind: 'invoice', on: '2027-05-02', ref: 'INV-0003', amount: '5800.00' },
        { kind: 'creditNote', on: '2027-05-03', ref: 'CN-0001', amount: '300.00' },
        { kind: 'payment', on: '2027-05-10', ref: 'Check', amount: '2000.00' },
      ],
    });
    expect(s.balanceDue.toFixed(2)).toBe('3500.00');
    expect(s.balanceDue.equals(s.invoiced.minus(s.paid).minus(s.credited))).toBe(true);
    // with the job invoiced in full, the §2.11 formula reads from the contract sum: 12,800 − 9,000 − 300
    expect(s.balanceDue.equals(new Decimal('12800.00').minus(s.paid).minus(s.credited))).toBe(true);
    // and what the credit took off is what is left unbilled
    expect(s.unbilled.toFixed(2)).toBe('300.00');
    // always: what is owed plus what is still to bill = contract sum − payments
    expect(s.balanceDue.plus(s.unbilled).toFixed(2)).toBe('3800.00');
  });

  it('names the bad entry', () => {
    const ok: StatementEntry = { kind: 'invoice', on: '2027-04-01', ref: 'INV-0001', amount: '1000.00' };
    const call = (e: Partial<StatementEntry>) => () =>
      jobStatement({ contractSum: '1000.00', currency: 'USD', entries: [ok, { ...ok, ...e }] });
    expectInputError(call({ kind: 'rebate' as StatementEntry['kind'] }), 'entries[1].kind');
    expectInputError(call({ on: '2027-04-31' }), 'entries[1].on');
    expectInputError(call({ amount: '-5.00' }), 'entries[1].amount', /negative/);
    expectInputError(call({ amount: '5.001' }), 'entries[1].amount', /decimal places/);
    expectInputError(() => jobStatement({ contractSum: '1000', currency: 'usd', entries: [] }), 'currency');
  });
});
