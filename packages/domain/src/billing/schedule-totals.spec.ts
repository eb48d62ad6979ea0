import Decimal from 'decimal.js';
import { expectInputError } from '../errors/expect-input-error';
import { scheduleTotals, type ScheduledAmount } from './schedule-totals';

const line = (amount: string, percent: string | null = null): ScheduledAmount => ({ amount, percent });

describe('payment schedule totals (common practice, no source)', () => {
  it.each<[string, ScheduledAmount[], string, string, string | null, boolean]>([
    // name, lines, contract sum, amount total, percent total, adds up
    ['30 / 40 / rest of 10,000.00', [line('3000.00', '30'), line('4000.00', '40'), line('3000.00')], '10000.00', '10000', null, true],
    [
      'thirds that leave a cent on the last line',
      [line('3333.33', '33.3333'), line('3333.33', '33.3333'), line('3333.34', '33.3334')],
      '10000.00',
      '10000',
      '100',
      true,
    ],
    ['decimals that floats would get wrong (0.1 + 0.2)', [line('0.10', '10'), line('0.20', '20')], '0.30', '0.3', '30', true],
    ['a cent short of the contract sum', [line('5000.00', '50'), line('4999.99', '50')], '10000.00', '9999.99', '100', false],
    ['"100" and "100.00" are the same amount', [line('100')], '100.00', '100', null, true],
    ['a fixed amount with no percentage', [line('1000.00'), line('2000.00', '100')], '3000', '3000', null, true],
    ['yen, no minor unit', [line('150000', '30'), line('350000', '70')], '500000', '500000', '100', true],
    ['no lines at all', [], '0', '0', null, true],
  ])('%s', (_name, lines, contractSum, amount, percent, isContractSum) => {
    const totals = scheduleTotals(lines, contractSum);
    expect(totals.amount.equals(amount)).toBe(true);
    expect(totals.percent === null ? null : totals.percent.toString()).toBe(percent);
    expect(totals.isContractSum).toBe(isContractSum);
  });

  it('takes Decimals as well as strings', () => {
    expect(scheduleTotals([{ amount: new Decimal('12.5'), percent: new Decimal('12.5') }], new Decimal('12.50')).isContractSum).toBe(true);
  });

  it('refuses an amount that is not a decimal, naming the line', () => {
    expectInputError(() => scheduleTotals([line('1000.00'), line('ten')], '1000'), 'paymentSchedule[1].amount');
    expectInputError(() => scheduleTotals([line('1000.00', 'half')], '1000'), 'paymentSchedule[0].percent');
    expectInputError(() => scheduleTotals([line('1000.00')], ''), 'contractSum');
  });
});
