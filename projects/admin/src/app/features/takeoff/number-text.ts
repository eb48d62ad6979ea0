/**
 * Typed numbers on a phone keyboard: "9", "9.5", ".5", "-2" (corners only). Blank is null, anything
 * else NaN, so each rule can say what is wrong. Only the dot is a decimal mark: "1,5" could be
 * one and a half or fifteen, and a wrong guess would go straight into an estimate.
 */
export function readNumber(typed: string | null | undefined): number | null {
  const plain = (typed ?? '').trim();
  if (plain === '') return null;
  return /^-?(\d+\.?\d*|\.\d+)$/.test(plain) ? Number(plain) : Number.NaN;
}

/** For labels and sketches: at most two decimals, no trailing zeros ("9", "4.5", "282.74"). */
export function shortNumber(value: number): string {
  return String(Number(value.toFixed(2)));
}

/** For the measured amounts: always two decimals, grouped ("1,204.50"). */
export function amount(value: number): string {
  return value.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
}
