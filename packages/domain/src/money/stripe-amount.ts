import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from './currency';

/**
 * The processor's "smallest currency unit" differs from ISO 4217 for some currencies
 * (Stripe Docs "Supported currencies"). Re-read that page at each release: the lists change.
 */
const ZERO_DECIMAL = new Set([
  'BIF',
  'CLP',
  'DJF',
  'GNF',
  'JPY',
  'KMF',
  'KRW',
  'MGA',
  'PYG',
  'RWF',
  'UGX',
  'VND',
  'VUV',
  'XAF',
  'XOF',
  'XPF',
]);

/** Zero-decimal in practice, but still sent ×100 for backward compatibility (so amounts end in 00). */
const SENT_TIMES_HUNDRED = new Set(['ISK', 'UGX']);

export interface ProcessorCurrencyRule {
  /** decimals the customer can actually be charged in */
  chargeableDigits: number;
  /** power of ten between the major unit and the integer sent to the API */
  apiExponent: number;
}

export function processorCurrencyRule(currency: string): ProcessorCurrencyRule {
  const iso = minorUnitDigits(currency);
  if (SENT_TIMES_HUNDRED.has(currency)) return { chargeableDigits: 0, apiExponent: 2 };
  if (ZERO_DECIMAL.has(currency)) return { chargeableDigits: 0, apiExponent: 0 };
  return { chargeableDigits: iso, apiExponent: iso };
}

/** Amount in major units (e.g. "10.00" USD) → integer for the processor API (1000). */
export function toProcessorAmount(amount: Decimal.Value, currency: string, field = 'amount'): number {
  const rule = processorCurrencyRule(currency);
  const value = new Decimal(amount);
  if (value.isNegative()) throw new DomainInputError(field, 'A charge amount cannot be negative.');
  if (value.decimalPlaces() > rule.chargeableDigits) {
    throw new DomainInputError(
      field,
      `${currency} can only be charged in whole multiples of ${new Decimal(1).div(new Decimal(10).pow(rule.chargeableDigits)).toString()}.`,
    );
  }
  const sent = value.times(new Decimal(10).pow(rule.apiExponent));
  if (sent.greaterThan(Number.MAX_SAFE_INTEGER)) throw new DomainInputError(field, 'The amount is too large.');
  return sent.toNumber();
}

/** Integer from the processor (webhook, payout) → amount in major units. */
export function fromProcessorAmount(sent: number, currency: string, field = 'amount'): Decimal {
  if (!Number.isSafeInteger(sent)) throw new DomainInputError(field, 'The processor amount must be a whole number.');
  return new Decimal(sent).div(new Decimal(10).pow(processorCurrencyRule(currency).apiExponent));
}

/**
 * The processor's smallest card charge in this currency, in major units ("0.50" USD), or null
 * when the processor does not publish one for it (then a card payment is not offered).
 * Placeholder: filled with the processor's published table and its checks.
 */
export function processorMinimumCharge(currency: string): Decimal | null {
  return currency === 'USD' ? new Decimal('0.50') : null;
}
