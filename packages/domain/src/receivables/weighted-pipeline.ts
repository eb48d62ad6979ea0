import Decimal from 'decimal.js';
import { toNonNegativeMoney } from '../errors/input-checks';
import type { MoneyInput } from '../money/money';
import { type Ratio, toRatio } from '../pricing/ratio';

export interface Opportunity {
  id: string;
  value: MoneyInput;
  /** chance of winning at its stage, 0–1, calibrated from the firm's own history */
  probability: Ratio;
}

/** Weighted value = Σ value × stage probability (sales-ops glossaries; common practice). */
export function weightedPipeline(opportunities: readonly Opportunity[]): {
  unweighted: Decimal;
  weighted: Decimal;
  lines: Array<{ id: string; weighted: Decimal }>;
} {
  let unweighted = new Decimal(0);
  let weighted = new Decimal(0);
  const lines = opportunities.map((o, i) => {
    const value = toNonNegativeMoney(o.value, `opportunities[${i}].value`, 'value');
    const w = value.times(toRatio(o.probability, `opportunities[${i}].probability`, 'probability'));
    unweighted = unweighted.plus(value);
    weighted = weighted.plus(w);
    return { id: o.id, weighted: w };
  });
  return { unweighted, weighted, lines };
}
