import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { fromProcessorAmount, processorMinimumCharge, toProcessorAmount } from './stripe-amount';

describe('processor smallest currency unit', () => {
  it.each([
    // Stripe Docs "Supported currencies": "Minor units in API amounts" ($10.00 → 1000, ¥500 → 500)
    ['10.00', 'USD', 1000],
    ['500', 'JPY', 500],
    // Stripe Docs "Supported currencies" (zero-decimal)
    ['12000', 'KRW', 12000],
    ['3500', 'CLP', 3500],
    ['10000', 'VND', 10000],
    // MGA is two-decimal in ISO 4217 but zero-decimal at the processor (Stripe Docs, zero-decimal list)
    ['2000', 'MGA', 2000],
    // Stripe Docs "Supported currencies" (Special cases): ISK and UGX sent ×100
    ['1500', 'ISK', 150000],
    ['5000', 'UGX', 500000],
    // two-decimal with payout constraints only (Stripe Docs, Special cases)
    ['100.25', 'HUF', 10025],
    ['50.50', 'TWD', 5050],
  ] as const)('%s %s is sent as %d', (amount, currency, sent) => {
    expect(toProcessorAmount(amount, currency)).toBe(sent);
    expect(fromProcessorAmount(sent, currency).equals(amount)).toBe(true);
  });

  it.each(['BIF', 'CLP', 'DJF', 'GNF', 'JPY', 'KMF', 'KRW', 'MGA', 'PYG', 'RWF', 'VND', 'VUV', 'XAF', 'XOF', 'XPF'])(
    '%s is zero-decimal: 500 is sent as 500',
    (currency) => {
      // Stripe Docs "Supported currencies" — Zero-decimal currencies, the whole published list
      // (UGX is on it too but sent ×100 by its "Special cases" row, checked above)
      expect(toProcessorAmount('500', currency)).toBe(500);
      expect(() => toProcessorAmount('500.5', currency)).toThrow(DomainInputError);
    },
  );

  it('refuses fractions of a zero-decimal currency, ISK included', () => {
    // Stripe Docs "Supported currencies": ISK amounts must end in 00
    expect(() => toProcessorAmount('10.50', 'ISK')).toThrow(DomainInputError);
    expect(() => toProcessorAmount('1.5', 'JPY')).toThrow(DomainInputError);
  });

  it('refuses negative charges and non-integer processor amounts', () => {
    expect(() => toProcessorAmount('-1.00', 'USD')).toThrow('cannot be negative');
    expect(() => fromProcessorAmount(10.5, 'USD')).toThrow(DomainInputError);
  });
});

describe('three-decimal currencies', () => {
  it.each([
    // Stripe Docs "Supported currencies" — Three-decimal currencies: BHD, JOD, KWD, OMR, TND are sent in
    // thousandths and "the least-significant (last) digit" must be 0: "5.124 KWD must be rounded to 5120 or 5130"
    ['5.12', 'KWD', 5120],
    ['5.13', 'KWD', 5130],
    ['5.120', 'KWD', 5120],
    ['12.5', 'BHD', 12500],
    ['0.75', 'JOD', 750],
    ['100', 'OMR', 100000],
    ['3.10', 'TND', 3100],
  ] as const)('%s %s is sent as %d (last digit 0)', (amount, currency, sent) => {
    expect(toProcessorAmount(amount, currency)).toBe(sent);
    expect(sent % 10).toBe(0);
    expect(fromProcessorAmount(sent, currency).equals(amount)).toBe(true);
  });

  it('refuses a thousandth the processor cannot send, naming the field', () => {
    // Stripe Docs "Supported currencies" — Three-decimal currencies: 5.124 KWD (5124) is not accepted as is
    expect(() => toProcessorAmount('5.124', 'KWD')).toThrow('KWD can only be charged in whole multiples of 0.01.');
    try {
      toProcessorAmount('1.005', 'BHD', 'amountDue');
      throw new Error('not refused');
    } catch (error) {
      expect(error).toBeInstanceOf(DomainInputError);
      expect((error as DomainInputError).field).toBe('amountDue');
    }
  });

  it('reads a processor amount in thousandths back exactly', () => {
    // Stripe Docs "Supported currencies" — Three-decimal currencies (amounts in the currency's minor unit)
    expect(fromProcessorAmount(5120, 'KWD').toFixed(3)).toBe('5.120');
  });

  it('refuses three-decimal ISO currencies the processor does not list (IQD, LYD)', () => {
    // Stripe Docs "Supported currencies": the three-decimal list is BHD, JOD, KWD, OMR, TND only
    expect(() => toProcessorAmount('1.000', 'IQD')).toThrow('Card payments cannot be taken in IQD.');
    expect(() => toProcessorAmount('1.000', 'LYD')).toThrow(DomainInputError);
  });
});

