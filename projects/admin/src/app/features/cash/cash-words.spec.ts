import { describe, expect, it } from 'vitest';
import { lateWords, monthLabel, percentWords, weekLabel } from './cash-words';

describe('cash words', () => {
  it('names months and weeks shortly, and leaves what it cannot read as it came', () => {
    expect(monthLabel('2026-11')).toBe('Nov 2026');
    expect(monthLabel('2026-01')).toBe('Jan 2026');
    expect(monthLabel('2026-13')).toBe('2026-13');
    expect(weekLabel('2026-11-30')).toBe('30 Nov');
    expect(weekLabel('2027-01-04')).toBe('4 Jan');
    expect(weekLabel('soon')).toBe('soon');
  });

  it('says how late in days, with "not yet due" on or before the due day', () => {
    expect(lateWords(-3)).toBe('Not yet due');
    expect(lateWords(0)).toBe('Not yet due');
    expect(lateWords(1)).toBe('1 day late');
    expect(lateWords(31)).toBe('31 days late');
  });

  it('shows a percent as the API gave it, and a dash when there is no figure', () => {
    expect(percentWords('40')).toBe('40%');
    expect(percentWords('33.3')).toBe('33.3%');
    expect(percentWords(null)).toBe('—');
    expect(percentWords('n/a')).toBe('—');
  });
});
