import { DomainInputError } from '../errors/domain-input-error';
import { convertArea, convertAreaExact, convertLength, convertLengthExact } from './length';

describe('length and area conversion', () => {
  it.each([
    // [value, from, to, exact result, source]
    ['1', 'ft', 'm', '0.3048'], // NIST SP 811 App. B.8 (3.048 E−01); NIST Handbook 44 App. C
    ['1', 'in', 'mm', '25.4'], // NIST Handbook 44 App. C
    ['1', 'yd', 'm', '0.9144'], // NIST Handbook 44 App. C
    ['12', 'in', 'ft', '1'],
  ] as const)('%s %s = %s %s exactly', (value, from, to, expected) => {
    expect(convertLengthExact(value, from, to).toString()).toBe(expected);
  });

  it('1 ft² is 0.09290304 m² exactly', () => {
    // NIST SP 811 App. B.8 (9.290 304 E−02)
    expect(convertAreaExact('1', 'ft', 'm').toString()).toBe('0.09290304');
  });

  it('1 m² is 10.763910417 ft² to nine places', () => {
    // derived from NIST SP 811 App. B.8 (1 / 0.09290304)
    expect(convertAreaExact('1', 'm', 'ft').toDecimalPlaces(9).toString()).toBe('10.763910417');
    expect(convertArea(1, 'm', 'ft')).toBeCloseTo(10.763910417, 9);
  });

  it('converts the worked round-room walls to metric', () => {
    // DOMAIN.md §2.2 [D]: 2π·9·10 − 61 = 504.49 ft² = 46.868 m²; factor NIST SP 811 App. B.8
    expect(convertArea(2 * Math.PI * 9 * 10 - 61, 'ft', 'm')).toBeCloseTo(46.868, 3);
    expect(convertLength(10, 'ft', 'in')).toBeCloseTo(120, 12);
  });

  it('refuses an unknown unit, naming the field', () => {
    expect(() => convertLength(1, 'ft', 'furlong' as never)).toThrow(DomainInputError);
    try {
      convertLength(1, 'ft', 'furlong' as never);
    } catch (e) {
      expect((e as DomainInputError).field).toBe('to');
    }
  });
});