describe('processor minimum charge', () => {
  // Stripe Docs "Supported currencies" — "Minimum and maximum charge amounts", the table by settlement
  // currency (docs.stripe.com/currencies#minimum-and-maximum-charge-amounts), every row as published.
  it.each([
    ['USD', '0.50'], // $0.50
    ['AED', '2.00'], // 2.00 د.إ
    ['AUD', '0.50'], // $0.50
    ['BGN', '1.00'], // лв1.00
    ['BRL', '0.50'], // R$0.50
    ['CAD', '0.50'], // $0.50
    ['CHF', '0.50'], // 0.50 Fr
    ['CZK', '15.00'], // 15.00Kč
    ['DKK', '2.50'], // 2.50-kr.
    ['EUR', '0.50'], // €0.50
    ['GBP', '0.30'], // £0.30
    ['HKD', '4.00'], // $4.00
    ['HUF', '175.00'], // 175.00 Ft
    ['INR', '0.50'], // ₹0.50
    ['JPY', '50'], // ¥50
    ['MXN', '10'], // $10
    ['MYR', '2'], // RM 2
    ['NOK', '3.00'], // 3.00-kr.
    ['NZD', '0.50'], // $0.50
    ['PLN', '2.00'], // 2.00 zł
    ['RON', '2.00'], // lei2.00
    ['SEK', '3.00'], // 3.00-kr.
    ['SGD', '0.50'], // $0.50
    ['THB', '10'], // ฿10
  ] as const)('%s: at least %s', (currency, minimum) => {
    expect(processorMinimumCharge(currency)?.equals(minimum)).toBe(true);
  });

  it('the minimum itself is a chargeable amount in every listed currency', () => {
    // Stripe Docs "Supported currencies" — the minimum must itself be expressible in the currency's minor unit
    for (const currency of ['USD', 'GBP', 'JPY', 'HUF', 'MXN', 'THB']) {
      const minimum = processorMinimumCharge(currency) as Decimal;
      expect(fromProcessorAmount(toProcessorAmount(minimum, currency), currency).equals(minimum)).toBe(true);
    }
    // USD 0.50 → 50 cents; JPY ¥50 → 50 (zero-decimal); HUF 175.00 → 17500
    expect(toProcessorAmount(processorMinimumCharge('USD') as Decimal, 'USD')).toBe(50);
    expect(toProcessorAmount(processorMinimumCharge('JPY') as Decimal, 'JPY')).toBe(50);
    expect(toProcessorAmount(processorMinimumCharge('HUF') as Decimal, 'HUF')).toBe(17500);
  });

  it('is null where the processor publishes no minimum (no card payment offered)', () => {
    // Stripe Docs "Supported currencies": the minimum table lists settlement currencies only; KWD, ISK and CLP are not in it
    expect(processorMinimumCharge('KWD')).toBeNull();
    expect(processorMinimumCharge('ISK')).toBeNull();
    expect(processorMinimumCharge('CLP')).toBeNull();
  });
});
