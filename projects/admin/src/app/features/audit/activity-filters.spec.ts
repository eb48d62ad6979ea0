import { describe, expect, it } from 'vitest';
import {
  NO_ACTIVITY_FILTERS,
  activityFilterProblem,
  activityFiltersFromParams,
  activityFiltersToParams,
  activityListParams,
  recordIdIn,
  recordRoute,
} from './activity-filters';

const ID = '5b0a3f7e-1c2d-4e5f-8a9b-0c1d2e3f4a5b';

describe('activity filters', () => {
  it('reads the address bar, dropping what is not a filter value', () => {
    expect(activityFiltersFromParams({ kind: 'voids', from: '2026-11-01', to: 'soon', person: ID, record: 'INV' })).toEqual({
      person: ID,
      kind: 'voids',
      from: '2026-11-01',
      to: '',
      record: 'INV',
    });
    expect(activityFiltersFromParams({ kind: 'everything', person: 'me' })).toEqual(NO_ACTIVITY_FILTERS);
  });

  it('leaves empty filters out of the address bar and the query', () => {
    expect(activityFiltersToParams({ ...NO_ACTIVITY_FILTERS, kind: 'payments' })).toEqual({
      person: null,
      kind: 'payments',
      from: null,
      to: null,
      record: null,
    });
    expect(activityListParams(NO_ACTIVITY_FILTERS)).toEqual({ limit: 50 });
    expect(activityListParams({ ...NO_ACTIVITY_FILTERS, record: `https://app.example/billing/invoices/${ID.toUpperCase()}` })).toEqual({
      limit: 50,
      record: ID,
    });
  });

  it('finds the record id in a pasted page address', () => {
    expect(recordIdIn(`/jobs/${ID}/billing`)).toBe(ID);
    expect(recordIdIn('INV-0007')).toBeNull();
  });

  it('names the wrong field before asking', () => {
    expect(activityFilterProblem({ ...NO_ACTIVITY_FILTERS, record: 'INV-0007' })).toBe('record');
    expect(activityFilterProblem({ ...NO_ACTIVITY_FILTERS, from: '2026-12-02', to: '2026-12-01' })).toBe('to');
    expect(activityFilterProblem({ ...NO_ACTIVITY_FILTERS, from: '2026-12-01', to: '2026-12-01' })).toBeNull();
  });

  it('links a record to its page, or to the list that holds it', () => {
    expect(recordRoute({ area: 'invoice', id: ID })).toEqual(['/billing/invoices', ID]);
    expect(recordRoute({ area: 'finishSystem', id: ID })).toEqual(['/library/systems', ID]);
    expect(recordRoute({ area: 'products', id: null })).toEqual(['/library/products']);
    expect(recordRoute({ area: 'job', id: null })).toBeNull();
    expect(recordRoute(null)).toBeNull();
  });
});
