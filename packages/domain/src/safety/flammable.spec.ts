import { expectInputError } from '../errors/expect-input-error';
import { flammableClass } from './flammable';

describe('flammable liquid category, 29 CFR 1910.106(a)(19)', () => {
  it.each([
    // [flash point °C, boiling point °C, categories]
    [12, undefined, [1, 2]], // isopropyl alcohol, 12 °C closed cup (supplier SDS); boiling point not given
    [12, 82, [2]], // 1910.106(a)(19)(ii): flash < 23 °C, boiling > 35 °C
    [-20, 35, [1]], // 1910.106(a)(19)(i): flash < 23 °C, boiling ≤ 35 °C
    [22.9, undefined, [1, 2]], // (i)–(ii): below 23 °C
    [23, undefined, [3]], // (iii): at or above 23 °C
    [40, undefined, [3]], // mineral spirits, about 40 °C (DOMAIN.md §3.5): still flammable
    [60, undefined, [3]], // (iii): at or below 60 °C
    [60.1, undefined, [4]], // (iv): above 60 °C
    [93, undefined, [4]], // (a)(19): at or below 93 °C (199.4 °F)
    [93.1, undefined, null], // above 93 °C: not a flammable liquid under the rule
    [undefined, undefined, null],
  ])('flash %s °C, boiling %s °C', (flash, boiling, expected) => {
    expect(flammableClass(flash, boiling)?.categories ?? null).toEqual(expected);
  });

  it('names the category in words', () => {
    expect(flammableClass(12)?.label).toBe('category 1 or 2');
    expect(flammableClass(40)?.label).toBe('category 3');
  });

  it('refuses a flash point that is not a number', () => {
    expectInputError(() => flammableClass(Number.NaN), 'flashPointC');
  });
});
