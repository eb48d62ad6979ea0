import type { Language } from '@layerbook/contracts';
import { formatMoney } from '@layerbook/domain';
import { localeOf, translator, type Translate } from '../../i18n/catalog';
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

/** The reader's words and formats for one document: the client's language with the firm's country ("es-US"). */
export function printingFor(
  reader: { readonly language: Language; readonly country: string },
  currency: string,
): { t: Translate; f: BillingFormats } {
  return { t: translator(reader.language), f: billingFormats(localeOf(reader.language, reader.country), currency) };
}
