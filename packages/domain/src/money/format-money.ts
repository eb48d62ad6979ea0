/// <reference lib="es2023.intl" />
// ES2023's Intl typings let `format` take a numeric string (ECMA-402 NumberFormat v3); the
// reference brings them to every program that compiles this file (apps and server target ES2022).
import type Decimal from 'decimal.js';
import { toMoney } from '../errors/input-checks';
import { cachedNumberFormat } from '../units/intl-cache';
import { minorUnitDigits } from './currency';

/**
 * An amount as people read it in their locale: `formatMoney('1234.5', 'EUR', 'de-DE')` is
 * "1.234,50 €". The amount goes to Intl.NumberFormat as an exact decimal string, never a float,
 * with the currency's ISO 4217 minor-unit digits, rounded half away from zero like
 * `roundToCurrency`; a negative amount that rounds to zero shows no sign.
 */
export function formatMoney(amount: string | Decimal, currency: string, locale: string): string {
  const digits = minorUnitDigits(currency);
  const exact = toMoney(amount, 'amount').toFixed() as Intl.StringNumericLiteral;
  return cachedNumberFormat(locale, {
    style: 'currency',
    currency,
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
    roundingMode: 'halfExpand',
    signDisplay: 'negative',
  }).format(exact);
}
