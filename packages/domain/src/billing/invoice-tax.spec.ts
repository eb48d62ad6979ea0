import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { allocateByWeights } from '../money/allocate';
import { minorUnitDigits } from '../money/currency';
import { type IncludedTaxInput, includedTax } from './invoice-tax';

const base: IncludedTaxInput = {
  amount: '0',
  contractSum: '100.00',
  contractTax: '7.00',
  billedBefore: '0',
  taxBilledBefore: '0',
  currency: 'USD',
};
const tax = (over: Partial<IncludedTaxInput>): string => {
  const input = { ...base, ...over };
  return includedTax(input).toFixed(minorUnitDigits(input.currency));
};

// Tax inside a tax-inclusive price is price × tax ÷ (price + tax), rounded to the cent (common practice, no source).
describe('tax contained in an invoice when the contract sum includes tax', () => {
  it.each([
    // thirds of 100.00 with 7.00 tax inside, rounded on the running total: 33.33 × 7 / 100 = 2.3331 → 2.33;
    // 66.66 × 7 / 100 = 4.6662 → 4.67, less 2.33 = 2.34; the last third takes the rest, 7.00 − 4.67
    ['first third', { amount: '33.33' }, '2.33'],
    ['second third', { amount: '33.33', billedBefore: '33.33', taxBilledBefore: '2.33' }, '2.34'],
    ['last third closes the contract and takes 7.00 − 4.67', { amount: '33.34', billedBefore: '66.66', taxBilledBefore: '4.67' }, '2.33'],
    // 10,000 + 8.25 % = 10,825.00 with 825.00 tax; a 2,500.00 deposit holds 2,500 × 825 / 10,825 = 190.5311… → 190.53
    ['a deposit on a taxed contract', { amount: '2500.00', contractSum: '10825.00', contractTax: '825.00' }, '190.53'],
    ['half-cent rounds away from zero', { amount: '50.00', contractSum: '100.00', contractTax: '0.01' }, '0.01'],
    ['a credit carries negative tax', { amount: '-33.33', billedBefore: '66.66', taxBilledBefore: '4.66' }, '-2.33'],
    [
      'a credit that brings the billed total back to the contract takes the difference',
      { amount: '-10.00', billedBefore: '110.00', taxBilledBefore: '7.70' },
      '-0.70',
    ],
    ['no tax in the contract', { amount: '40.00', contractTax: '0' }, '0.00'],
    ['a zero contract', { amount: '0', contractSum: '0', contractTax: '0' }, '0.00'],
    ['the whole contract on one invoice', { amount: '100.00' }, '7.00'],
    ['yen have no minor unit', { amount: '3333', contractSum: '11000', contractTax: '1000', currency: 'JPY' }, '303'],
  ])('%s', (_name, over, expected) => expect(tax(over)).toBe(expected));

  it('names the bad field', () => {
    expectInputError(() => includedTax({ ...base, amount: '10.001' }), 'amount', /more than 2 decimal places/);
    expectInputError(() => includedTax({ ...base, contractSum: '-1.00' }), 'contractSum', /negative/);
    expectInputError(() => includedTax({ ...base, contractTax: '100.01' }), 'contractTax', /more than the contract sum/);
    expectInputError(() => includedTax({ ...base, billedBefore: 'ten' }), 'billedBefore', /not a number/);
    expectInputError(() => includedTax({ ...base, currency: 'XYZ' }), 'currency');
  });

  it('splitting a contract into N invoices, their tax adds up to the contract tax exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 100_000_000 }),
        fc.integer({ min: 0, max: 2_500 }),
        fc.array(fc.integer({ min: 1, max: 1_000 }), { minLength: 1, maxLength: 12 }),
        (cents, rateBasisPoints, weights) => {
          const price = new Decimal(cents).div(100);
          const contractTax = price.times(rateBasisPoints).div(10_000).toDecimalPlaces(2, Decimal.ROUND_HALF_UP);
          const contractSum = price.plus(contractTax);
          let billedBefore = new Decimal(0);
          let taxBilledBefore = new Decimal(0);
          for (const amount of allocateByWeights(contractSum, weights, 2)) {
            const t = includedTax({ amount, contractSum, contractTax, billedBefore, taxBilledBefore, currency: 'USD' });
            expect(t.abs().lessThanOrEqualTo(amount.abs())).toBe(true);
            billedBefore = billedBefore.plus(amount);
            taxBilledBefore = taxBilledBefore.plus(t);
          }
          expect(taxBilledBefore.equals(contractTax)).toBe(true);
        },
      ),
    );
  });
});
