import { describe, expect, it } from 'vitest';
import { changeOrderStatus, signedMoney } from './change-order-words';

describe('change order words', () => {
  it.each([
    ['1082.50', 'USD', 'en-US', '+$1,082.50'],
    ['-216.55', 'USD', 'en-US', '-$216.55'],
    ['0.00', 'USD', 'en-US', '$0.00'],
    ['1500', 'JPY', 'en-US', '+¥1,500'],
  ])('signedMoney(%s %s) shows the direction: %s', (amount, currency, locale, text) => {
    expect(signedMoney(amount, currency, locale)).toBe(text);
  });

  it('says each status in words, with an icon', () => {
    expect(changeOrderStatus('sent')).toEqual({ word: 'Waiting for the client', icon: 'hourglass_top' });
    expect(changeOrderStatus('approved').word).toBe('Approved');
  });
});
