import { Pipe, type PipeTransform } from '@angular/core';
import { LbMoneyPipe } from '../../../../../shared/i18n/format';

/**
 * `{{ amount | money: currency }}`: an API amount (a decimal string like "12500.00") in the firm's
 * currency, never via a float, formatted for the reader's language and the firm's country
 * (the shared `lbMoney`, under the name admin templates already use). Impure: follows a language switch.
 */
@Pipe({ name: 'money', pure: false })
export class MoneyPipe extends LbMoneyPipe implements PipeTransform {}
