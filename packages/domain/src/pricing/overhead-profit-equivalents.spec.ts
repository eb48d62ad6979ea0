import { expectInputError } from '../errors/expect-input-error';
import { overheadProfitEquivalents } from './overhead-profit-equivalents';

// price = direct ÷ (1 − OH − P) for margin, direct × (1 + OH) × (1 + P) for markup
// (common practice, no source; DOMAIN.md §2.8). Checked by hand at a direct cost of 1.
describe('overheadProfitEquivalents', () => {
  it.each([
    // method, overhead, profit, markup on cost, share of price
    ['margin', '0.20', '0.15', '0.5385', '0.35'], // 1 ÷ 0.65 = 1.53846
    ['margin', '0', '0', '0', '0'],
    ['margin', '0.10', '0.10', '0.25', '0.2'], // 1 ÷ 0.8 = 1.25
    ['markup', '0.20', '0.15', '0.38', '0.2754'], // 1.2 × 1.15 = 1.38; 1 − 1/1.38
    ['markup', '0.25', '0', '0.25', '0.2'], // 25 % on cost is 20 % of the price
    ['markup', '1', '1', '3', '0.75'], // ×2 ×2 = 4
  ] as const)('%s with overhead %s and profit %s is %s on cost, %s of the price', (method, overhead, profit, markup, share) => {
    const result = overheadProfitEquivalents({ method, overhead, profit });
    expect(result.markupOnCost.toDecimalPlaces(4).toString()).toBe(markup);
    expect(result.shareOfPrice.toDecimalPlaces(4).toString()).toBe(share);
  });

  it('refuses margins that leave nothing for the work', () => {
    expectInputError(
      () => overheadProfitEquivalents({ method: 'margin', overhead: '0.6', profit: '0.4' }),
      'overheadProfit.profit',
      /less than 100 %/,
    );
  });
});
