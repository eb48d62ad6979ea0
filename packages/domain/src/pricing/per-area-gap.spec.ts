import { perAreaGap } from './per-area-check';

// The owner's per-area cross-check beside the bottom-up price (common practice, no source).
describe('perAreaGap', () => {
  it.each([
    ['4200.00', '3900.00', true, '300'],
    ['3900.00', '4200.00', false, '300'],
    ['4200.00', '4200.00', false, '0'],
    ['0.10', '0.3', false, '0.2'], // exact decimals, no float drift
  ])('bottom-up %s against %s by area: higher %s by %s', (bottomUp, byArea, isAbove, amount) => {
    const gap = perAreaGap(bottomUp, byArea);
    expect(gap.isAbove).toBe(isAbove);
    expect(gap.amount.toString()).toBe(amount);
  });
});
