import Decimal from 'decimal.js';
import type { EstimateResult } from './compute-estimate';
import { toResultJson } from './result-json';

// Decimal#toJSON writes a decimal string, so money never becomes a float in JSON (decimal.js docs).
describe('toResultJson', () => {
  it('writes Decimals as exact decimal strings and keeps numbers as numbers', () => {
    const partial = { totals: { area: 504.49, length: 0, materialsCost: new Decimal('0.1').plus('0.2') } } as unknown as EstimateResult;
    expect(toResultJson(partial).totals).toEqual({ area: 504.49, length: 0, materialsCost: '0.3' });
  });
});
