import { LOCALE_ID, Pipe, PipeTransform, inject } from '@angular/core';

/**
 * Formats an API amount (a decimal string like "12500.00") in the firm's currency.
 * Intl.NumberFormat reads numeric strings as exact decimals (ECMA-402 NumberFormat v3), so the
 * amount is never turned into a float; TypeScript's ES2022 lib does not know that overload yet.
 */
@Pipe({ name: 'money' })
export class MoneyPipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(amount: string | null | undefined, currency: string | null | undefined): string {
    if (amount === null || amount === undefined || amount === '') {
      return '';
    }
    if (!currency) {
      return amount;
    }
    const format = new Intl.NumberFormat(this.locale, { style: 'currency', currency });
    return format.format(amount as unknown as number);
  }
}
