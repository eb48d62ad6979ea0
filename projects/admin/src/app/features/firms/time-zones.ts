/** The zones this browser (or Node during SSR) knows, plus the firm's current one if it is missing. */
export function timeZoneChoices(current: string): readonly string[] {
  const known = Intl.supportedValuesOf('timeZone');
  return current && !known.includes(current) ? [current, ...known] : known;
}
