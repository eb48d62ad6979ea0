import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { type DepositCapRule, depositCap } from './deposit-cap';
import { toCurrencyAmount } from './currency-amount';

export type BillingLineRole = 'deposit' | 'milestone' | 'final';

export interface BillingScheduleLine {
  amount: MoneyInput;
  role: BillingLineRole;
  /** an invoice was issued for this line */
  isBilled: boolean;
  /** the amount as it was invoiced, for a billed line */
  originalAmount?: MoneyInput;
}

export interface BillingScheduleInput {
  lines: readonly BillingScheduleLine[];
  contractSum: MoneyInput;
  currency: string;
  depositRule: DepositCapRule;
}

/** One thing wrong with the schedule: `field` is `lines[2].amount`, `lines[0].role` or `lines` for the whole. */
export interface ScheduleProblem {
  field: string;
  message: string;
}

const ROLES: readonly string[] = ['deposit', 'milestone', 'final'];

/** "9,990.00": grouped the US way with the currency's decimals, no symbol (as the takeoff prints numbers). */
function plainAmount(amount: Decimal, digits: number): string {
  const [whole, fraction] = amount.abs().toFixed(digits).split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const sign = amount.isNegative() && !amount.isZero() ? '-' : '';
  return fraction === undefined ? `${sign}${grouped}` : `${sign}${grouped}.${fraction}`;
}

/**
 * Everything wrong with an edited billing schedule, each problem beside its field (empty: fine).
 * Amounts are whole minor units and not negative; the lines add up to the contract sum exactly;
 * deposits stay within the cap the firm chose (DOMAIN.md §2.11; California Bus. & Prof. Code §7159
 * as one such cap); an invoiced line keeps its amount; at most one final line, and it comes last
 * (common practice, no source). The contract sum, currency, cap rule and original amounts come from
 * the server, so a bad one throws instead.
 */
export function checkBillingSchedule(input: BillingScheduleInput): ScheduleProblem[] {
  const digits = minorUnitDigits(input.currency, 'currency');
  const contractSum = toCurrencyAmount(input.contractSum, digits, 'contractSum', 'contract sum');
  const money = (d: Decimal): string => plainAmount(d, digits);
  const problems: ScheduleProblem[] = [];
  if (input.lines.length === 0) return [{ field: 'lines', message: 'The schedule has no lines.' }];

  const amounts: Array<Decimal | null> = input.lines.map((line, i) => {
    const at = `lines[${i}]`;
    let amount: Decimal | null = null;
    try {
      amount = toCurrencyAmount(line.amount, digits, `${at}.amount`);
    } catch (e) {
      if (!(e instanceof DomainInputError)) throw e;
      problems.push({ field: e.field, message: e.message });
    }
    if (!ROLES.includes(line.role))
      problems.push({ field: `${at}.role`, message: 'A line is a deposit, a milestone or the final payment.' });
    if (amount && line.isBilled && line.originalAmount !== undefined) {
      const original = toCurrencyAmount(line.originalAmount, digits, `${at}.originalAmount`, 'original amount');
      if (!amount.equals(original)) problems.push({ field: `${at}.amount`, message: 'This line is already invoiced and cannot change.' });
    }
    return amount;
  });

  const valid = amounts.filter((a): a is Decimal => a !== null);
  if (valid.length === amounts.length) {
    const total = valid.reduce((a, b) => a.plus(b), new Decimal(0));
    const gap = total.minus(contractSum);
    if (!gap.isZero()) {
      const side = gap.isNegative() ? 'short of' : 'over';
      problems.push({
        field: 'lines',
        message: `The lines add up to ${money(total)}, ${money(gap.abs())} ${side} the contract sum ${money(contractSum)}.`,
      });
    }
    const cap = depositCap(input.depositRule, contractSum, input.currency, 'depositRule');
    const deposits = input.lines.map((l, i) => ({ l, i })).filter(({ l }) => l.role === 'deposit');
    const deposited = deposits.reduce((a, { i }) => a.plus(valid[i]), new Decimal(0));
    if (cap !== null && deposited.greaterThan(cap)) {
      problems.push(
        deposits.length === 1
          ? {
              field: `lines[${deposits[0].i}].amount`,
              message: `The deposit ${money(deposited)} is over the cap of ${money(cap)} for this contract.`,
            }
          : {
              field: 'lines',
              message: `The deposit lines add up to ${money(deposited)}, over the cap of ${money(cap)} for this contract.`,
            },
      );
    }
  }

  const finals = input.lines.map((l, i) => ({ l, i })).filter(({ l }) => l.role === 'final');
  if (finals.length > 1) {
    problems.push({ field: 'lines', message: 'Only one line can be the final payment.' });
  } else if (finals.length === 1 && finals[0].i !== input.lines.length - 1) {
    problems.push({ field: `lines[${finals[0].i}].role`, message: 'The final payment must be the last line.' });
  }
  return problems;
}
