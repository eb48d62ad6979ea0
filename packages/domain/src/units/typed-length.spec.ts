import { decimalMarkOf, readTypedLength, readTypedNumber } from './typed-length';

describe('numbers as typed', () => {
  // Dot locales: only the dot is a decimal mark (common practice, no source).
  it.each([
    ['9', 9],
    [' 9.5 ', 9.5],
    ['.5', 0.5],
    ['12.', 12],
    ['-2', -2],
    ['', null],
    ['   ', null],
    [null, null],
  ])('reads %j as %s', (typed, value) => expect(readTypedNumber(typed)).toBe(value));

  it.each(['1,5', '1 000', '1,000', '3ft', '--2', '.', 'e3', '1.2.3'])('refuses %j where the dot is the mark', (typed) =>
    expect(readTypedNumber(typed)).toBeNaN(),
  );

  // Comma locales write "1,5" for one and a half (CLDR number symbols, e.g. de, fr, es: decimal ","); from memory.
  it.each([
    ['1,5', 1.5],
    [',5', 0.5],
    ['-2,25', -2.25],
    ['3.048', 3.048],
  ])('reads %j as %s where the comma is the mark', (typed, value) => expect(readTypedNumber(typed, ',')).toBe(value));

  it.each(['1,000,5', '1.000,5', '1 000', ','])('refuses %j even where the comma is the mark (no grouping)', (typed) =>
    expect(readTypedNumber(typed, ',')).toBeNaN(),
  );

  // CLDR number symbols per locale (unicode.org/cldr), read through Intl; from memory.
  it.each([
    ['en-US', '.'],
    ['en-GB', '.'],
    ['de-DE', ','],
    ['fr-CA', ','],
    ['es-ES', ','],
    ['not a locale', '.'],
    [undefined, '.'],
  ])('the decimal mark of %s is %j', (locale, mark) => expect(decimalMarkOf(locale)).toBe(mark));
});

describe('lengths as typed', () => {
  // 1 ft = 12 in exactly; 1 in = 0.0254 m exactly (NIST Handbook 44 App. C; NIST SP 811 App. B.8).
  it.each([
    ['6\' 6"', 'ft', 6.5],
    ['6\'6"', 'ft', 6.5],
    ["6'6", 'ft', 6.5],
    ['6\'-6"', 'ft', 6.5], // the drawing style
    ['6 ft 6 in', 'ft', 6.5],
    ['6ft 6in', 'ft', 6.5],
    ['6 feet 6 inches', 'ft', 6.5],
    ["6'", 'ft', 6],
    ['6 ft', 'ft', 6],
    ['6"', 'ft', 0.5],
    ['6 in', 'ft', 0.5],
    ['6\' 6 1/2"', 'ft', 6 + 6.5 / 12],
    ['6\' 1/2"', 'ft', 6 + 0.5 / 12],
    ['\u2019', 'ft', Number.NaN],
    ['6\u2019 6\u201D', 'ft', 6.5], // a phone's curly quotes
    ['6\u2032 6\u2033', 'ft', 6.5], // prime and double prime
    ["6' 6''", 'ft', 6.5], // two single quotes for the inch mark
    ['-2\' 6"', 'ft', -2.5],
    ['6\' 6"', 'm', 1.9812],
    ['12 in', 'm', 0.3048],
    ['9.5', 'ft', 9.5],
    ['9.5', 'm', 9.5],
    ['', 'ft', null],
  ] as const)('reads %j in %s as %s', (typed, unit, value) => {
    const read = readTypedLength(typed, unit);
    if (value === null) expect(read).toBeNull();
    else if (Number.isNaN(value)) expect(read).toBeNaN();
    else expect(read).toBeCloseTo(value, 10);
  });

  // Inches after feet stay under a foot; a fraction is a proper one (common practice, no source).
  it.each(['6\' 12"', '6\' 6 3/2"', '6\' 1/0"', '6 ft 6 ft', "6''6", 'six feet', '6 m', "'6", '6\'--6"', '1,5 ft'])('refuses %j', (typed) =>
    expect(readTypedLength(typed, 'ft')).toBeNaN(),
  );

  it('reads decimal commas in feet and inches where the comma is the mark', () => {
    expect(readTypedLength('6\' 6,5"', 'ft', ',')).toBeCloseTo(6 + 6.5 / 12, 10);
    expect(readTypedLength('2,5', 'm', ',')).toBe(2.5);
  });
});
