import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { acceptedSum, type ShownPayment } from './accepted-add-ons';

const payments: ShownPayment[] = [
  { id: 'deposit', role: 'deposit', amount: '2500.00', percent: 25 },
  { id: 'base', role: 'milestone', amount: '4000.00', percent: 40 },
  { id: 'final', role: 'final', amount: '3500.00', percent: 35 },
];
const option = { total: '10000.00', tax: '740.74', payments };
const border = { id: 'border', price: '925.93', tax: '74.07', total: '1000.00' };
const wax = { id: 'wax', price: '200.00', tax: '16.00', total: '216.00' };

describe('acceptedSum: the contract an acceptance with add-ons makes', () => {
  it('takes the option exactly as shown when no add-on is chosen', () => {
    const sum = acceptedSum(option, [border, wax], [], 'USD');
    expect(sum.total.toFixed(2)).toBe('10000.00');
    expect(sum.payments.map((p) => [p.id, p.amount.toFixed(2), p.percent])).toEqual([
      ['deposit', '2500.00', 25],
      ['base', '4000.00', 40],
      ['final', '3500.00', 35],
    ]);
  });

  it('adds the add-ons to the sum and spreads them over the later payments by largest remainder', () => {
    // Worked by hand (largest remainder, common practice, no source): 8,500.00 split 4,000 : 3,500 is
    // 4,533.333… and 3,966.666…; floored that is 8,499.99, and the cent goes to the larger remainder.
    const sum = acceptedSum(option, [border, wax], ['border'], 'USD');
    expect(sum.total.toFixed(2)).toBe('11000.00');
    expect(sum.tax.toFixed(2)).toBe('814.81');
    expect(sum.payments.map((p) => [p.id, p.amount.toFixed(2), p.percent])).toEqual([
      ['deposit', '2500.00', 25],
      ['base', '4533.33', null],
      ['final', '3966.67', null],
    ]);
  });

  it('puts the add-ons on the last line of a plan paid in full on signing', () => {
    const sum = acceptedSum(
      { total: '800.00', tax: '0', payments: [{ id: 'all', role: 'deposit', amount: '800.00', percent: 100 }] },
      [wax],
      ['wax'],
      'USD',
    );
    expect(sum.payments.map((p) => [p.amount.toFixed(2), p.percent])).toEqual([['1016.00', null]]);
  });

  it('refuses an add-on the proposal does not offer, or one chosen twice, naming the entry', () => {
    expectInputError(() => acceptedSum(option, [border], ['stencil'], 'USD'), 'addOnIds.0');
    expectInputError(() => acceptedSum(option, [border, wax], ['wax', 'wax'], 'USD'), 'addOnIds.1');
  });

  it('keeps the deposit and adds up to the new sum to the cent, for any add-ons (property)', () => {
    const cents = fc.integer({ min: 0, max: 5_000_000 }).map((c) => new Decimal(c).div(100).toFixed(2));
    fc.assert(
      fc.property(
        fc.array(cents, { minLength: 1, maxLength: 6 }),
        fc.array(fc.integer({ min: 1, max: 900_000 }), { minLength: 2, maxLength: 5 }),
        (addOnTotals, parts) => {
          const shown: ShownPayment[] = parts.map((c, i) => ({
            id: `p${i}`,
            role: i === 0 ? 'deposit' : i === parts.length - 1 ? 'final' : 'milestone',
            amount: new Decimal(c).div(100).toFixed(2),
            percent: null,
          }));
          const base = shown.reduce((s, p) => s.plus(p.amount), new Decimal(0)).toFixed(2);
          const addOns = addOnTotals.map((t, i) => ({ id: `a${i}`, price: t, tax: '0', total: t }));
          const sum = acceptedSum(
            { total: base, tax: '0', payments: shown },
            addOns,
            addOns.map((a) => a.id),
            'USD',
          );
          const paid = sum.payments.reduce((s, p) => s.plus(p.amount), new Decimal(0));
          expect(paid.equals(sum.total)).toBe(true);
          expect(sum.payments[0].amount.toFixed(2)).toBe(shown[0].amount);
          expect(sum.payments.every((p) => p.amount.decimalPlaces() <= 2 && !p.amount.isNegative())).toBe(true);
        },
      ),
    );
  });
});
