import { describe, expect, it } from 'vitest';
import { creditKept, paymentParts, refundSplit } from './payment-money';
import { cardOverpayment, creditGivenBack, overpaymentCredit, transferPayment } from './payment-fixtures';

describe('paymentParts', () => {
  it('splits a payment into what went on the invoice and what was kept as credit', () => {
    // 500.00 − 380.00 applied = 120.00 credit; refundable as the API says (500.00 − 50.00 refunded)
    expect(paymentParts(cardOverpayment)).toEqual({
      onInvoice: '380.00',
      keptAsCredit: '120.00',
      refunded: '50.00',
      refundable: '450.00',
      canRefund: true,
      pending: '0.00',
    });
  });

  it('counts what is on its way back to the card as pending (amount − refunded − refundable)', () => {
    const parts = paymentParts({ ...cardOverpayment, refundable: '380.00' });
    expect(parts.pending).toBe('70.00');
  });

  it('offers no refund once everything was given back', () => {
    const parts = paymentParts({ ...transferPayment, amountRefunded: '1000.00', refundable: '0.00' });
    expect(parts.canRefund).toBe(false);
    expect(parts.keptAsCredit).toBe('0.00');
  });

  it('keeps a currency without minor units whole', () => {
    // ISO 4217: JPY has no minor unit
    const yen = { ...transferPayment, currency: 'JPY', amount: '50000', amountApplied: '42000', amountRefunded: '0', refundable: '50000' };
    expect(paymentParts(yen)).toMatchObject({ onInvoice: '42000', keptAsCredit: '8000', refundable: '50000' });
  });
});

describe('refundSplit', () => {
  // Our own rule, as the server applies it: a refund comes first out of the credit part, then off the invoice.
  it('takes what is left of the credit first', () => {
    // 120.00 credit, 50.00 of it already given back: 70.00 credit left
    expect(refundSplit(cardOverpayment, '100.00')).toEqual({ fromCredit: '70.00', fromInvoice: '30.00' });
    expect(refundSplit(cardOverpayment, '40')).toEqual({ fromCredit: '40.00', fromInvoice: '0.00' });
    expect(refundSplit(cardOverpayment, '450.00')).toEqual({ fromCredit: '70.00', fromInvoice: '380.00' });
  });

  it('comes all off the invoice when nothing was kept as credit', () => {
    expect(refundSplit(transferPayment, '250.50')).toEqual({ fromCredit: '0.00', fromInvoice: '250.50' });
  });

  it('says nothing for an amount that does not read as one', () => {
    expect(refundSplit(transferPayment, '')).toBeNull();
    expect(refundSplit(transferPayment, '12a')).toBeNull();
  });
});

describe('creditKept', () => {
  it('adds what was kept and takes away what was given back', () => {
    expect(creditKept([overpaymentCredit, creditGivenBack])).toEqual([{ currency: 'USD', amount: '70.00' }]);
  });

  it('leaves out credit used on another invoice and credit all given back', () => {
    expect(creditKept([{ ...overpaymentCredit, usedOnInvoiceId: 'inv-9' }])).toEqual([]);
    expect(creditKept([{ ...overpaymentCredit, amount: '50.00' }, creditGivenBack])).toEqual([]);
  });

  it('keeps a payment in another currency in its own', () => {
    const euros = { ...overpaymentCredit, id: 'cc-3', currency: 'EUR', amount: '200.00' };
    expect(creditKept([overpaymentCredit, euros])).toEqual([
      { currency: 'USD', amount: '120.00' },
      { currency: 'EUR', amount: '200.00' },
    ]);
  });
});
