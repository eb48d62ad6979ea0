import { describe, expect, it } from 'vitest';
import { displayLengthUnit, formatDay, formatHour, formatPlanTime, jobDatesWords, surfaceSizes, todayIn } from './sheet-format';
import { sheet } from './sheet-fixtures';

const walls = sheet.rooms[0].surfaces[0];
// NIST SP 811 App. B.8: 1 ft² = 0.09290304 m² exactly
const M2_PER_FT2 = 0.09290304;

describe('surfaceSizes', () => {
  it('shows sizes stored in m² in ft² for an imperial firm: gross, openings, net', () => {
    const sizes = surfaceSizes(walls, 'm', 'imperial');
    expect(sizes.unit).toBe('ft');
    expect(sizes.gross).toBeCloseTo(44 / M2_PER_FT2, 9);
    expect(sizes.deductions).toBeCloseTo(4 / M2_PER_FT2, 9);
    expect(sizes.net).toBeCloseTo(40 / M2_PER_FT2, 9);
  });

  it('keeps metres for a metric firm and converts running lengths as lengths', () => {
    expect(surfaceSizes(walls, 'm', 'metric')).toEqual({ measure: 'area', unit: 'm', gross: 44, deductions: 4, net: 40 });
    // NIST SP 811 App. B.8: 1 ft = 0.3048 m exactly
    const crown = { ...walls, measure: 'length' as const, quantity: 3.048, gross: 3.048, deductions: 0 };
    expect(surfaceSizes(crown, 'm', 'imperial').net).toBeCloseTo(10, 9);
  });

  it('reads feet for imperial and metres for metric', () => {
    expect(displayLengthUnit('imperial')).toBe('ft');
    expect(displayLengthUnit('metric')).toBe('m');
  });
});

describe('dates and times on the sheet', () => {
  it.each([
    // weekday names and order per CLDR (Intl); the plan's hours are already the firm's local time
    ['en-US', 'Thu 09:00'],
    ['es-US', 'jue 09:00'],
  ])('a drying wait until 2026-12-10 at 9 reads in %s as %s', (locale, shown) => {
    expect(formatPlanTime('2026-12-10', 9, locale)).toBe(shown);
  });

  it('writes half hours of the working day', () => {
    expect(formatHour(8.5, 'en-US')).toBe('08:30');
    expect(formatHour(15, 'es-US')).toBe('15:00');
  });

  it('writes a calendar day without shifting it by the viewer zone', () => {
    expect(formatDay('2026-12-08', 'es-US', 'full')).toBe('martes, 8 de diciembre de 2026');
    expect(formatDay('not a day', 'en-US')).toBe('not a day');
  });

  it('dates a mark by the day where the firm works, not the phone clock zone', () => {
    // 03:30 UTC on Dec 3 is 21:30 on Dec 2 in Chicago (UTC−6 in December, IANA tz database)
    expect(todayIn('America/Chicago', new Date('2026-12-03T03:30:00Z'))).toBe('2026-12-02');
    expect(todayIn('Europe/Madrid', new Date('2026-12-03T03:30:00Z'))).toBe('2026-12-03');
  });
});

describe('jobDatesWords', () => {
  it('says a job\u2019s dates as one of three sentences, days in the reader\u2019s locale', () => {
    expect(jobDatesWords({ startDate: '2026-12-07', finishDate: '2026-12-11' }, 'en-US')).toEqual({
      key: 'sheet.list.dates',
      params: { start: 'Dec 7, 2026', finish: 'Dec 11, 2026' },
    });
    expect(jobDatesWords({ startDate: '2026-12-07', finishDate: null }, 'en-US')).toEqual({
      key: 'sheet.list.from',
      params: { date: 'Dec 7, 2026' },
    });
    expect(jobDatesWords({ startDate: null, finishDate: null }, 'en-US')).toEqual({ key: 'sheet.list.noDates', params: {} });
  });
});
