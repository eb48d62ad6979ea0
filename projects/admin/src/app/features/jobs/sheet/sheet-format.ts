import { convertArea, convertLength } from '@layerbook/contracts/engine';
import type { JobSheet, SheetSurface, UnitSystem } from '@layerbook/contracts/types';
import { dateTimeFormat, numberFormat } from '../../../../../../shared/i18n/format/intl-cache';

type LengthUnit = JobSheet['lengthUnit'];

/** The unit the crew reads sizes in: feet for an imperial firm, metres for a metric one. */
export function displayLengthUnit(units: UnitSystem): LengthUnit {
  return units === 'metric' ? 'm' : 'ft';
}

/** A number for people: the locale's separators, at most `digits` decimals. */
export function formatNumber(value: number, locale: string, digits = 1): string {
  return numberFormat(locale, { maximumFractionDigits: digits }).format(value);
}

export interface SurfaceSizes {
  readonly measure: 'area' | 'length';
  /** ft, m (the symbol the words add ² to for areas) */
  readonly unit: LengthUnit;
  readonly gross: number;
  readonly deductions: number;
  readonly net: number;
}

/** A surface's gross, deductions (openings) and net in the firm's units (stored sizes may be in another unit). */
export function surfaceSizes(surface: SheetSurface, storedIn: LengthUnit, units: UnitSystem): SurfaceSizes {
  const unit = displayLengthUnit(units);
  const convert = surface.measure === 'area' ? convertArea : convertLength;
  return {
    measure: surface.measure,
    unit,
    gross: convert(surface.gross, storedIn, unit),
    deductions: convert(surface.deductions, storedIn, unit),
    net: convert(surface.quantity, storedIn, unit),
  };
}

/** A firm-local calendar day and hour as an instant read back in UTC, so no viewer's zone shifts it. */
function wallClock(isoDate: string, hour: number): Date {
  return new Date(Date.parse(`${isoDate}T00:00:00Z`) + Math.round(hour * 60) * 60_000);
}

/** "Tue 09:00": a day plan's time (firm-local already) in the reader's language. */
export function formatPlanTime(isoDate: string, hour: number, locale: string): string {
  return dateTimeFormat(locale, {
    weekday: 'short',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone: 'UTC',
  }).format(wallClock(isoDate, hour));
}

/** "09:30": an hour of the firm's working day. */
export function formatHour(hour: number, locale: string): string {
  return dateTimeFormat(locale, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone: 'UTC' }).format(
    wallClock('2000-01-01', hour),
  );
}

/** A calendar day ("2026-12-08") in words; the day never shifts with the viewer's zone. */
export function formatDay(isoDate: string, locale: string, style: 'medium' | 'full' = 'medium'): string {
  const date = new Date(`${isoDate}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  return dateTimeFormat(locale, { dateStyle: style, timeZone: 'UTC' }).format(date);
}

/** Today's date where the firm works (a mark made at 23:30 on site is that day's, wherever the phone thinks it is). */
export function todayIn(timeZone: string, now: Date): string {
  try {
    const parts = dateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(now);
    const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
    return `${part('year')}-${part('month')}-${part('day')}`;
  } catch {
    return now.toISOString().slice(0, 10);
  }
}

/** A job's dates as words: the key of its sentence ("Dec 7 to Dec 11", "From Dec 7", "No dates yet") and its params. */
export function jobDatesWords(
  job: { readonly startDate: string | null; readonly finishDate: string | null },
  locale: string,
): { readonly key: string; readonly params: Readonly<Record<string, string>> } {
  if (job.startDate && job.finishDate)
    return { key: 'sheet.list.dates', params: { start: formatDay(job.startDate, locale), finish: formatDay(job.finishDate, locale) } };
  if (job.startDate) return { key: 'sheet.list.from', params: { date: formatDay(job.startDate, locale) } };
  return { key: 'sheet.list.noDates', params: {} };
}
