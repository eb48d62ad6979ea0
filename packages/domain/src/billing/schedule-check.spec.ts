import { expectInputError } from '../errors/expect-input-error';
import type { DepositCapRule } from './deposit-cap';
import { type BillingScheduleInput, type BillingScheduleLine, checkBillingSchedule } from './schedule-check';

// California Bus. & Prof. Code §7159: down payment ≤ the lesser of $1,000 or 10 % of the contract price.
const california: DepositCapRule = { kind: 'lesserOf', amount: '1000.00', share: '0.1' };
const dep = (amount: string, more: Partial<BillingScheduleLine> = {}): BillingScheduleLine => ({
  amount,
  role: 'deposit',
  isBilled: false,
  ...more,
});
const mile = (amount: string, more: Partial<BillingScheduleLine> = {}): BillingScheduleLine => ({
  amount,
  role: 'milestone',
  isBilled: false,
  ...more,
});
const fin = (amount: string, more: Partial<BillingScheduleLine> = {}): BillingScheduleLine => ({
  amount,
  role: 'final',
  isBilled: false,
  ...more,
});
const check = (lines: BillingScheduleLine[], over: Partial<BillingScheduleInput> = {}) =>
  checkBillingSchedule({ lines, contractSum: '10000.00', currency: 'USD', depositRule: california, ...over });

// Lines add up to the contract sum, deposit within the chosen cap, billed lines never change (DOMAIN.md §2.11; common practice, no source).
describe('billing schedule check', () => {
  it.each<[string, BillingScheduleLine[], Partial<BillingScheduleInput>, Array<{ field: string; message: string }>]>([
    ['a good schedule', [dep('1000.00'), mile('4500.00'), fin('4500.00')], {}, []],
    [
      'short of the contract',
      [dep('1000.00'), mile('4490.00'), fin('4500.00')],
      {},
      [{ field: 'lines', message: 'The lines add up to 9,990.00, 10.00 short of the contract sum 10,000.00.' }],
    ],
    [
      'over the contract',
      [dep('1000.00'), mile('4500.00'), fin('4500.01')],
      {},
      [{ field: 'lines', message: 'The lines add up to 10,000.01, 0.01 over the contract sum 10,000.00.' }],
    ],
    // $12,000 job under the California rule: min(1,000, 1,200) = 1,000 (DOMAIN.md §2.11)
    [
      'a deposit over the cap names the cap',
      [dep('1200.00'), mile('5400.00'), fin('5400.00')],
      { contractSum: '12000.00' },
      [{ field: 'lines[0].amount', message: 'The deposit 1,200.00 is over the cap of 1,000.00 for this contract.' }],
    ],
    // $8,000 job: min(1,000, 800) = 800
    [
      'two deposit lines count together',
      [dep('500.00'), dep('500.00'), fin('7000.00')],
      { contractSum: '8000.00' },
      [{ field: 'lines', message: 'The deposit lines add up to 1,000.00, over the cap of 800.00 for this contract.' }],
    ],
    ['"none" is a choice: no cap', [dep('5000.00'), fin('5000.00')], { depositRule: { kind: 'none' } }, []],
    [
      'amounts at the currency precision and not negative',
      [dep('1000.005'), mile('-100.00'), fin('abc')],
      {},
      [
        { field: 'lines[0].amount', message: 'The amount has more than 2 decimal places.' },
        { field: 'lines[1].amount', message: 'The amount cannot be negative.' },
        { field: 'lines[2].amount', message: 'The amount is not a number.' },
      ],
    ],
    [
      'yen: no decimals',
      [dep('100000'), fin('900000.5')],
      { currency: 'JPY', contractSum: '1000000', depositRule: { kind: 'none' } },
      [{ field: 'lines[1].amount', message: 'The amount has more than 0 decimal places.' }],
    ],
    [
      'an invoiced line cannot change',
      [dep('1000.00', { isBilled: true, originalAmount: '900.00' }), mile('4500.00'), fin('4500.00')],
      {},
      [{ field: 'lines[0].amount', message: 'This line is already invoiced and cannot change.' }],
    ],
    [
      'an invoiced line kept as it was',
      [dep('1000.00', { isBilled: true, originalAmount: '1000' }), mile('4500.00'), fin('4500.00')],
      {},
      [],
    ],
    [
      'one final line at most',
      [dep('1000.00'), fin('4500.00'), fin('4500.00')],
      {},
      [{ field: 'lines', message: 'Only one line can be the final payment.' }],
    ],
    [
      'the final line comes last',
      [dep('1000.00'), fin('4500.00'), mile('4500.00')],
      {},
      [{ field: 'lines[1].role', message: 'The final payment must be the last line.' }],
    ],
    ['no final line is allowed', [dep('1000.00'), mile('9000.00')], {}, []],
    ['no lines', [], {}, [{ field: 'lines', message: 'The schedule has no lines.' }]],
  ])('%s', (_name, lines, over, problems) => expect(check(lines, over)).toEqual(problems));

  it('a bad contract sum, currency or cap rule from the server throws, naming it', () => {
    expectInputError(() => check([fin('1.00')], { contractSum: '1.001' }), 'contractSum');
    expectInputError(() => check([fin('1.00')], { currency: 'EURO' }), 'currency');
    expectInputError(() => check([fin('1.00')], { depositRule: { kind: 'share', share: 2 } }), 'depositRule.share');
    expectInputError(() => check([fin('1.00', { isBilled: true, originalAmount: 'x' })]), 'lines[0].originalAmount');
  });
});
