import { Params } from '@angular/router';
import { PAGE_SIZE_DEFAULT, SEARCH_MAX_LENGTH, isClientKind, type ClientKind } from '@layerbook/contracts/types';

/** What the client list shows; kept in the address bar like the inquiry table's. */
export interface ClientFilters {
  readonly q: string;
  readonly kind: ClientKind | null;
}

export const NO_CLIENT_FILTERS: ClientFilters = { q: '', kind: null };

export function clientFiltersFromParams(params: Params): ClientFilters {
  const { q, kind }: Record<string, unknown> = params;
  return { q: typeof q === 'string' ? q.slice(0, SEARCH_MAX_LENGTH) : '', kind: isClientKind(kind) ? kind : null };
}

/** Blank filters are left out of the address. */
export function clientFiltersToParams(filters: ClientFilters): Params {
  return { q: filters.q.trim() || null, kind: filters.kind };
}

/** The query of GET /api/clients for these filters. */
export function clientListParams(filters: ClientFilters): Record<string, string | number> {
  const params: Record<string, string | number> = { limit: PAGE_SIZE_DEFAULT };
  const q = filters.q.trim();
  if (q) {
    params['q'] = q;
  }
  if (filters.kind) {
    params['kind'] = filters.kind;
  }
  return params;
}

export function sameClientFilters(a: ClientFilters, b: ClientFilters): boolean {
  return a.q === b.q && a.kind === b.kind;
}
