/**
 * Smallest amount Stripe charges, in the currency's smallest unit, for the common settlement
 * currencies (Stripe Docs "Supported currencies" — "Minimum and maximum charge amounts"). Currencies
 * not listed have no minimum in the stand-in.
 */
export const MINIMUM_CHARGE: Readonly<Record<string, number>> = {
  usd: 50,
  aed: 200,
  aud: 50,
  bgn: 100,
  brl: 50,
  cad: 50,
  chf: 50,
  czk: 1500,
  dkk: 250,
  eur: 50,
  gbp: 30,
  hkd: 400,
  huf: 17500,
  inr: 50,
  jpy: 50,
  mxn: 1000,
  myr: 200,
  nok: 300,
  nzd: 50,
  pln: 200,
  ron: 200,
  sek: 300,
  sgd: 50,
  thb: 1000,
};

/** How many decimals an amount in `currency` shows (Intl's table: jpy 0, kwd 3, usd 2). */
export function currencyDigits(currency: string): number {
  try {
    return (
      new Intl.NumberFormat('en', { style: 'currency', currency: currency.toUpperCase() }).resolvedOptions().maximumFractionDigits ?? 2
    );
  } catch {
    return 2;
  }
}

/** An amount in the smallest unit, shown with its currency ("$50.00", "¥5,000"). */
export function formatAmount(amount: number, currency: string): string {
  const digits = currencyDigits(currency);
  try {
    return new Intl.NumberFormat('en', { style: 'currency', currency: currency.toUpperCase() }).format(amount / 10 ** digits);
  } catch {
    return `${(amount / 10 ** digits).toFixed(digits)} ${currency.toUpperCase()}`;
  }
}
