import Decimal from 'decimal.js';
import fc from 'fast-check';
import { DomainInputError } from '../errors/domain-input-error';
import { allocateByWeights, splitEvenly } from './allocate';

const str = (xs: Decimal[]): string[] => xs.map((x) => x.toFixed(2));

describe('splitting money exactly', () => {
  it.each([
    ['100.00', [1, 1, 1], ['33.34', '33.33', '33.33']],
    ['0.05', [1, 1], ['0.03', '0.02']],
    ['10.00', [1, 2, 7], ['1.00', '2.00', '7.00']],
    ['1.00', [3, 3, 3], ['0.34', '0.33', '0.33']],
    ['-1.00', [1, 1, 1], ['-0.34', '-0.33', '-0.33']],
    ['12000.00', [0.1, 0.4, 0.5], ['1200.00', '4800.00', '6000.00']],
  ])('%s by %j', (total, weights, expected) => {
    expect(str(allocateByWeights(total, weights, 2))).toEqual(expected);
  });

  it('splits evenly with the odd cent first', () => {
    expect(str(splitEvenly('0.10', 3, 2))).toEqual(['0.04', '0.03', '0.03']);
  });

  it('never loses or invents a minor unit (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -10_000_000, max: 10_000_000 }),
        fc.array(fc.integer({ min: 0, max: 1000 }), { minLength: 1, maxLength: 12 }).filter((w) => w.some((x) => x > 0)),
        (cents, weights) => {
          const total = new Decimal(cents).div(100);
          const parts = allocateByWeights(total, weights, 2);
          const sum = parts.reduce((a, b) => a.plus(b), new Decimal(0));
          expect(sum.equals(total)).toBe(true);
          // each part is within one cent of its exact share
          const wsum = weights.reduce((a, b) => a + b, 0);
          parts.forEach((p, i) => {
            expect(p.minus(total.times(weights[i]).div(wsum)).abs().lessThan('0.01')).toBe(true);
          });
        },
      ),
    );
  });

  it.each([
    [() => allocateByWeights('1.00', [], 2), 'weights'],
    [() => allocateByWeights('1.00', [0, 0], 2), 'weights'],
    [() => allocateByWeights('1.00', [1, -1], 2), 'weights[1]'],
    [() => allocateByWeights('1.001', [1], 2), 'total'],
    [() => splitEvenly('1.00', 0, 2), 'parts'],
  ])('bad input %# names its field', (call, field) => {
    expect(call).toThrow(DomainInputError);
    try {
      call();
    } catch (e) {
      expect((e as DomainInputError).field).toBe(field);
    }
  });
});
