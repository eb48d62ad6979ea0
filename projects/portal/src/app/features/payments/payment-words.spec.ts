import payments from '../../../i18n/payments/en.json';
import { wordsAt } from '../../testing/words';
import { describe, expect, it } from 'vitest';
import { CANCELLED_WORDS, checkoutWords, payButtonLabel, receiptWhat } from './payment-words';

const say = (key: string, params?: Readonly<Record<string, unknown>>) => wordsAt({ payments }, key, params);
const money = (amount: string, currency: string) => `${amount} ${currency}`;

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
    const words = checkoutWords({ state, receiptNumber: state === 'paid' ? 'RCT-0007' : null, credit: null }, gaveUp, money);
    expect(say(words.heading, words.headingParams)).toBe(heading);
    expect(words.isWaiting).toBe(isWaiting);
    expect(words.icon).toBeTruthy();
    if (gaveUp && state !== 'paid') expect(say(words.text)).toContain('do not pay again');
  });

  it('says nothing was charged when the card page closed', () => {
    expect(say(checkoutWords({ state: 'expired', receiptNumber: null, credit: null }, false, money).text)).toContain('nothing was charged');
  });

  it('reads "Paid" without a receipt number while none is given', () => {
    expect(say(checkoutWords({ state: 'paid', receiptNumber: null, credit: null }, false, money).heading)).toBe('Paid');
  });

  it('never says "Paid" for a payment the invoice no longer asked for: it is kept as credit', () => {
    const words = checkoutWords(
      { state: 'paid', receiptNumber: 'RCT-0007', credit: { amount: '250.00', currency: 'USD', isWholePayment: true } },
      false,
      money,
    );
    expect(say(words.heading, words.headingParams)).toBe('Payment kept as credit — receipt RCT-0007');
    expect(say(words.text, words.textParams)).toBe(
      'Your payment of 250.00 USD came in, but it could not go on this invoice, so the firm keeps it as credit for you. The firm has been told and will be in touch about it; your receipt is on its way to you by e-mail.',
    );
    expect([words.tone, words.isWaiting]).toEqual(['notice', false]);
  });

  it('says which part of a payment is kept as credit when the invoice took the rest', () => {
    const words = checkoutWords(
      { state: 'paid', receiptNumber: 'RCT-0007', credit: { amount: '100.00', currency: 'USD', isWholePayment: false } },
      false,
      money,
    );
    expect(say(words.heading, words.headingParams)).toBe('Paid — receipt RCT-0007');
    expect(say(words.text, words.textParams)).toContain('100.00 USD of it was more than the invoice still asked');
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
