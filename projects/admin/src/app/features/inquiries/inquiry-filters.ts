import { Params } from '@angular/router';
import {
  INQUIRY_SORTS,
  PAGE_SIZE_DEFAULT,
  SEARCH_MAX_LENGTH,
  isInquirySource,
  isInquiryStage,
  type InquirySort,
  type InquirySource,
  type InquiryStage,
} from '@layerbook/contracts/types';

/** What the table shows; kept in the address bar so a filtered list can be bookmarked or shared. */
export interface InquiryFilters {
  readonly stage: InquiryStage | null;
  readonly source: InquirySource | null;
  /** A user id, or "none" for unassigned. */
  readonly assignee: string | null;
  readonly q: string;
  readonly sort: InquirySort;
}

export const NO_FILTERS: InquiryFilters = { stage: null, source: null, assignee: null, q: '', sort: 'newest' };

/** Reads the filters from the address bar; anything it does not know is left out. */
export function filtersFromParams(params: Params): InquiryFilters {
  const { stage, source, assignee, q, sort }: Record<string, unknown> = params;
  return {
    stage: isInquiryStage(stage) ? stage : null,
    source: isInquirySource(source) ? source : null,
    assignee: typeof assignee === 'string' && assignee ? assignee : null,
    q: typeof q === 'string' ? q.slice(0, SEARCH_MAX_LENGTH) : '',
    sort: INQUIRY_SORTS.find((choice) => choice === sort) ?? 'newest',
  };
}

/** Defaults are left out, so the plain list has a plain address. */
export function filtersToParams(filters: InquiryFilters): Params {
  return {
    stage: filters.stage ?? null,
    source: filters.source ?? null,
    assignee: filters.assignee ?? null,
    q: filters.q.trim() || null,
    sort: filters.sort === 'newest' ? null : filters.sort,
  };
}

/** The query of GET /api/inquiries for these filters (the API's own names; blank ones left out). */
export function listParams(filters: InquiryFilters): Record<string, string | number> {
  const params: Record<string, string | number> = { sort: filters.sort, limit: PAGE_SIZE_DEFAULT };
  for (const key of ['stage', 'source', 'assignee'] as const) {
    const value = filters[key];
    if (value) {
      params[key] = value;
    }
  }
  const q = filters.q.trim();
  if (q) {
    params['q'] = q;
  }
  return params;
}

export function sameFilters(a: InquiryFilters, b: InquiryFilters): boolean {
  return a.stage === b.stage && a.source === b.source && a.assignee === b.assignee && a.q === b.q && a.sort === b.sort;
}

export function hasFilters(filters: InquiryFilters): boolean {
  return !!(filters.stage || filters.source || filters.assignee || filters.q);
}
