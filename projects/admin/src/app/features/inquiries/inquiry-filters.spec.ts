import { describe, expect, it } from 'vitest';
import { NO_FILTERS, filtersFromParams, filtersToParams, hasFilters, listParams, sameFilters } from './inquiry-filters';

describe('filtersFromParams', () => {
  it.each([
    ['nothing', {}, NO_FILTERS],
    [
      'every filter',
      { stage: 'samples', source: 'phone', assignee: 'none', q: 'mill lane', sort: 'value' },
      { stage: 'samples', source: 'phone', assignee: 'none', q: 'mill lane', sort: 'value' },
    ],
    ['an unknown stage, source and sort', { stage: 'maybe', source: 'pigeon', sort: 'sideways' }, NO_FILTERS],
    ['a search cut to the API limit', { q: 'x'.repeat(150) }, { ...NO_FILTERS, q: 'x'.repeat(100) }],
    ['repeated parameters', { stage: ['new', 'won'] }, NO_FILTERS],
  ])('reads %s', (_case, params, expected) => {
    expect(filtersFromParams(params)).toEqual(expected);
  });
});

describe('filtersToParams', () => {
  it('leaves defaults out so the plain list has a plain address', () => {
    expect(filtersToParams(NO_FILTERS)).toEqual({ stage: null, source: null, assignee: null, q: null, sort: null });
  });

  it('keeps what was chosen, the search trimmed', () => {
    const filters = { stage: 'won', source: 'showroom', assignee: 'u1', q: '  ash ', sort: 'oldest' } as const;
    expect(filtersToParams(filters)).toEqual({ stage: 'won', source: 'showroom', assignee: 'u1', q: 'ash', sort: 'oldest' });
    expect(filtersFromParams(filtersToParams(filters))).toEqual({ ...filters, q: 'ash' });
  });
});

describe('listParams', () => {
  it.each([
    ['no filters', NO_FILTERS, { sort: 'newest', limit: 50 }],
    ['a blank search', { ...NO_FILTERS, q: '   ' }, { sort: 'newest', limit: 50 }],
    [
      'every filter',
      { stage: 'new', source: 'phone', assignee: 'none', q: ' ada ', sort: 'follow_up' } as const,
      { stage: 'new', source: 'phone', assignee: 'none', q: 'ada', sort: 'follow_up', limit: 50 },
    ],
  ])('asks the API for %s', (_case, filters, expected) => {
    expect(listParams(filters)).toEqual(expected);
  });
});

describe('sameFilters and hasFilters', () => {
  it('compares field by field', () => {
    expect(sameFilters(NO_FILTERS, { ...NO_FILTERS })).toBe(true);
    expect(sameFilters(NO_FILTERS, { ...NO_FILTERS, sort: 'value' })).toBe(false);
  });

  it('counts a sort alone as no filter', () => {
    expect(hasFilters({ ...NO_FILTERS, sort: 'value' })).toBe(false);
    expect(hasFilters({ ...NO_FILTERS, q: 'a' })).toBe(true);
  });
});
