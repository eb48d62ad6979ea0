import { describe, expect, it } from 'vitest';
import { cautionView, hazardFlags } from './caution-lines';
import { limeCaution, products } from './sheet-fixtures';

describe('cautionView', () => {
  it('gives every sentence its key in the shared cautions words, with the English as sent beside it', () => {
    const view = cautionView(limeCaution);
    expect(view.title).toEqual({ key: 'cautions.lime-alkali.title', params: {}, english: 'Lime is caustic' });
    expect(view.rule.key).toBe('cautions.lime-alkali.rule');
    expect(view.bullets.map((b) => b.key)).toEqual([
      'cautions.lime-alkali.products',
      'cautions.lime-alkali.protect',
      'cautions.lime-alkali.eyewash',
    ]);
    expect(view.bullets[0]).toMatchObject({ params: { products: 'Slaked lime putty' }, english: 'Lime products: Slaked lime putty.' });
    expect(view.standing.key).toBe('cautions.standing');
  });

  it('pairs the jurisdiction sentences with their keys (a firm outside the US gets both)', () => {
    expect(cautionView(limeCaution).jurisdiction).toEqual([
      { key: 'cautions.jurisdiction.guidance', params: {}, english: 'Guidance, not a regulation.' },
      { key: 'cautions.jurisdiction.outsideUs', params: {}, english: 'Outside the US, check your national or provincial rules.' },
    ]);
  });

  it('never drops a line: one without a key, or lines that do not match the bullets, show the English', () => {
    const unkeyed = cautionView({ ...limeCaution, lines: [{ key: null, params: {} }, ...limeCaution.lines.slice(1)] });
    expect(unkeyed.bullets[0]).toEqual({ key: null, params: {}, english: 'Lime products: Slaked lime putty.' });
    const short = cautionView({ ...limeCaution, lines: limeCaution.lines.slice(1) });
    expect(short.bullets.map((b) => [b.key, b.english])).toEqual(limeCaution.bullets.map((b) => [null, b]));
    expect(cautionView({ ...limeCaution, jurisdictionKeys: [] }).jurisdiction).toEqual([
      { key: null, params: {}, english: limeCaution.jurisdiction },
    ]);
  });
});

describe('hazardFlags', () => {
  it('flags a liquid with a flash point at or below 93 °C as flammable, with °F beside', () => {
    // 29 CFR 1910.106(a)(19): flammable at or below 93 °C; °F = °C × 9/5 + 32 (NIST SP 811 §B.8)
    expect(hazardFlags(products[3])).toEqual([{ kind: 'flammable', flashPointC: 40, flashPointF: 104 }, { kind: 'dryingOil' }]);
    expect(hazardFlags({ ...products[3], hazards: { flashPointC: 93 } })[0].kind).toBe('flammable');
    expect(hazardFlags({ ...products[3], hazards: { flashPointC: 120 } })).toEqual([
      { kind: 'flashPoint', flashPointC: 120, flashPointF: 248 },
    ]);
  });

  it('flags lime and crystalline silica, and nothing for a product with no hazards', () => {
    expect(hazardFlags(products[0])).toEqual([{ kind: 'lime' }]);
    expect(hazardFlags({ ...products[1], hazards: { containsSilica: true } })).toEqual([{ kind: 'silica' }]);
    expect(hazardFlags(products[1])).toEqual([]);
  });
});
