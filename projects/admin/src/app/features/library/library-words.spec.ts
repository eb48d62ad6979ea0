import { describe, expect, it } from 'vitest';
import { DILUTION_CHOICES, PRODUCT_KIND_CHOICES, UNIT_GROUPS, flammableNote, hazardWords } from './library-words';

describe('library words', () => {
  it('offers every product kind and unit the API takes, in the contract order', () => {
    expect(PRODUCT_KIND_CHOICES[0]).toEqual({ value: 'primer', label: 'Primer' });
    expect(UNIT_GROUPS.map((g) => g.units[0]?.value)).toEqual(['gallon', 'lb']);
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
    expect(hazardWords(hazards).map((w) => w.text)).toEqual(texts);
  });

  it.each([
    [null, 'Leave empty if it does not burn. At or below 93\u00a0°C it counts as flammable (29 CFR 1910.106(a)(19)).'],
    [
      12,
      'Flammable, category 1 or 2: 12\u00a0°C is at or below 93\u00a0°C (29 CFR 1910.106(a)(19)). Crew sheets will carry the fire cautions.',
    ],
    [40, 'Flammable, category 3: 40\u00a0°C is at or below 93\u00a0°C (29 CFR 1910.106(a)(19)). Crew sheets will carry the fire cautions.'],
    [120, 'Above 93\u00a0°C, so not a flammable liquid under 29 CFR 1910.106(a)(19); it can still burn. Keep it away from flames.'],
  ])('flammableNote(%s)', (c, note) => expect(flammableNote(c)).toBe(note));

  it('never says "not flammable" at or below 93 °C', () => {
    for (let c = -50; c <= 93; c += 0.5) expect(flammableNote(c)).not.toMatch(/not (a )?flammable/i);
  });

  it('splits categories 1 and 2 by the boiling point when known', () => {
    expect(flammableNote(12, 30)).toMatch(/^Flammable, category 1:/);
  });
});
