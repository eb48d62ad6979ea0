import { describe, expect, it } from 'vitest';
import { cardRefundPending, chequeRefund } from './payment-fixtures';
import { refundDoneWords, refundSplitWords, refundStatusLook } from './payment-words';

const money = (amount: string): string => `$${amount}`;
const about = { invoiceNumber: 'INV-0007', clientName: 'Hattie Brambleton' };

describe('payment words', () => {
  it.each([
    ['pending', 'Being sent back', 'hourglass_top'],
    ['succeeded', 'Refunded', 'check_circle'],
    ['failed', 'Refund failed', 'error'],
  ] as const)('a %s refund reads "%s" with the %s icon', (status, word, icon) => {
    expect(refundStatusLook(status)).toEqual({ word, icon });
  });

  it('says where a refund’s money comes from', () => {
    expect(refundSplitWords({ fromCredit: '70.00', fromInvoice: '30.00' }, money, about)).toBe(
      '$70.00 comes out of the credit kept for Hattie Brambleton, and $30.00 off what was paid on INV-0007, which then has $30.00 more due.',
    );
    expect(refundSplitWords({ fromCredit: '40.00', fromInvoice: '0.00' }, money, about)).toBe(
      'It all comes out of the credit kept for Hattie Brambleton; INV-0007 stays as it is.',
    );
    expect(refundSplitWords({ fromCredit: '0.00', fromInvoice: '250.50' }, money, about)).toBe(
      'It comes off what was paid on INV-0007, which then has $250.50 more due.',
    );
    expect(refundSplitWords({ fromCredit: '0', fromInvoice: '0' }, money, about)).toBe('');
  });

  it('says what a refund did', () => {
    expect(refundDoneWords(chequeRefund, money)).toBe('Refund of $50.00 recorded. Refund receipt RCT-0009.');
    expect(refundDoneWords({ ...chequeRefund, method: 'card' }, money)).toBe('$50.00 refunded to the card. Refund receipt RCT-0009.');
    expect(refundDoneWords(cardRefundPending, money)).toBe(
      '$70.00 is on its way back to the card. It shows as refunded here once the card processor confirms it.',
    );
    expect(refundDoneWords({ ...cardRefundPending, status: 'failed', failureMessage: 'The card was closed.' }, money)).toBe(
      'The refund of $70.00 did not go through: The card was closed.',
    );
  });
});
