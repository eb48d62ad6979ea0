const PLACES = 4;
const SCALE = 10n ** BigInt(PLACES);

/**
 * Adds money given as decimal strings ("1250.5", "-3.00") exactly, never through floats, and
 * writes the sum with as many decimals as the most precise value had. Null when a value is not a
 * plain decimal (or has more than four decimals).
 */
export function sumDecimals(values: readonly string[]): string | null {
  let total = 0n;
  let places = 0;
  for (const value of values) {
    const match = /^(-?)(\d+)(?:\.(\d{1,4}))?$/.exec(value.trim());
    if (!match) return null;
    const fraction = match[3] ?? '';
    places = Math.max(places, fraction.length);
    const scaled = BigInt(match[2]!) * SCALE + BigInt(fraction.padEnd(PLACES, '0'));
    total += match[1] ? -scaled : scaled;
  }
  const sign = total < 0n ? '-' : '';
  const abs = total < 0n ? -total : total;
  const fraction = String(abs % SCALE).padStart(PLACES, '0').slice(0, places);
  return `${sign}${abs / SCALE}${places > 0 ? `.${fraction}` : ''}`;
}

/** Equal as amounts ("100" and "100.00"). */
export function sameAmount(a: string, b: string): boolean {
  const x = sumDecimals([a, '0.0000']);
  return x !== null && x === sumDecimals([b, '0.0000']);
}
