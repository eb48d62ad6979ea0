import { expectInputError } from '../errors/expect-input-error';
import { type PaymentTerms, dueDate, termsText } from './due-date';

// Net N: payment due N calendar days after the invoice date; on receipt: due on the invoice date (common practice, no source).
describe('due date from payment terms', () => {
  it.each<[string, PaymentTerms, string]>([
    ['2026-03-10', { kind: 'onReceipt' }, '2026-03-10'],
    ['2026-03-10', { kind: 'net', days: 1 }, '2026-03-11'],
    ['2026-03-10', { kind: 'net', days: 30 }, '2026-04-09'],
    // across a year end and through a leap day (2028 is a leap year: Gregorian rule, divisible by 4 and not a century)
    ['2026-12-15', { kind: 'net', days: 30 }, '2027-01-14'],
    ['2028-02-15', { kind: 'net', days: 15 }, '2028-03-01'],
    ['2027-02-15', { kind: 'net', days: 15 }, '2027-03-02'],
    // a Saturday due date stays a Saturday: net terms count calendar days, not working days
    ['2026-12-02', { kind: 'net', days: 10 }, '2026-12-12'],
    ['2026-01-01', { kind: 'net', days: 365 }, '2027-01-01'],
  ])('issued %s on %j → due %s', (issuedOn, terms, due) => expect(dueDate(issuedOn, terms)).toBe(due));

  it.each<[PaymentTerms, string]>([
    [{ kind: 'onReceipt' }, 'Due on receipt'],
    [{ kind: 'net', days: 30 }, 'Net 30 (due 30 days after the invoice date)'],
    [{ kind: 'net', days: 1 }, 'Net 1 (due 1 day after the invoice date)'],
  ])('%j reads "%s"', (terms, text) => expect(termsText(terms)).toBe(text));

  it('refuses days outside 1–365, unknown terms and bad dates, naming the field', () => {
    for (const days of [0, -5, 366, 2.5, Number.NaN]) {
      expectInputError(() => dueDate('2026-03-10', { kind: 'net', days }), 'terms.days', /1 to 365/);
      expectInputError(() => termsText({ kind: 'net', days }), 'terms.days');
    }
    expectInputError(() => dueDate('2026-03-10', { kind: 'later' } as unknown as PaymentTerms), 'terms.kind');
    expectInputError(() => dueDate('2026-02-30', { kind: 'onReceipt' }), 'issuedOn', /real calendar date/);
  });
});
