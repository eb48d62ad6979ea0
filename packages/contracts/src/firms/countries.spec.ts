import { COUNTRIES, COUNTRY_CODES, countryName, isCountryCode } from './countries';
import { firmSettingsUpdate } from './firm';

// ISO 3166-1:2020 (Codes for the representation of names of countries), alpha-2 codes, from memory
// of the standard's officially assigned list (checked against ICU's region names).
describe('ISO 3166-1 alpha-2 country list', () => {
  it('holds the 249 officially assigned codes, each two capital letters, none twice', () => {
    expect(COUNTRIES).toHaveLength(249);
    for (const { code, name } of COUNTRIES) {
      expect(code).toMatch(/^[A-Z]{2}$/);
      expect(name.trim()).not.toBe('');
    }
    expect(new Set(COUNTRY_CODES).size).toBe(COUNTRIES.length);
    expect(new Set(COUNTRIES.map((c) => c.name)).size).toBe(COUNTRIES.length);
  });

  it.each([
    ['US', 'United States'],
    ['CA', 'Canada'],
    ['GB', 'United Kingdom'],
    ['MX', 'Mexico'],
    ['IE', 'Ireland'],
    ['AU', 'Australia'],
  ])('names %s %s', (code, name) => {
    expect(countryName(code)).toBe(name);
  });

  it.each(['UN', 'UK', 'EU', 'XK', 'ZZ', 'us', 'USA', ''])('does not list %j (reserved, withdrawn or not a code)', (code) => {
    expect(isCountryCode(code)).toBe(false);
  });
});

describe('firm settings country', () => {
  const settings = {
    name: 'Kiln Row Plaster',
    addressLine1: '',
    addressLine2: '',
    city: '',
    region: '',
    postalCode: '',
    country: 'US',
    phone: '',
    timeZone: 'America/New_York',
    currency: 'USD',
    units: 'imperial',
    language: 'en',
  } as const;

  it('accepts every listed code', () => {
    for (const { code } of COUNTRIES) {
      expect(firmSettingsUpdate.safeParse({ ...settings, country: code }).success).toBe(true);
    }
  });

  it.each(['UN', 'United States', 'us'])('refuses %j naming the country', (country) => {
    const res = firmSettingsUpdate.safeParse({ ...settings, country });
    expect(res.success).toBe(false);
    expect(res.error?.issues.map((i) => i.path.join('.'))).toEqual(['country']);
  });
});
