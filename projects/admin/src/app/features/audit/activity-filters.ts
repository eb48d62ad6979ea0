import { AUDIT_KINDS, PAGE_SIZE_DEFAULT, type AuditKind, type AuditRecordLink } from '@layerbook/contracts/types';

/** What the owner filters the activity by; '' is "any". Kept in the address bar. */
export interface ActivityFilters {
  readonly person: string;
  readonly kind: AuditKind | '';
  readonly from: string;
  readonly to: string;
  /** as typed or pasted: a record's id, or the address of its page */
  readonly record: string;
}

export const NO_ACTIVITY_FILTERS: ActivityFilters = { person: '', kind: '', from: '', to: '', record: '' };

const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;

const text = (value: unknown) => (typeof value === 'string' ? value : '');

export function activityFiltersFromParams(params: Readonly<Record<string, unknown>>): ActivityFilters {
  const day = (value: unknown) => (ISO_DAY.test(text(value)) ? text(value) : '');
  return {
    person: recordIdIn(text(params['person'])) ?? '',
    kind: AUDIT_KINDS.find((kind) => kind === params['kind']) ?? '',
    from: day(params['from']),
    to: day(params['to']),
    record: text(params['record']).slice(0, 200),
  };
}

/** For the router: empty filters leave the address bar. */
export function activityFiltersToParams(filters: ActivityFilters): Record<string, string | null> {
  return {
    person: filters.person || null,
    kind: filters.kind || null,
    from: filters.from || null,
    to: filters.to || null,
    record: filters.record.trim() || null,
  };
}

export const sameActivityFilters = (a: ActivityFilters, b: ActivityFilters) =>
  a.person === b.person && a.kind === b.kind && a.from === b.from && a.to === b.to && a.record === b.record;

/** The last id in what was typed: a pasted page address (`/billing/invoices/<id>`) names its record's id last. */
export function recordIdIn(typed: string): string | null {
  const ids = typed.match(UUID);
  return ids ? ids[ids.length - 1].toLowerCase() : null;
}

/** Which field is wrong before asking the server, or null. */
export function activityFilterProblem(filters: ActivityFilters): 'record' | 'to' | null {
  if (filters.record.trim() && !recordIdIn(filters.record)) return 'record';
  if (filters.from && filters.to && filters.from > filters.to) return 'to';
  return null;
}

/** The API's query for these filters (only what is set). */
export function activityListParams(filters: ActivityFilters): Record<string, string | number> {
  const params: Record<string, string | number> = { limit: PAGE_SIZE_DEFAULT };
  if (filters.person) params['person'] = filters.person;
  if (filters.kind) params['kind'] = filters.kind;
  if (filters.from) params['from'] = filters.from;
  if (filters.to) params['to'] = filters.to;
  const record = recordIdIn(filters.record);
  if (record) params['record'] = record;
  return params;
}

/** The admin page that shows an entry's record, as router commands; null where there is none. */
export function recordRoute(link: AuditRecordLink | null): string[] | null {
  if (!link) return null;
  const withId = (base: string) => (link.id ? [base, link.id] : null);
  switch (link.area) {
    case 'invoice':
      return withId('/billing/invoices');
    case 'job':
      return withId('/jobs');
    case 'client':
      return withId('/clients');
    case 'estimate':
      return withId('/estimates');
    case 'inquiry':
      return withId('/inquiries');
    case 'sampleBoard':
      return withId('/samples');
    case 'finishSystem':
      return withId('/library/systems');
    case 'products':
      return ['/library/products'];
    case 'team':
      return ['/team'];
    case 'settings':
      return ['/settings'];
  }
}
