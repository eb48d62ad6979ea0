import { describe, expect, it } from 'vitest';
import { RECEIVABLES } from './cash-fixtures';
import { drillFromParams, drillHeading, drillToParams, drillUrl } from './receivable-drill';

describe('receivable drill-down', () => {
  it('reads the age, client and day from the address and ignores what it does not know', () => {
    expect(drillFromParams({ age: '31-60', client: 'c-1', asOf: '2026-11-30' })).toEqual({
      age: '31-60',
      clientId: 'c-1',
      asOf: '2026-11-30',
    });
    expect(drillFromParams({ age: '100+', client: '', asOf: '30/11/2026' })).toEqual({ age: null, clientId: null, asOf: null });
    expect(drillToParams({ age: '90+', clientId: null, asOf: null })).toEqual({ age: '90+', client: null, asOf: null });
  });

  it('asks the server for one age, one client or both, with a "+" sent as itself', () => {
    expect(drillUrl({ age: '31-60', clientId: null, asOf: null })).toBe('/api/cash/receivables/invoices?age=31-60');
    expect(drillUrl({ age: '90+', clientId: 'c-2', asOf: '2026-11-30' })).toBe(
      '/api/cash/receivables/invoices?asOf=2026-11-30&age=90%2B&client=c-2',
    );
    expect(drillUrl({ age: null, clientId: null, asOf: null })).toBe('/api/cash/receivables/invoices');
  });

  it('says what the list holds', () => {
    expect(drillHeading(RECEIVABLES, { age: '31-60', clientId: null, asOf: null })).toBe('Invoices 31–60 days late');
    expect(drillHeading(RECEIVABLES, { age: 'current', clientId: null, asOf: null })).toBe('Invoices not yet due');
    expect(drillHeading(RECEIVABLES, { age: null, clientId: 'c-1', asOf: null })).toBe('Open invoices for Ada Ward');
  });
});
