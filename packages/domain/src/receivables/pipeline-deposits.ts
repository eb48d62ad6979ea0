import Decimal from 'decimal.js';
import { type DepositCapRule, depositCap } from '../billing/deposit-cap';
import { requireFiniteNumber, toNonNegativeMoney } from '../errors/input-checks';
import { roundToCurrency } from '../money/money';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';

export type OddsSource = 'firm' | 'default';

/**
 * The odds of each stage: the firm's own figure where it set one, else the stated default
 * (the defaults are common practice, no source). Percents 0–100.
 */
export function stageOdds<S extends string>(
  stages: readonly S[],
  firm: ReadonlyMap<S, number>,
  defaults: Readonly<Record<S, number>>,
): Array<{ stage: S; percent: number; source: OddsSource }> {
  return stages.map((stage) => {
    const own = firm.get(stage);
    if (own !== undefined) {
      toRatio(requireFiniteNumber(own, `odds.${stage}`, 'odds') / 100, `odds.${stage}`, 'odds');
      return { stage, percent: own, source: 'firm' as const };
    }
    return { stage, percent: defaults[stage], source: 'default' as const };
  });
}

/**
 * The deposit an inquiry would bring if won: its value × the deposit share (the firm's own share of
 * deposits in its contracts when known, else a default — common practice, no source), no more than
 * the firm's deposit limit, rounded to the currency.
 */
export function expectedDeposit(value: MoneyInput, share: Ratio, cap: DepositCapRule, currency: string): Decimal {
  const v = toNonNegativeMoney(value, 'value', 'value');
  const s = toRatio(share, 'share', 'deposit share');
  const deposit = roundToCurrency(v.times(s), currency);
  const limit = depositCap(cap, v, currency);
  return limit === null ? deposit : Decimal.min(deposit, limit);
}
