/**
 * Currencies the firm may bill in: those Intl knows as ISO 4217 codes. The payments issue narrows
 * this to what the processor supports.
 */
const known = new Set<string>(Intl.supportedValuesOf('currency'));
export const isKnownCurrency = (code: string) => known.has(code);
