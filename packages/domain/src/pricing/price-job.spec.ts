import Decimal from 'decimal.js';
import { expectInputError } from '../errors/expect-input-error';
import { type PriceInput, priceJob } from './price-job';
import { perAreaCheck } from './per-area-check';

/** DOMAIN.md §2.8 [D]: 43.99 h × $45 + materials $493 = $2,472.55 direct (common practice formulas). */
const BASE: PriceInput = {
  currency: 'USD',
  direct: { labourHours: 43.9868, labourRate: '45.00', materialsCost: '493.00', materialsMarkup: 0 },
  overheadProfit: { method: 'margin', overhead: 0.2, profit: 0.15 },
  tax: { mode: 'none', rate: 0 },
  rounding: { kind: 'minorUnit' },
};

describe('pricing', () => {
  it('margin method: 2,472.55 / 0.65 = 3,803.92, a 53.85 % markup', () => {
    const p = priceJob(BASE);
    expect(p.labourHours.toString()).toBe('43.99');
    expect(p.direct.toFixed(2)).toBe('2472.55');
    expect(p.price.toFixed(2)).toBe('3803.92');
    expect(p.effectiveMarkup.times(100).toFixed(2)).toBe('53.85');
    expect(p.overhead.plus(p.profit).plus(p.direct).toFixed(2)).toBe('3803.92');
  });

  it('markup method: 2,472.55 × 1.20 × 1.15 = 3,412.12, only a 27.5 % margin', () => {
    const p = priceJob({ ...BASE, overheadProfit: { method: 'markup', overhead: 0.2, profit: 0.15 } });
    expect(p.price.toFixed(2)).toBe('3412.12');
    expect(p.effectiveMargin.times(100).toFixed(1)).toBe('27.5');
  });

  it('adds materials markup, equipment, subcontracts and sundries to direct cost', () => {
    const p = priceJob({
      ...BASE,
      direct: {
        labourHours: 10,
        labourRate: '50.00',
        materialsCost: '1200.00',
        materialsMarkup: 0.25,
        equipment: [{ label: 'Scaffold rental', amount: '300.00' }],
        subcontracts: [{ label: 'Drywall repair', amount: '400.00' }],
        sundries: [{ label: 'Tape and plastic', amount: '45.50' }],
      },
    });
    expect(p.materials.toFixed(2)).toBe('1500.00');
    expect(p.direct.toFixed(2)).toBe('2745.50');
  });

  it.each([
    // DOMAIN.md §2.9 [D]; treatments per Sales Tax Institute, "How are contractors' purchases taxed?"
    ['none', '0.00', '10000.00'],
    ['materials', '120.00', '10120.00'],
    ['wholeJob', '800.00', '10800.00'],
  ] as const)('tax mode %s on a $10,000 job with a $1,500 materials line at 8 %%', (mode, tax, total) => {
    const p = priceJob({
      ...BASE,
      direct: {
        labourHours: 0,
        labourRate: '0',
        materialsCost: '1200.00',
        materialsMarkup: 0.25,
        sundries: [{ label: 'rest', amount: '5000.00' }],
      },
      overheadProfit: { method: 'margin', overhead: 0, profit: 0 },
      minimumCharge: '10000.00',
      tax: { mode, rate: 0.08 },
    });
    expect(p.isMinimumApplied).toBe(true);
    expect(p.price.toFixed(2)).toBe('10000.00');
    expect(p.tax.toFixed(2)).toBe(tax);
    expect(p.total.toFixed(2)).toBe(total);
  });

  it('rounds only at the end, by the firm rule', () => {
    expect(priceJob({ ...BASE, rounding: { kind: 'nearest', increment: '5' } }).price.toFixed(2)).toBe('3805.00');
    expect(priceJob({ ...BASE, rounding: { kind: 'nearest', increment: '10' } }).price.toFixed(2)).toBe('3800.00');
    const whole = priceJob({ ...BASE, rounding: { kind: 'nearest', increment: '1' } });
    expect(whole.price.toFixed(2)).toBe('3804.00');
    expect(whole.roundingAdjustment.toFixed(4)).toBe('0.0769');
  });

  it('discounts before the minimum charge, so a discount cannot go under it', () => {
    const p = priceJob({ ...BASE, discount: { kind: 'share', share: 0.1 }, minimumCharge: '3500.00' });
    expect(p.discount.toFixed(2)).toBe('380.39');
    expect(p.price.toFixed(2)).toBe('3500.00');
    expect(priceJob({ ...BASE, discount: { kind: 'amount', amount: '3.92' } }).price.toFixed(2)).toBe('3800.00');
  });

  it('rounds up to the next step rather than under the minimum charge (DOMAIN.md §2.8: price = max(computed, minimum))', () => {
    // 3,803.92 under a 3,850.00 minimum; to the nearest 100 that would be 3,800.00, under the minimum: 3,900.00
    const p = priceJob({ ...BASE, minimumCharge: '3850.00', rounding: { kind: 'nearest', increment: '100' } });
    expect(p.isMinimumApplied).toBe(true);
    expect(p.price.toFixed(2)).toBe('3900.00');
    // a minimum on a step stays as it is
    expect(priceJob({ ...BASE, minimumCharge: '3900.00', rounding: { kind: 'nearest', increment: '100' } }).price.toFixed(2)).toBe(
      '3900.00',
    );
  });

  it('per-area check: 504.49 × $6 + 282.74 × $3 = $3,875.16 (DOMAIN.md §2.8 [D], common practice)', () => {
    const check = perAreaCheck([
      { label: 'walls', quantity: 2 * Math.PI * 90 - 61, rate: '6.00' },
      { label: 'dome', quantity: 90 * Math.PI, rate: '3.00' },
    ]);
    expect(check.total.toFixed(2)).toBe('3875.16');
  });

  it.each([
    [
      { ...BASE, overheadProfit: { method: 'margin' as const, overhead: 0.6, profit: 0.4 } },
      'pricing.overheadProfit.profit',
      /less than 100 %/,
    ],
    [{ ...BASE, direct: { ...BASE.direct, labourRate: 45 as unknown as string } }, 'pricing.direct.labourRate', /not a float/],
    [{ ...BASE, direct: { ...BASE.direct, materialsCost: '-1' } }, 'pricing.direct.materialsCost', /negative/],
    [{ ...BASE, tax: { mode: 'wholeJob' as const, rate: 1.5 } }, 'pricing.tax.rate', /more than 100 %/],
    [{ ...BASE, rounding: { kind: 'nearest' as const, increment: '0' } }, 'pricing.rounding.increment', /greater than zero/],
    [{ ...BASE, discount: { kind: 'amount' as const, amount: '99999.00' } }, 'pricing.discount.amount', /larger than the price/],
    [{ ...BASE, currency: 'XYZ' }, 'currency', /ISO 4217/],
  ])('bad input %# names its field', (input, field, message) => {
    expectInputError(() => priceJob(input), field, message);
  });

  it('keeps money as Decimal end to end', () => {
    expect(priceJob(BASE).total).toBeInstanceOf(Decimal);
  });
});
