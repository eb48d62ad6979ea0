import { describe, expect, it } from 'vitest';
import { DILUTION_CHOICES, PRODUCT_KIND_CHOICES, UNIT_GROUPS, flammableNote, hazardWords } from './library-words';

describe('library words', () => {
  it('offers every product kind and unit the API takes, in the contract order', () => {
    expect(PRODUCT_KIND_CHOICES[0]).toEqual({ value: 'primer', label: 'Primer' });
    expect(UNIT_GROUPS.map((g) => g.units[0]?.value)).toEqual(['gallon', 'lb']);
    expect(DILUTION_CHOICES.map((d) => d.value)).toEqual(['ofConcentrate', 'ofMix']);
  });

  // 29 CFR 1910.106(a)(19): flash point below 23 °C (73.4 °F) is a flammable liquid.
  it.each([
    [{ flashPointC: 12 }, ['Flammable (flash point 12 °C)']],
    [{ flashPointC: 23 }, []],
    [{ isLime: true, containsSilica: true }, ['Caustic (lime)', 'Contains silica']],
    [{}, []],
  ])('hazardWords(%j)', (hazards, texts) => {
    expect(hazardWords(hazards).map((w) => w.text)).toEqual(texts);
  });

  it.each([
    [null, 'Leave empty if it does not burn. Below 23 °C it counts as flammable (29 CFR 1910.106).'],
    [12, 'Flammable: 12 °C is below 23 °C (29 CFR 1910.106). Crew sheets will carry the fire cautions.'],
    [23, 'Not flammable under 29 CFR 1910.106: 23 °C is 23 °C or above. Still keep it away from flames.'],
  ])('flammableNote(%s)', (c, note) => expect(flammableNote(c)).toBe(note));
});
