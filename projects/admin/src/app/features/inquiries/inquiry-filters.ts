import type { InquirySource, InquiryStage } from '@layerbook/contracts';
import { Params } from '@angular/router';
import { isSource, isStage } from '../../shared/ui/stage-words';

export const INQUIRY_SORTS = [
  { value: 'newest', label: 'Newest' },
  { value: 'oldest', label: 'Oldest' },
  { value: 'value', label: 'Highest value' },
  { value: 'follow_up', label: 'Next follow-up' },
] as const;
export type InquirySort = (typeof INQUIRY_SORTS)[number]['value'];

/** What the table shows; kept in the address bar so a filtered list can be bookmarked or shared. */
export interface InquiryFilters {
  readonly stage: InquiryStage | null;
  readonly source: InquirySource | null;
  /** A user id, or "none" for unassigned. */
  readonly assignee: string | null;
  readonly q: string;
  readonly sort: InquirySort;
}

export function filtersFromParams(params: Params): InquiryFilters {
  const sort = INQUIRY_SORTS.find((choice) => choice.value === params['sort'])?.value ?? 'newest';
  const stage: unknown = params['stage'];
  const source: unknown = params['source'];
  const assignee: unknown = params['assignee'];
  const q: unknown = params['q'];
  return {
    stage: isStage(stage) ? stage : null,
    source: isSource(source) ? source : null,
    assignee: typeof assignee === 'string' && assignee ? assignee : null,
    q: typeof q === 'string' ? q.slice(0, 100) : '',
    sort,
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
