import payments from '../../../i18n/payments/en.json';
import { wordsAt } from '../../testing/words';
import { describe, expect, it } from 'vitest';
import { CANCELLED_WORDS, checkoutWords, payButtonLabel, receiptWhat } from './payment-words';

const say = (key: string, params?: Readonly<Record<string, unknown>>) => wordsAt({ payments }, key, params);

// Our own words throughout — common practice, no source.
describe('checkoutWords', () => {
  it.each([
    ['open', false, 'Checking your payment', true],
    ['confirming', false, 'Payment received — being confirmed', true],
    ['paid', false, 'Paid — receipt RCT-0007', false],
    ['expired', false, 'This payment was not completed', false],
    // the page stopped asking: no more waiting, and never a hint to pay again
    ['open', true, 'We have not heard about this payment yet', false],
    ['confirming', true, 'Payment received — still being confirmed', false],
    ['paid', true, 'Paid — receipt RCT-0007', false],
  ] as const)('%s (stopped asking %s) reads "%s"', (state, gaveUp, heading, isWaiting) => {
    const words = checkoutWords({ state, receiptNumber: state === 'paid' ? 'RCT-0007' : null }, gaveUp);
    expect(say(words.heading, words.headingParams)).toBe(heading);
    expect(words.isWaiting).toBe(isWaiting);
    expect(words.icon).toBeTruthy();
    if (gaveUp && state !== 'paid') expect(say(words.text)).toContain('do not pay again');
  });

  it('says nothing was charged when the card page closed', () => {
    expect(say(checkoutWords({ state: 'expired', receiptNumber: null }, false).text)).toContain('nothing was charged');
  });

  it('reads "Paid" without a receipt number while none is given', () => {
    expect(say(checkoutWords({ state: 'paid', receiptNumber: null }, false).heading)).toBe('Paid');
  });
});

describe('payment words', () => {
  it('names the amount on the button', () => {
    const label = payButtonLabel('$1,200.00');
    expect(say(label.key, label.params)).toBe('Pay $1,200.00 by card');
  });

  it('tells a client back from the card page that nothing was charged', () => {
    expect(say(CANCELLED_WORDS)).toMatch(/^The payment was not completed and nothing was charged\. You can try again\./);
  });

  it.each([
    ['payment', 'card', 'Paid by card online'],
    ['payment', 'cheque', 'Paid by cheque'],
    ['payment', 'transfer', 'Paid by bank transfer'],
    ['payment', 'cash', 'Paid in cash'],
    ['refund', 'card', 'Refunded to your card'],
    ['refund', 'cheque', 'Refunded by cheque'],
  ] as const)('a %s by %s reads "%s"', (kind, method, text) => {
    expect(say(receiptWhat({ kind, method }))).toBe(text);
  });
});
