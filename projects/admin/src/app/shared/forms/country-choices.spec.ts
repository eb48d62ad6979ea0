import { COUNTRIES } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { COUNTRY_CHOICES } from './country-choices';

describe('COUNTRY_CHOICES', () => {
  it('offers every ISO 3166-1 country once, by name in alphabetical order', () => {
    expect(COUNTRY_CHOICES.map((c) => c.code).sort()).toEqual(COUNTRIES.map((c) => c.code).sort());
    const names = COUNTRY_CHOICES.map((c) => c.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    expect(COUNTRY_CHOICES.find((c) => c.code === 'US')?.name).toBe('United States');
  });

  it('offers no reserved or made-up code', () => {
    for (const code of ['UN', 'UK', 'EU', 'XX']) expect(COUNTRY_CHOICES.some((c) => c.code === code)).toBe(false);
  });
});
