import Decimal from 'decimal.js';
import { applyOverheadProfit, type OverheadProfitRule } from './overhead-profit';

/** One rule for overhead and profit, said both ways a firm may think of it. */
export interface OverheadProfitEquivalents {
  /** What the rule adds on top of direct cost, as a fraction of that cost (0.538 = 53.8 %). */
  markupOnCost: Decimal;
  /** What overhead and profit come to as a share of the price (0.35 = 35 %). */
  shareOfPrice: Decimal;
}

/**
 * The rule applied to a direct cost of 1: price P gives markup P − 1 and share 1 − 1/P
 * (common practice, no source; DOMAIN.md §2.8). So an owner choosing margin sees the markup it
 * means, and one choosing markup sees the share of the price. Throws DomainInputError for a rule
 * applyOverheadProfit refuses (a margin of 100 % or more).
 */
export function overheadProfitEquivalents(rule: OverheadProfitRule, field = 'overheadProfit'): OverheadProfitEquivalents {
  const { price } = applyOverheadProfit(new Decimal(1), rule, field);
  return { markupOnCost: price.minus(1), shareOfPrice: new Decimal(1).minus(new Decimal(1).div(price)) };
}
