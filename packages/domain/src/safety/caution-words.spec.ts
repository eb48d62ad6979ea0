import { mergeCautions } from '../estimate/merge-cautions';
import { ASK_FOR_YEAR } from '../estimate/lead-status';
import { CAUTION_WORDS, type CautionWordKey, cautionLineOf, cautionText } from './caution-words';
import {
  OFFICE_ONLY_LINES,
  OUTSIDE_US_LINE,
  STANDING_LINE,
  type SafetyFacts,
  jurisdictionKeys,
  safetyCautions,
  treatedAsTargetHousing,
} from './safety-cautions';

const EVERYTHING: SafetyFacts = {
  lengthUnit: 'ft',
  yearBuilt: 1950,
  disturbedPaint: [{ roomId: 'r', isExterior: false, area: 50 }],
  workingLevel: 14,
  products: [
    { name: 'Isopropyl alcohol', flashPointC: 12 },
    { name: 'Lime putty', isLime: true },
    { name: 'Tung oil', containsDryingOil: true },
    { name: 'Marble dust plaster', containsSilica: true },
  ],
  sandsPlaster: true,
  firmCountry: 'CA',
};

describe('caution words by key', () => {
  const all = safetyCautions(EVERYTHING);

  it('raises every caution for a job with every hazard', () => {
    expect(all.map((c) => c.id)).toEqual([
      'lead-safe-work',
      'scaffold-fall-protection',
      'edge-fall-protection',
      'flammable-liquid',
      'lime-alkali',
      'oily-rags',
      'plaster-dust-silica',
    ]);
  });

  it('each English field is its key rendered, so a translation by key says the same thing', () => {
    for (const c of all) {
      expect(c.title).toBe(CAUTION_WORDS[c.titleKey]);
      expect(c.rule).toBe(CAUTION_WORDS[c.ruleKey]);
      expect(c.bullets).toEqual(c.lines.map(cautionText));
      expect(c.jurisdiction).toBe(c.jurisdictionKeys.map((k) => CAUTION_WORDS[k]).join(' '));
      expect(c.standing).toBe(CAUTION_WORDS[c.standingKey]);
      expect(c.standing).toBe(STANDING_LINE);
    }
  });

  it('product lists and the year travel as params', () => {
    const byId = new Map(all.map((c) => [c.id, c]));
    expect(byId.get('lead-safe-work')?.lines[0]).toEqual({ key: 'lead-safe-work.builtBefore', params: { year: '1978' } }); // 15 U.S.C. 2681(17)
    expect(byId.get('lime-alkali')?.lines[0]).toEqual({ key: 'lime-alkali.products', params: { products: 'Lime putty' } });
    expect(byId.get('flammable-liquid')?.lines[0]).toEqual({
      key: 'flammable-liquid.products',
      params: { products: 'Isopropyl alcohol (category 1 or 2, flash point 12 °C)' }, // 29 CFR 1910.106(a)(19)(i)–(ii)
      items: [
        { key: 'flammable-liquid.productCategories', params: { name: 'Isopropyl alcohol', first: '1', second: '2', flashPoint: '12' } },
      ],
    });
  });

  it('each flammable product is an item with its own words, joined into the English list', () => {
    const [c] = safetyCautions({
      ...EVERYTHING,
      yearBuilt: undefined,
      workingLevel: 0,
      sandsPlaster: false,
      products: [
        { name: 'Thinner, fast', flashPointC: 12, boilingPointC: 30 }, // category 1: boils at or below 35 °C, 29 CFR 1910.106(a)(19)(i)
        { name: 'Mineral spirits', flashPointC: 40 }, // category 3: 23–60 °C, (a)(19)(iii)
        { name: 'Oil glaze', flashPointC: 70.5 }, // category 4: above 60 up to 93 °C, (a)(19)(iv)
      ],
    });
    const items = c.lines[0].items ?? [];
    expect(items.map((i) => [i.key, i.params])).toEqual([
      ['flammable-liquid.product', { name: 'Thinner, fast', category: '1', flashPoint: '12' }],
      ['flammable-liquid.product', { name: 'Mineral spirits', category: '3', flashPoint: '40' }],
      ['flammable-liquid.product', { name: 'Oil glaze', category: '4', flashPoint: '70.5' }],
    ]);
    expect(c.lines[0].params['products']).toBe(items.map(cautionText).join(', '));
    expect(c.bullets[0]).toBe(
      'Flammable: Thinner, fast (category 1, flash point 12 °C), Mineral spirits (category 3, flash point 40 °C), Oil glaze (category 4, flash point 70.5 °C).',
    );
    expect(cautionLineOf(c.bullets[0])).toEqual(c.lines[0]);
  });

  it.each([
    // the cited rules are US federal (29 CFR, 40 CFR); lime and oily rags are guidance, not regulation
    ['US', 'lead-safe-work', ['jurisdiction.usFederal']],
    [undefined, 'oily-rags', ['jurisdiction.guidance']],
    ['MX', 'lime-alkali', ['jurisdiction.guidance', 'jurisdiction.outsideUs']],
    ['CA', 'scaffold-fall-protection', ['jurisdiction.usFederal', 'jurisdiction.outsideUs']],
  ] as const)('firm in %s, %s: %j', (country, id, keys) => {
    expect(jurisdictionKeys(id, country)).toEqual(keys);
    expect(CAUTION_WORDS['jurisdiction.outsideUs']).toBe(OUTSIDE_US_LINE);
  });

  it('reads the key and params back from any English bullet the engine wrote', () => {
    for (const c of all) expect(c.bullets.map(cautionLineOf)).toEqual(c.lines);
  });

  it('reads merged list bullets and the lines an unknown year adds', () => {
    const other = safetyCautions({ ...EVERYTHING, products: [{ name: 'Hydrated lime', isLime: true }] });
    const merged = mergeCautions([all, other], 'client').find((c) => c.id === 'lime-alkali');
    expect(merged?.bullets.map(cautionLineOf)[0]).toEqual({
      key: 'lime-alkali.products',
      params: { products: 'Lime putty, Hydrated lime' },
    });
    expect(cautionLineOf(ASK_FOR_YEAR)).toEqual({ key: 'lead-safe-work.askYear', params: {} });
    const treated = all[0].bullets[0].replace(/^Built before 1978 and/, 'Treated as built before 1978, and');
    expect(cautionLineOf(treated)).toEqual({ key: 'lead-safe-work.treatedAsBuiltBefore', params: { year: '1978' } });
  });

  it('a home treated as built before 1978 asks for the year first, bullets and keys parallel', () => {
    const treated = treatedAsTargetHousing(all[0]);
    expect(treated.bullets[0]).toBe(ASK_FOR_YEAR);
    expect(treated.bullets[1]).toBe(all[0].bullets[0].replace(/^Built before 1978 and/, 'Treated as built before 1978, and'));
    expect(treated.lines.map((l) => l.key)).toEqual([
      'lead-safe-work.askYear',
      'lead-safe-work.treatedAsBuiltBefore',
      'lead-safe-work.certifiedFirm',
      'lead-safe-work.containAndClean',
      'lead-safe-work.keepRecords',
    ]);
    expect(treated.bullets).toEqual(treated.lines.map(cautionText));
  });

  it('an unknown line has no key (shown as written)', () => {
    expect(cautionLineOf('Bring the ladder.')).toBeNull();
  });

  it('the office-only line has a key too, so catalogs stay complete', () => {
    const key: CautionWordKey = 'scaffold-fall-protection.pricingNote';
    expect(OFFICE_ONLY_LINES.has(CAUTION_WORDS[key])).toBe(true);
  });
});
