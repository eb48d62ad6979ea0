import { DomainInputError } from '../errors/domain-input-error';

/**
 * ISO 4217 minor-unit exponents for circulating currencies and the fund codes with an
 * exponent (the spec checks this table against the currency-codes package). Kept here so
 * the package needs nothing at run time but decimal.js. Precious metals and testing codes
 * (XAU, XTS, XXX ...) have no minor unit and are not money we bill in, so they are absent.
 */
const BY_EXPONENT: Readonly<Record<number, string>> = {
  0: 'BIF CLP DJF GNF ISK JPY KMF KRW PYG RWF UGX UYI VND VUV XAF XOF XPF',
  2:
    'AED AFN ALL AMD ANG AOA ARS AUD AWG AZN BAM BBD BDT BGN BMD BND BOB BOV BRL BSD BTN BWP ' +
    'BYN BZD CAD CDF CHE CHF CHW CNY COP COU CRC CUC CUP CVE CZK DKK DOP DZD EGP ERN ETB EUR ' +
    'FJD FKP GBP GEL GHS GIP GMD GTQ GYD HKD HNL HTG HUF IDR ILS INR IRR JMD KES KGS KHR KPW ' +
    'KYD KZT LAK LBP LKR LRD LSL MAD MDL MGA MKD MMK MNT MOP MRU MUR MVR MWK MXN MXV MYR MZN ' +
    'NAD NGN NIO NOK NPR NZD PAB PEN PGK PHP PKR PLN QAR RON RSD RUB SAR SBD SCR SDG SEK SGD ' +
    'SHP SLE SOS SRD SSP STN SVC SYP SZL THB TJS TMT TOP TRY TTD TWD TZS UAH USD USN UYU UZS ' +
    'VED VES WST XCD YER ZAR ZMW ZWG',
  3: 'BHD IQD JOD KWD LYD OMR TND',
  4: 'CLF UYW',
};

const EXPONENTS: ReadonlyMap<string, number> = new Map(
  Object.entries(BY_EXPONENT).flatMap(([exponent, codes]) => codes.split(' ').map((code) => [code, Number(exponent)] as const)),
);

export function isKnownCurrency(code: string): boolean {
  return EXPONENTS.has(code);
}

export function knownCurrencies(): string[] {
  return [...EXPONENTS.keys()];
}

/** Number of decimal places of the currency's minor unit (USD 2, JPY 0, KWD 3). */
export function minorUnitDigits(code: string, field = 'currency'): number {
  const digits = EXPONENTS.get(code);
  if (digits === undefined) {
    throw new DomainInputError(field, `"${code}" is not an ISO 4217 currency code we bill in.`);
  }
  return digits;
}
