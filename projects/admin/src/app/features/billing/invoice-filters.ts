import { Params } from '@angular/router';
import { INVOICE_LIST_FILTERS, PAGE_SIZE_DEFAULT, SEARCH_MAX_LENGTH, type InvoiceListFilter } from '@layerbook/contracts/types';

/** What the invoice list shows; kept in the address bar so a filtered list can be bookmarked. */
export interface InvoiceFilters {
  readonly filter: InvoiceListFilter;
  /** an invoice number or a client's name */
  readonly q: string;
}

export const NO_INVOICE_FILTERS: InvoiceFilters = { filter: 'all', q: '' };

/** Reads the filters from the address bar; anything it does not know is left out. */
export function invoiceFiltersFromParams(params: Params): InvoiceFilters {
  const { filter, q }: Record<string, unknown> = params;
  return {
    filter: INVOICE_LIST_FILTERS.find((choice) => choice === filter) ?? 'all',
    q: typeof q === 'string' ? q.slice(0, SEARCH_MAX_LENGTH) : '',
  };
}

/** Defaults are left out, so the plain list has a plain address. */
export function invoiceFiltersToParams(filters: InvoiceFilters): Params {
  return { filter: filters.filter === 'all' ? null : filters.filter, q: filters.q.trim() || null };
}

/** The query of GET /api/invoices (blank ones left out). */
export function invoiceListParams(filters: InvoiceFilters): Record<string, string | number> {
  const params: Record<string, string | number> = { filter: filters.filter, limit: PAGE_SIZE_DEFAULT };
  const q = filters.q.trim();
  if (q) {
    params['q'] = q;
  }
  return params;
}

export const sameInvoiceFilters = (a: InvoiceFilters, b: InvoiceFilters): boolean => a.filter === b.filter && a.q === b.q;
