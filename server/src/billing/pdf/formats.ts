import { formatMoney } from '@layerbook/domain';
import { formatsFor } from '../../proposals/pdf/format';

/** Money and dates as invoices print them: money through the domain's formatMoney (the same strings as the screen and the e-mail). */
export interface BillingFormats {
  money(amount: string): string;
  /** an amount taken off: "− $300.00" */
  minus(amount: string): string;
  date(iso: string): string;
}

export function billingFormats(locale: string, currency: string): BillingFormats {
  const dates = formatsFor(locale, currency);
  const money = (amount: string) => formatMoney(amount, currency, locale);
  return { money, minus: (amount) => `\u2212 ${money(amount)}`, date: (iso) => dates.date(iso) };
}
