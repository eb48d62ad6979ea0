import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonNegative, toNonNegativeMoney } from '../errors/input-checks';
import { minorUnitDigits } from '../money/currency';
import type { MoneyInput } from '../money/money';
import { type OverheadProfitRule, applyOverheadProfit } from './overhead-profit';
import { type RoundingRule, roundPriceAtLeast } from './price-rounding';
import { type Ratio, toRatio } from './ratio';
import { type TaxRule, salesTax } from './sales-tax';

export interface CostLine {
  label: string;
  amount: MoneyInput;
}

export interface DirectCostInput {
  /** crew-hours; priced after rounding the job total to hundredths, as shown to the owner */
  labourHours: number;
  /** burdened rate per crew-hour (wages, payroll taxes, insurance) */
  labourRate: MoneyInput;
  /** cost of the containers bought */
  materialsCost: MoneyInput;
  /** 0.25 adds 25 % to materials */
  materialsMarkup: Ratio;
  /** scaffold and other rentals */
  equipment?: CostLine[];
  subcontracts?: CostLine[];
  sundries?: CostLine[];
}

export type Discount = { kind: 'share'; share: Ratio } | { kind: 'amount'; amount: MoneyInput };

export interface PriceInput {
  currency: string;
  direct: DirectCostInput;
  overheadProfit: OverheadProfitRule;
  /** the firm does not go below this; options are priced without it */
  minimumCharge?: MoneyInput;
  discount?: Discount;
  tax: TaxRule;
  rounding: RoundingRule;
}

/** Every amount is a Decimal; only `price`, `tax` and `total` are rounded. */
export interface PriceBreakdown {
  labourHours: Decimal;
  labour: Decimal;
  materialsCost: Decimal;
  /** materials with markup: the materials line of a separated contract */
  materials: Decimal;
  equipment: Decimal;
  subcontracts: Decimal;
  sundries: Decimal;
  direct: Decimal;
  overhead: Decimal;
  profit: Decimal;
  /** direct + overhead + profit */
  beforeAdjustments: Decimal;
  discount: Decimal;
  isMinimumApplied: boolean;
  /** quoted price, before tax, rounded by the firm's rule */
  price: Decimal;
  roundingAdjustment: Decimal;
  taxableBase: Decimal;
  tax: Decimal;
  total: Decimal;
  /** (price − direct) / direct and (price − direct) / price, for the owner's check */
  effectiveMarkup: Decimal;
  effectiveMargin: Decimal;
}

function sumLines(lines: readonly CostLine[] | undefined, field: string): Decimal {
  let total = new Decimal(0);
  (lines ?? []).forEach((l, i) => {
    total = total.plus(toNonNegativeMoney(l.amount, `${field}[${i}].amount`));
  });
  return total;
}

/**
 * direct = labour + materials with markup + equipment + subcontracts + sundries; then overhead
 * and profit by the firm's method, less any discount, no lower than the minimum charge,
 * rounded by the firm's rule, then tax. Intermediate amounts keep full precision.
 */
export function priceJob(input: PriceInput, field = 'pricing'): PriceBreakdown {
  minorUnitDigits(input.currency, 'currency');
  const d = input.direct;
  requireNonNegative(d.labourHours, `${field}.direct.labourHours`, 'labour hours');
  const labourHours = new Decimal(d.labourHours).toDecimalPlaces(2, Decimal.ROUND_HALF_UP);
  const labour = labourHours.times(toNonNegativeMoney(d.labourRate, `${field}.direct.labourRate`, 'labour rate'));
  const materialsCost = toNonNegativeMoney(d.materialsCost, `${field}.direct.materialsCost`, 'materials cost');
  const materials = materialsCost.times(toRatio(d.materialsMarkup, `${field}.direct.materialsMarkup`, 'materials markup', 10).plus(1));
  const equipment = sumLines(d.equipment, `${field}.direct.equipment`);
  const subcontracts = sumLines(d.subcontracts, `${field}.direct.subcontracts`);
  const sundries = sumLines(d.sundries, `${field}.direct.sundries`);
  const direct = labour.plus(materials).plus(equipment).plus(subcontracts).plus(sundries);

  const { overhead, profit, price: beforeAdjustments } = applyOverheadProfit(direct, input.overheadProfit, `${field}.overheadProfit`);
  let discount = new Decimal(0);
  if (input.discount?.kind === 'share') {
    discount = beforeAdjustments.times(toRatio(input.discount.share, `${field}.discount.share`, 'discount'));
  } else if (input.discount?.kind === 'amount') {
    discount = toNonNegativeMoney(input.discount.amount, `${field}.discount.amount`, 'discount');
    if (discount.greaterThan(beforeAdjustments)) {
      throw new DomainInputError(`${field}.discount.amount`, 'The discount is larger than the price.');
    }
  }
  let unrounded = beforeAdjustments.minus(discount);
  let isMinimumApplied = false;
  let minimum = new Decimal(0);
  if (input.minimumCharge !== undefined) {
    minimum = toNonNegativeMoney(input.minimumCharge, `${field}.minimumCharge`, 'minimum charge');
    if (unrounded.lessThan(minimum)) {
      unrounded = minimum;
      isMinimumApplied = true;
    }
  }
  // Rounding never takes the price back under the minimum: it rounds up to the next step instead.
  const price = roundPriceAtLeast(unrounded, input.rounding, input.currency, minimum, `${field}.rounding`);
  const { taxableBase, tax } = salesTax(input.tax, { materials, price }, input.currency, `${field}.tax`);
  const markupBase = direct.isZero() ? new Decimal(1) : direct;
  const marginBase = price.isZero() ? new Decimal(1) : price;
  return {
    labourHours,
    labour,
    materialsCost,
    materials,
    equipment,
    subcontracts,
    sundries,
    direct,
    overhead,
    profit,
    beforeAdjustments,
    discount,
    isMinimumApplied,
    price,
    roundingAdjustment: price.minus(unrounded),
    taxableBase,
    tax,
    total: price.plus(tax),
    effectiveMarkup: price.minus(direct).div(markupBase),
    effectiveMargin: price.minus(direct).div(marginBase),
  };
}
