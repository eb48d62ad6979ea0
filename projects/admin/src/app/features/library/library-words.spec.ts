import { describe, expect, it } from 'vitest';
import library from '../../../i18n/library/en.json';
import { DILUTION_CHOICES, PRODUCT_KIND_CHOICES, UNIT_GROUPS, type Words, flammableNote, hazardWords, waitWords } from './library-words';

/** The English the translate pipe would show for these words (key without `library.`, `{{param}}` filled in). */
function english(w: Words): string {
  let at: unknown = { library };
  for (const part of w.key.split('.')) at = (at as Record<string, unknown>)[part];
  if (typeof at !== 'string') throw new Error(`no English words for ${w.key}`);
  return at.replace(/\{\{\s*(\w+)\s*\}\}/g, (_, name: string) => String(w.params?.[name]));
}

describe('library words', () => {
  it('offers every product kind and unit the API takes, in the contract order', () => {
    expect(english(PRODUCT_KIND_CHOICES[0])).toBe('Primer');
    expect(PRODUCT_KIND_CHOICES[0]?.value).toBe('primer');
    expect(UNIT_GROUPS.map((g) => g.units[0]?.value)).toEqual(['gallon', 'lb']);
    expect(english(UNIT_GROUPS[0].units[0])).toBe('gallon (gal)');
    expect(DILUTION_CHOICES.map((d) => d.value)).toEqual(['ofConcentrate', 'ofMix']);
  });

  // 29 CFR 1910.106(a)(19): flash point at or below 93 °C (199.4 °F) is a flammable liquid, categories 1–4.
  it.each([
    [{ flashPointC: 12 }, ['Flammable, category 1 or 2 (flash point 12\u00a0°C)']],
    [{ flashPointC: 12, boilingPointC: 82 }, ['Flammable, category 2 (flash point 12\u00a0°C)']],
    [{ flashPointC: 23 }, ['Flammable, category 3 (flash point 23\u00a0°C)']],
    [{ flashPointC: 40 }, ['Flammable, category 3 (flash point 40\u00a0°C)']], // mineral spirits
    [{ flashPointC: 93 }, ['Flammable, category 4 (flash point 93\u00a0°C)']],
    [{ flashPointC: 94 }, []],
    [{ containsDryingOil: true }, ['Oily rags self-heat (drying oil)']],
    [{ isLime: true, containsSilica: true }, ['Caustic (lime)', 'Contains silica']],
    [{}, []],
  ])('hazardWords(%j)', (hazards, texts) => {
    expect(hazardWords(hazards, 'en-US').map(english)).toEqual(texts);
  });

  // Unicode CLDR number symbols: es-US writes 38.5, es-CO 38,5.
  it.each([
    ['es-US', '38.5'],
    ['es-CO', '38,5'],
  ])('writes the flash point in the reader’s numbers (%s)', (locale, flash) => {
    expect(hazardWords({ flashPointC: 38.5 }, locale)[0]?.params?.['flash']).toBe(flash);
  });

  it.each([
    [null, 'Leave empty if it does not burn. At or below 93\u00a0°C it counts as flammable (29 CFR 1910.106(a)(19)).'],
    [
      12,
      'Flammable, category 1 or 2: 12\u00a0°C is at or below 93\u00a0°C (29 CFR 1910.106(a)(19)). Crew sheets will carry the fire cautions.',
    ],
    [40, 'Flammable, category 3: 40\u00a0°C is at or below 93\u00a0°C (29 CFR 1910.106(a)(19)). Crew sheets will carry the fire cautions.'],
    [120, 'Above 93\u00a0°C, so not a flammable liquid under 29 CFR 1910.106(a)(19); it can still burn. Keep it away from flames.'],
  ])('flammableNote(%s)', (c, note) => expect(english(flammableNote(c, null, 'en-US'))).toBe(note));

  it('never says "not flammable" at or below 93 °C', () => {
    for (let c = -50; c <= 93; c += 0.5) expect(english(flammableNote(c, null, 'en-US'))).not.toMatch(/not (a )?flammable/i);
  });

  it('splits categories 1 and 2 by the boiling point when known', () => {
    expect(english(flammableNote(12, 30, 'en-US'))).toMatch(/^Flammable, category 1:/);
  });

  // Same words as the domain's waitText (packages/domain/src/schedule/hours-text.ts).
  it.each([
    [0, 'no wait'],
    [16, '16 h'],
    [6.5, '6.5 h'],
    [72, '72 h (3 days)'],
    [100, '100 h (4 days 4 h)'],
  ])('waitWords(%d)', (hours, text) => expect(english(waitWords(hours, 'en-US'))).toBe(text));
});
