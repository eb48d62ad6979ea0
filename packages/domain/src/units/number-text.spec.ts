import { fixedNumber, plainNumber, roundedNumber } from './number-text';

// Display rounding only; the numbers themselves keep full precision (common practice, no source).
describe('numbers as printed', () => {
  it.each([
    [9, '9'],
    [4.5, '4.5'],
    [282.7433, '282.74'],
    [3.048, '3.05'],
    [1234.5, '1234.5'],
  ])('plainNumber(%d) is %s', (value, text) => expect(plainNumber(value)).toBe(text));

  it('plainNumber keeps more digits when asked: 10 ft in metres stays exact enough to measure again', () => {
    expect(plainNumber(3.048, 4)).toBe('3.048');
  });

  it.each([
    [1204.5, 2, '1,204.5'],
    [2.3333, 2, '2.33'],
    [1.25, 1, '1.3'],
    [1000000, 3, '1,000,000'],
  ])('roundedNumber(%d, %d) is %s', (value, digits, text) => expect(roundedNumber(value, digits)).toBe(text));

  it.each([
    [1204.5, '1,204.50'],
    [504.4907, '504.49'],
    [0, '0.00'],
  ])('fixedNumber(%d) is %s', (value, text) => expect(fixedNumber(value)).toBe(text));
});
