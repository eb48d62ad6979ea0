import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { allocateByWeights } from '../money/allocate';
import { type DepositCreditInput, type DepositCreditRule, depositCredit } from './deposit-credit';

const base: DepositCreditInput = {
  rule: 'prorata',
  deposit: '1000.00',
  creditedBefore: '0',
  earnedBefore: '0',
  earnedThisInvoice: '0',
  contractSum: '12000.00',
  isFinal: false,
  currency: 'USD',
};
const credit = (over: Partial<DepositCreditInput>): string => depositCredit({ ...base, ...over }).toFixed(2);

/** Credits over a run of invoices, the last one final, as the invoice service would chain them. */
function creditsOver(
  rule: DepositCreditRule,
  deposit: Decimal,
  contractSum: Decimal,
  earned: readonly Decimal[],
  { lastIsFinal = true } = {},
): Decimal[] {
  let creditedBefore = new Decimal(0);
  let earnedBefore = new Decimal(0);
  return earned.map((e, i) => {
    const c = depositCredit({
      rule,
      deposit,
      creditedBefore,
      earnedBefore,
      earnedThisInvoice: e,
      contractSum,
      isFinal: lastIsFinal && i === earned.length - 1,
      currency: 'USD',
    });
    creditedBefore = creditedBefore.plus(c);
    earnedBefore = earnedBefore.plus(e);
    return c;
  });
}
const total = (xs: readonly Decimal[]): Decimal => xs.reduce((a, b) => a.plus(b), new Decimal(0));

