import { LOCALE_ID, Pipe, PipeTransform, inject } from '@angular/core';
import { DomainInputError, formatMoney } from '@layerbook/domain';

/** Shows an API amount (a decimal string like "12500.00") in the firm's currency, never via a float. */
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
    try {
      return formatMoney(amount, currency, this.locale);
    } catch (error) {
      // A value the formatter refuses still shows as the server sent it, rather than breaking the page.
      if (error instanceof DomainInputError) {
        return `${amount} ${currency}`;
      }
      throw error;
    }
  }
}
