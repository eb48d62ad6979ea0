import { DomainInputError } from '../errors/domain-input-error';
import { type IsoDate, fromDayNumber, toDayNumber } from '../calendar/local-date';

/** When an invoice is due: on receipt (the invoice date) or a number of calendar days after it. */
export type PaymentTerms = { kind: 'onReceipt' } | { kind: 'net'; days: number };

/** Net terms beyond a year are not payment terms but financing (common practice, no source). */
export const NET_DAYS_MAX = 365;

function netDays(terms: PaymentTerms, field: string): number {
  switch (terms.kind) {
    case 'onReceipt':
      return 0;
    case 'net': {
      const days = terms.days;
      if (typeof days !== 'number' || !Number.isInteger(days) || days < 1 || days > NET_DAYS_MAX) {
        throw new DomainInputError(`${field}.days`, `Net terms are a whole number of days from 1 to ${NET_DAYS_MAX}.`);
      }
      return days;
    }
    default:
      throw new DomainInputError(`${field}.kind`, 'Payment terms are on receipt or net a number of days.');
  }
}

/** The due date: the invoice date itself on receipt, or that many calendar days later for net terms (weekends count). */
export function dueDate(issuedOn: IsoDate, terms: PaymentTerms, field = 'terms'): IsoDate {
  const issued = toDayNumber(issuedOn, 'issuedOn');
  return fromDayNumber(issued + netDays(terms, field));
}

/** The terms in our words, as the invoice, its e-mail and the portal print them. */
export function termsText(terms: PaymentTerms, field = 'terms'): string {
  const days = netDays(terms, field);
  if (days === 0) return 'Due on receipt';
  return `Net ${days} (due ${days} ${days === 1 ? 'day' : 'days'} after the invoice date)`;
}
