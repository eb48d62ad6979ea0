import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { roundToCurrency } from '../money/money';
import { type Ratio, toRatio } from './ratio';

/**
 * Who is taxed on what varies by jurisdiction (Sales Tax Institute, "How are contractors'
 * purchases taxed?"), so the firm chooses:
 * - none: the contractor paid tax buying materials, already inside their cost
 * - materials: a separated contract; the customer pays tax on the materials line
 * - wholeJob: services taxed, or VAT/GST style, on the whole price
 */
export interface TaxRule {
  mode: 'none' | 'materials' | 'wholeJob';
  rate: Ratio;
}

export function salesTax(
  rule: TaxRule,
  bases: { materials: Decimal; price: Decimal },
  currency: string,
  field = 'tax',
): { taxableBase: Decimal; tax: Decimal } {
  const rate = toRatio(rule.rate, `${field}.rate`, 'tax rate');
  switch (rule.mode) {
    case 'none':
      return { taxableBase: new Decimal(0), tax: new Decimal(0) };
    case 'materials':
      return { taxableBase: bases.materials, tax: roundToCurrency(bases.materials.times(rate), currency) };
    case 'wholeJob':
      return { taxableBase: bases.price, tax: roundToCurrency(bases.price.times(rate), currency) };
    default:
      throw new DomainInputError(`${field}.mode`, 'Choose "none", "materials" or "wholeJob".');
  }
}
