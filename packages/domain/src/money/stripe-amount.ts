import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { minorUnitDigits } from './currency';

/**
 * The processor's "smallest currency unit" differs from ISO 4217 for some currencies
 * (Stripe Docs "Supported currencies", docs.stripe.com/currencies). Re-read that page at each
 * release: the lists change.
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

/**
 * Sent in thousandths, but the last digit must be 0 ("Three-decimal currencies"): a charge in
 * these can only be made in whole hundredths (5.120 KWD → 5120; 5.124 KWD is refused).
 */
const THREE_DECIMAL = new Set(['BHD', 'JOD', 'KWD', 'OMR', 'TND']);

/**
 * Smallest charge per settlement currency ("Minimum and maximum charge amounts"), in major
 * units. We charge in the firm's own currency and assume it settles in that currency; a firm
 * settling in another currency must meet that currency's minimum after conversion, which the
 * processor then refuses with its own message.
 */
const MINIMUM_CHARGE: Readonly<Record<string, string>> = {
  USD: '0.50',
  AED: '2.00',
  AUD: '0.50',
  BGN: '1.00',
  BRL: '0.50',
  CAD: '0.50',
  CHF: '0.50',
  CZK: '15.00',
  DKK: '2.50',
  EUR: '0.50',
  GBP: '0.30',
  HKD: '4.00',
  HUF: '175.00',
  INR: '0.50',
  JPY: '50',
  MXN: '10',
  MYR: '2',
  NOK: '3.00',
  NZD: '0.50',
  PLN: '2.00',
  RON: '2.00',
  SEK: '3.00',
  SGD: '0.50',
  THB: '10',
};

export interface ProcessorCurrencyRule {
  /** decimals the customer can actually be charged in */
  chargeableDigits: number;
  /** power of ten between the major unit and the integer sent to the API */
  apiExponent: number;
}

export function processorCurrencyRule(currency: string, field = 'currency'): ProcessorCurrencyRule {
  const iso = minorUnitDigits(currency, field);
  if (SENT_TIMES_HUNDRED.has(currency)) return { chargeableDigits: 0, apiExponent: 2 };
  if (ZERO_DECIMAL.has(currency)) return { chargeableDigits: 0, apiExponent: 0 };
  if (THREE_DECIMAL.has(currency)) return { chargeableDigits: 2, apiExponent: 3 };
  if (iso > 2) {
    // Three- and four-decimal ISO currencies outside the processor's three-decimal list (IQD, LYD, CLF…)
    throw new DomainInputError(field, `Card payments cannot be taken in ${currency}.`);
  }
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
      `${currency} can only be charged in whole multiples of ${new Decimal(1).div(new Decimal(10).pow(rule.chargeableDigits)).toFixed(rule.chargeableDigits)}.`,
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
 */
export function processorMinimumCharge(currency: string): Decimal | null {
  const minimum = MINIMUM_CHARGE[currency];
  return minimum === undefined ? null : new Decimal(minimum);
}
