import { isKnownCurrency as hasMinorUnit, minorUnitDigits } from '@layerbook/domain';

/**
 * Currencies the firm may bill in: those Intl knows as ISO 4217 codes with a minor unit of at most
 * two digits. Money columns keep two decimals (numeric(14,2)), so a three-decimal currency (KWD, BHD,
 * OMR…) lost its last digit between the proposal and the stored job and schedule; it is refused
 * until the columns keep three. The payments issue narrows this to what the processor supports.
 */
const known = new Set<string>(Intl.supportedValuesOf('currency').filter((code) => hasMinorUnit(code) && minorUnitDigits(code) <= 2));
export const isKnownCurrency = (code: string) => known.has(code);
