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
