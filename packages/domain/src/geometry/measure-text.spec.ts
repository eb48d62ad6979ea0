import { measureText, totalsText, workingText } from './measure-text';

// How a measured surface reads on the takeoff and the estimate (common practice, no source).
describe('measures in words', () => {
  it.each([
    [{ measure: 'area' as const, quantity: 504.4907 }, 'ft', '504.49 ft²'],
    [{ measure: 'area' as const, quantity: 12 }, 'm', '12.00 m²'],
    [{ measure: 'length' as const, quantity: 56.549 }, 'ft', '56.55 ft run'],
  ])('measureText(%j, %s) is %s', (m, unit, text) => expect(measureText(m, unit)).toBe(text));

  it.each([
    [{ formula: '2π·r·H − openings', gross: 565.4867, deductions: 61 }, '2π·r·H − openings: 565.49 − 61.00'],
    [{ formula: 'L·W', gross: 120, deductions: 0 }, 'L·W'],
  ])('workingText shows the deduction only when there is one: %s', (m, text) => expect(workingText(m)).toBe(text));

  it.each([
    [{ area: 1204.5, length: 0 }, '1,204.50 ft² of surface'],
    [{ area: 80, length: 56.55 }, '80.00 ft² of surface, 56.55 ft of running length'],
  ])('totalsText(%j)', (totals, text) => expect(totalsText(totals, 'ft')).toBe(text));
});
