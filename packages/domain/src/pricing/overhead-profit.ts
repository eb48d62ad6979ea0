import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { type Ratio, toRatio } from './ratio';

/**
 * The firm picks one explicitly, because they give different prices (common practice, no source):
 * - margin: overhead and profit are shares of the price, price = direct / (1 − OH − P)
 * - markup: compounded markups on cost, price = direct × (1 + OH) × (1 + P)
 */
export interface OverheadProfitRule {
  method: 'margin' | 'markup';
  overhead: Ratio;
  profit: Ratio;
}

export interface OverheadProfitResult {
  overhead: Decimal;
  profit: Decimal;
  price: Decimal;
}

export function applyOverheadProfit(direct: Decimal, rule: OverheadProfitRule, field = 'overheadProfit'): OverheadProfitResult {
  const oh = toRatio(rule.overhead, `${field}.overhead`, 'overhead', rule.method === 'margin' ? 1 : 10);
  const p = toRatio(rule.profit, `${field}.profit`, 'profit', rule.method === 'margin' ? 1 : 10);
  if (rule.method === 'margin') {
    const keep = new Decimal(1).minus(oh).minus(p);
    if (keep.lessThanOrEqualTo(0)) {
      throw new DomainInputError(`${field}.profit`, 'Overhead and profit as shares of the price must add to less than 100 %.');
    }
    const price = direct.div(keep);
    return { overhead: price.times(oh), profit: price.times(p), price };
  }
  if (rule.method === 'markup') {
    const overhead = direct.times(oh);
    const profit = direct.plus(overhead).times(p);
    return { overhead, profit, price: direct.plus(overhead).plus(profit) };
  }
  throw new DomainInputError(`${field}.method`, 'Choose "margin" or "markup".');
}
