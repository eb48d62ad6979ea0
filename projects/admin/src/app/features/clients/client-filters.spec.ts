import { describe, expect, it } from 'vitest';
import { NO_CLIENT_FILTERS, clientFiltersFromParams, clientFiltersToParams, clientListParams, sameClientFilters } from './client-filters';

describe('clientFiltersFromParams', () => {
  it.each([
    ['nothing', {}, NO_CLIENT_FILTERS],
    ['a search and a kind', { q: 'ash', kind: 'designer' }, { q: 'ash', kind: 'designer' }],
    ['an unknown kind', { kind: 'landlord' }, NO_CLIENT_FILTERS],
    ['a search cut to the API limit', { q: 'y'.repeat(120) }, { q: 'y'.repeat(100), kind: null }],
  ])('reads %s', (_case, params, expected) => {
    expect(clientFiltersFromParams(params)).toEqual(expected);
  });
});

describe('clientFiltersToParams and clientListParams', () => {
  it.each([
    ['no filters', NO_CLIENT_FILTERS, { q: null, kind: null }, { limit: 50 }],
    ['a padded search', { q: '  ash ', kind: null }, { q: 'ash', kind: null }, { limit: 50, q: 'ash' }],
    [
      'a kind',
      { q: '', kind: 'general_contractor' } as const,
      { q: null, kind: 'general_contractor' },
      { limit: 50, kind: 'general_contractor' },
    ],
  ])('writes %s', (_case, filters, address, query) => {
    expect(clientFiltersToParams(filters)).toEqual(address);
    expect(clientListParams(filters)).toEqual(query);
  });

  it('compares field by field', () => {
    expect(sameClientFilters({ q: 'a', kind: null }, { q: 'a', kind: null })).toBe(true);
    expect(sameClientFilters({ q: 'a', kind: null }, { q: 'a', kind: 'other' })).toBe(false);
  });
});
