import billing from '../../../i18n/billing/en.json';
import { wordsAt } from '../../testing/words';
import { describe, expect, it } from 'vitest';
import { invoiceStatusWords, isZeroAmount } from './invoice-words';

describe('invoiceStatusWords', () => {
  it.each([
    // status, overdue (from the server, firm-local today), words, urgent — our own words, common practice, no source
    ['issued', false, 'To pay', false],
    ['issued', true, 'Overdue', true],
    ['part_paid', false, 'Part paid, the rest to pay', false],
    ['part_paid', true, 'Overdue, part paid', true],
    ['paid', false, 'Paid', false],
    // a paid or void invoice is never overdue, whatever the flag says
    ['paid', true, 'Paid', false],
    ['void', true, 'Cancelled by a credit note', false],
    ['draft', false, 'To pay', false],
  ] as const)('%s (overdue %s) reads "%s"', (status, isOverdue, text, isUrgent) => {
    const words = invoiceStatusWords({ status, isOverdue });
    expect(wordsAt({ billing }, words.text)).toBe(text);
    expect(words.isUrgent).toBe(isUrgent);
    expect(words.icon).toBeTruthy();
  });
});

describe('isZeroAmount', () => {
  it.each([
    ['0', true],
    ['0.00', true],
    ['-0.00', true],
    [' 0.00 ', true],
    ['0.01', false],
    ['100.00', false],
    ['-5.00', false],
  ])('%s → %s', (amount, expected) => {
    expect(isZeroAmount(amount)).toBe(expected);
  });
});