// A $1,000 deposit on a $12,000 job (the California cap, DOMAIN.md §2.11) credited on later invoices (common practice, no source).
describe('deposit credited on progress invoices', () => {
  it.each<[string, Partial<DepositCreditInput>, string]>([
    // 1,000 × 4,000 / 12,000 = 333.333… → 333.33
    ['pro rata: a third of the work carries a third of the deposit', { earnedThisInvoice: '4000.00' }, '333.33'],
    // on totals to date: 1,000 × 9,000 / 12,000 = 750.00, less the 333.33 credited before
    [
      'pro rata: 1,000 × (4,000 + 5,000) / 12,000 − 333.33 = 416.67',
      { earnedThisInvoice: '5000.00', earnedBefore: '4000.00', creditedBefore: '333.33' },
      '416.67',
    ],
    [
      'pro rata never passes what is left (an invoice past the contract sum)',
      { earnedThisInvoice: '6000.00', earnedBefore: '9600.00', creditedBefore: '800.00' },
      '200.00',
    ],
    // three thirds of 10,000 rounded each: 333.33 + 333.33 + 333.34 (not 333.33 three times, leaving a cent)
    [
      'pro rata: the invoice that bills the contract in full takes the rest',
      { contractSum: '10000.00', earnedThisInvoice: '3333.34', earnedBefore: '6666.66', creditedBefore: '666.67' },
      '333.33',
    ],
    ['final takes the rest', { earnedThisInvoice: '3000.00', creditedBefore: '750.00', isFinal: true }, '250.00'],
    ['final takes the rest, capped at what it earns', { earnedThisInvoice: '100.00', creditedBefore: '750.00', isFinal: true }, '100.00'],
    ['next: all of it on the first invoice that can carry it', { rule: 'next', earnedThisInvoice: '4000.00' }, '1000.00'],
    ['next: capped at what the invoice earns', { rule: 'next', earnedThisInvoice: '600.00' }, '600.00'],
    ['next: then the rest', { rule: 'next', earnedThisInvoice: '600.00', creditedBefore: '600.00' }, '400.00'],
    ['next: nothing once used up', { rule: 'next', earnedThisInvoice: '600.00', creditedBefore: '1000.00' }, '0.00'],
    ['a negative correction earns nothing, so no credit', { earnedThisInvoice: '-200.00' }, '0.00'],
    ['no deposit, no credit', { deposit: '0', earnedThisInvoice: '4000.00', isFinal: true }, '0.00'],
  ])('%s', (_name, over, expected) => expect(credit(over)).toBe(expected));

  it('names the bad field', () => {
    expectInputError(() => depositCredit({ ...base, creditedBefore: '1000.01' }), 'creditedBefore', /more has been credited/i);
    expectInputError(() => depositCredit({ ...base, deposit: '-1.00' }), 'deposit', /negative/);
    expectInputError(() => depositCredit({ ...base, earnedThisInvoice: '1.005' }), 'earnedThisInvoice', /decimal places/);
    expectInputError(() => depositCredit({ ...base, contractSum: '0' }), 'contractSum', /greater than zero/);
    expectInputError(() => depositCredit({ ...base, rule: 'later' as DepositCreditRule }), 'rule');
  });

  it('next: over any run ending with the final invoice that earns at least the deposit, the credits add up to the deposit exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 10_000_000 }),
        fc.array(fc.integer({ min: 0, max: 5_000_000 }), { minLength: 1, maxLength: 12 }),
        (depositCents, earnedCents) => {
          const deposit = new Decimal(depositCents).div(100);
          const earned = earnedCents.map((c) => new Decimal(c).div(100));
          fc.pre(total(earned).greaterThanOrEqualTo(deposit));
          const credits = creditsOver('next', deposit, total(earned).plus(1), earned);
          credits.forEach((c, i) => expect(c.greaterThanOrEqualTo(0) && c.lessThanOrEqualTo(earned[i])).toBe(true));
          expect(total(credits).equals(deposit)).toBe(true);
        },
      ),
    );
  });

  // Pro rata rounds each invoice to the cent, so the final invoice takes up to half a cent per earlier invoice more
  // than its own share. The sum is exact whenever the final invoice earns enough to carry that: shown here for
  // runs that bill the contract sum, a deposit of at most half of it, and a final invoice of at least a cent per invoice.
  it('pro rata: over runs that bill the contract sum, the credits add up to the deposit exactly (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 100, max: 100_000_000 }),
        fc.integer({ min: 0, max: 5_000 }),
        fc.array(fc.integer({ min: 0, max: 1_000 }), { minLength: 0, maxLength: 11 }),
        fc.integer({ min: 1, max: 1_000 }),
        (contractCents, depositBasisPoints, weights, finalWeight) => {
          const contractSum = new Decimal(contractCents).div(100);
          const deposit = contractSum.times(depositBasisPoints).div(10_000).toDecimalPlaces(2, Decimal.ROUND_DOWN);
          const earned = allocateByWeights(contractSum, [...weights, finalWeight], 2);
          fc.pre(earned[earned.length - 1].times(100).greaterThanOrEqualTo(earned.length));
          const credits = creditsOver('prorata', deposit, contractSum, earned);
          credits.forEach((c, i) => expect(c.greaterThanOrEqualTo(0) && c.lessThanOrEqualTo(earned[i])).toBe(true));
          expect(total(credits).equals(deposit)).toBe(true);
        },
      ),
    );
  });

  it('pro rata with no final invoice: runs that bill the contract sum credit the deposit exactly, whatever the rounding (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 100, max: 100_000_000 }),
        fc.integer({ min: 0, max: 10_000 }),
        fc.array(fc.integer({ min: 1, max: 1_000 }), { minLength: 1, maxLength: 12 }),
        (contractCents, depositBasisPoints, weights) => {
          const contractSum = new Decimal(contractCents).div(100);
          const deposit = contractSum.times(depositBasisPoints).div(10_000).toDecimalPlaces(2, Decimal.ROUND_DOWN);
          const earned = allocateByWeights(contractSum, weights, 2);
          const credits = creditsOver('prorata', deposit, contractSum, earned, { lastIsFinal: false });
          credits.forEach((c, i) => expect(c.greaterThanOrEqualTo(0) && c.lessThanOrEqualTo(earned[i])).toBe(true));
          expect(total(credits).equals(deposit)).toBe(true);
        },
      ),
    );
  });

  it('pro rata follows a contract sum lowered by a change order: the deposit is still credited in full', () => {
    // 10,000 contract, 1,000 deposit; half billed (500.00 credited), then a 4,000 deduction: 6,000 left to bill in all
    const first = depositCredit({ ...base, contractSum: '10000.00', earnedThisInvoice: '5000.00' });
    expect(first.toFixed(2)).toBe('500.00');
    const after = (earnedThisInvoice: string, earnedBefore: string, creditedBefore: string) =>
      depositCredit({ ...base, contractSum: '6000.00', earnedThisInvoice, earnedBefore, creditedBefore }).toFixed(2);
    // 1,000 × 5,500 / 6,000 = 916.67, less 500.00
    expect(after('500.00', '5000.00', '500.00')).toBe('416.67');
    expect(after('500.00', '5500.00', '916.67')).toBe('83.33');
  });

  it('pro rata on a run that earns less than the contract leaves the rest of the deposit uncredited (the final invoice cannot go below zero)', () => {
    const credits = creditsOver('prorata', new Decimal('1000.00'), new Decimal('10000.00'), [new Decimal('1000.00'), new Decimal('5.00')]);
    expect(credits.map((c) => c.toFixed(2))).toEqual(['100.00', '5.00']);
  });
});
