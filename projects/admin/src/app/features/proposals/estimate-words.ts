import type { LabourMultipliers, QuantityUnit } from '@layerbook/domain';

export const STATUS_WORDS: Readonly<Record<string, string>> = {
  draft: 'Draft',
  proposed: 'Proposal sent',
  accepted: 'Accepted',
  declined: 'Declined',
};

export function statusWord(status: string): string {
  return STATUS_WORDS[status] ?? status;
}

const MULTIPLIER_WORDS: Readonly<Record<keyof LabourMultipliers, string>> = {
  ceiling: 'ceiling',
  height: 'high work',
  curvedWall: 'curved wall',
  curvedCeiling: 'curved ceiling',
  occupied: 'lived-in home',
};

/** "ceiling ×1.25 · curved ceiling ×1.5", or "no extra time". */
export function multiplierChain(chain: ReadonlyArray<{ name: keyof LabourMultipliers; factor: number }>): string {
  if (chain.length === 0) {
    return 'no extra time';
  }
  return chain.map((step) => `${MULTIPLIER_WORDS[step.name] ?? step.name} ×${roundTo(step.factor, 3)}`).join(' · ');
}

const UNIT_WORDS: Readonly<Record<QuantityUnit, string>> = {
  mL: 'mL',
  L: 'L',
  cm3: 'cm³',
  m3: 'm³',
  in3: 'in³',
  ft3: 'ft³',
  tsp: 'tsp',
  tbsp: 'tbsp',
  floz: 'fl oz',
  cup: 'cups',
  pint: 'pt',
  quart: 'qt',
  gallon: 'gal',
  g: 'g',
  kg: 'kg',
  oz: 'oz',
  lb: 'lb',
};

export function unitWord(unit: QuantityUnit): string {
  return UNIT_WORDS[unit] ?? unit;
}

/** For display only: the numbers themselves keep full precision. */
export function roundTo(value: number, digits: number): string {
  return new Intl.NumberFormat('en-US', { maximumFractionDigits: digits }).format(value);
}

export function hoursText(hours: number): string {
  return `${roundTo(hours, 2)} h`;
}

export function measureUnit(lengthUnit: 'ft' | 'm', measure: 'area' | 'length'): string {
  return measure === 'area' ? `${lengthUnit}²` : lengthUnit === 'ft' ? 'ft (running)' : 'm (running)';
}

/** Ratios come as decimal strings ("0.5385"); Intl reads them exactly. */
export function percentText(ratio: string, locale: string): string {
  return new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 1 }).format(ratio as unknown as number);
}

/** Hour of the day (8.5) as clock time in the viewer's locale ("8:30 AM"). */
export function clockText(hourOfDay: number, locale: string): string {
  const minutes = Math.round(hourOfDay * 60);
  const date = new Date(Date.UTC(2000, 0, 1, 0, minutes));
  return new Intl.DateTimeFormat(locale, { hour: 'numeric', minute: '2-digit', timeZone: 'UTC' }).format(date);
}

/** "Tue 8:00 AM" for a calendar date and an hour of that day. */
export function dayAndClock(isoDate: string, hourOfDay: number, locale: string): string {
  const day = new Intl.DateTimeFormat(locale, { weekday: 'short', month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${isoDate}T00:00:00Z`),
  );
  return `${day}, ${clockText(hourOfDay, locale)}`;
}

export function dayWords(isoDate: string, locale: string): string {
  return new Intl.DateTimeFormat(locale, { weekday: 'long', month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${isoDate}T00:00:00Z`),
  );
}
