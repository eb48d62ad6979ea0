import { DomainInputError } from '../errors/domain-input-error';
import { fromProcessorAmount, toProcessorAmount } from './stripe-amount';

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
