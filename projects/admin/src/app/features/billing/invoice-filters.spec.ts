import { describe, expect, it } from 'vitest';
import {
  NO_INVOICE_FILTERS,
  invoiceFiltersFromParams,
  invoiceFiltersToParams,
  invoiceListParams,
  sameInvoiceFilters,
} from './invoice-filters';

describe('invoice filters', () => {
  it.each([
    ['nothing', {}, NO_INVOICE_FILTERS],
    ['a filter and a search', { filter: 'overdue', q: 'INV-0007' }, { filter: 'overdue', q: 'INV-0007' }],
    ['an unknown filter', { filter: 'unpaid' }, NO_INVOICE_FILTERS],
    ['repeated parameters', { filter: ['open', 'paid'], q: ['a', 'b'] }, NO_INVOICE_FILTERS],
    ['a search cut to the API limit', { q: 'x'.repeat(150) }, { filter: 'all', q: 'x'.repeat(100) }],
  ])('reads %s from the address bar', (_case, params, expected) => {
    expect(invoiceFiltersFromParams(params)).toEqual(expected);
  });

  it('leaves defaults out of the address', () => {
    expect(invoiceFiltersToParams(NO_INVOICE_FILTERS)).toEqual({ filter: null, q: null });
    expect(invoiceFiltersToParams({ filter: 'drafts', q: '  Ward ' })).toEqual({ filter: 'drafts', q: 'Ward' });
  });

  it('asks the API with its own names, a blank search left out', () => {
    expect(invoiceListParams({ filter: 'all', q: ' ' })).toEqual({ filter: 'all', limit: 50 });
    expect(invoiceListParams({ filter: 'open', q: ' Ward ' })).toEqual({ filter: 'open', limit: 50, q: 'Ward' });
  });

  it('compares filters', () => {
    expect(sameInvoiceFilters({ filter: 'open', q: 'a' }, { filter: 'open', q: 'a' })).toBe(true);
    expect(sameInvoiceFilters({ filter: 'open', q: 'a' }, { filter: 'paid', q: 'a' })).toBe(false);
  });
});
