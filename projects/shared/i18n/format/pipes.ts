import { Pipe, type PipeTransform, inject } from '@angular/core';
import { Language } from '../language';
import { type DateStyle, formatAmount, formatDate, formatNumber } from './format';

/**
 * `{{ invoice.total | lbMoney: invoice.currency }}` — an API amount (decimal string) in the reader's
 * language and the firm's country, exact (the domain's formatMoney). Impure: it follows a language switch.
 */
@Pipe({ name: 'lbMoney', pure: false })
export class LbMoneyPipe implements PipeTransform {
  private readonly language = inject(Language);

  private readonly last = new LastAnswer();

  transform(amount: string | null | undefined, currency: string | null | undefined): string {
    const locale = this.language.locale();
    return this.last.for([amount, currency, locale], () => formatAmount(amount, currency, locale));
  }
}

/**
 * `{{ '2026-03-14' | lbDate }}` a calendar day (UTC, never shifts); `{{ sentAt | lbDate: 'long' }}` an
 * instant with date and short time in the reader's zone; `{{ sentAt | lbDate: 'long' : null }}` date
 * only; `{{ at | lbDate: 'medium' : 'short' : firmZone }}` in an IANA zone. Impure: follows a language switch.
 */
@Pipe({ name: 'lbDate', pure: false })
export class LbDatePipe implements PipeTransform {
  private readonly language = inject(Language);

  private readonly last = new LastAnswer();

  transform(value: string | null | undefined, style: DateStyle = 'medium', timeStyle?: DateStyle | null, timeZone?: string): string {
    const locale = this.language.locale();
    return this.last.for([value, style, timeStyle, timeZone, locale], () => formatDate(value, locale, style, timeStyle, timeZone));
  }
}

/**
 * `{{ hours | lbNumber }}`, `{{ share | lbNumber: { style: 'percent' } }}`, `{{ '12.345' | lbNumber: { maximumFractionDigits: 2 } }}`
 * — numbers and decimal strings (kept exact) in the reader's locale. Impure: follows a language switch.
 */
@Pipe({ name: 'lbNumber', pure: false })
export class LbNumberPipe implements PipeTransform {
  private readonly language = inject(Language);

  private readonly last = new LastAnswer();

  transform(value: number | string | null | undefined, options?: Intl.NumberFormatOptions): string {
    const locale = this.language.locale();
    return this.last.for([value, options, locale], () => formatNumber(value, locale, options));
  }
}

/**
 * The pipes are impure (they follow a language switch), so they run on every check of their view:
 * each keeps its last inputs and text and formats again only when one of them changed.
 */
class LastAnswer {
  private inputs: readonly unknown[] | null = null;
  private text = '';

  for(inputs: readonly unknown[], format: () => string): string {
    const previous = this.inputs;
    if (previous === null || previous.length !== inputs.length || inputs.some((input, i) => !Object.is(input, previous[i]))) {
      this.text = format();
      this.inputs = inputs;
    }
    return this.text;
  }
}

/** The three locale-aware pipes, for a component's `imports`. */
export const LB_FORMAT_PIPES = [LbMoneyPipe, LbDatePipe, LbNumberPipe] as const;
