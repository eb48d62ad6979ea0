import { describe, expect, it } from 'vitest';
import { defaultExportRange, exportHref, exportRangeProblem } from './export-range';

describe('export range', () => {
  it('takes a range of calendar days, first day first', () => {
    expect(exportRangeProblem('2026-01-01', '2026-12-02')).toBeNull();
    expect(exportRangeProblem('2026-12-02', '2026-12-02')).toBeNull();
    expect(exportRangeProblem('', '2026-12-02')).toEqual({ field: 'from', message: 'Choose the first day.' });
    expect(exportRangeProblem('2026-01-01', '')).toEqual({ field: 'to', message: 'Choose the last day.' });
    expect(exportRangeProblem('0026-01-01', '2026-12-02')?.field).toBe('from');
    expect(exportRangeProblem('2026-12-03', '2026-12-02')).toEqual({ field: 'to', message: 'The last day is before the first day.' });
  });

  it('refuses more than five years in one file, as the API does', () => {
    expect(exportRangeProblem('2021-12-03', '2026-12-02')).toBeNull();
    expect(exportRangeProblem('2021-12-02', '2026-12-02')?.message).toBe('One export covers at most 5 years.');
  });

  it('points each button at its file with the range in the address', () => {
    expect(exportHref('credit-notes', '2026-01-01', '2026-12-02')).toBe('/api/cash/exports/credit-notes.csv?from=2026-01-01&to=2026-12-02');
  });

  it('offers this year so far first', () => {
    expect(defaultExportRange('2026-12-02')).toEqual({ from: '2026-01-01', to: '2026-12-02' });
  });
});
