/**
 * Printing helpers. Money arrives as decimal strings and is handed to Intl as a string (exact
 * decimal formatting, ES2023 Intl.NumberFormat v3), so no amount ever becomes a float.
 */
export interface Formats {
  money(amount: string): string;
  date(iso: string): string;
  quantity(n: number, unit: string): string;
}

export function formatsFor(locale: string, currency: string): Formats {
  const money = new Intl.NumberFormat(locale, { style: 'currency', currency });
  const date = new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' });
  const qty = new Intl.NumberFormat(locale, { maximumFractionDigits: 1 });
  return {
    // The typings stop at number | bigint; the runtime (Node 20) takes a decimal string exactly.
    money: (amount) => money.format(amount as unknown as number),
    date: (iso) => date.format(new Date(`${iso}T00:00:00Z`)),
    quantity: (n, unit) => `${qty.format(n)} ${unit}`,
  };
}
