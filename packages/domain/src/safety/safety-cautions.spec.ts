import { expectInputError } from '../errors/expect-input-error';
import { cautionLineOf } from './caution-words';
import { OUTSIDE_US_LINE, STANDING_LINE, type SafetyFacts, crewLeadCaution, safetyCautions } from './safety-cautions';

const QUIET: SafetyFacts = { lengthUnit: 'ft', disturbedPaint: [], workingLevel: 0, products: [], sandsPlaster: false };
const ids = (facts: Partial<SafetyFacts>): string[] => safetyCautions({ ...QUIET, ...facts }).map((c) => c.id);

describe('safety cautions from job facts', () => {
  it('nothing to flag on a quiet job', () => {
    expect(ids({})).toEqual([]);
  });

  it.each([
    // 40 CFR 745.83 minor repair and maintenance: ≤ 6 ft² per room interior, ≤ 20 ft² exterior;
    // target housing built before 1978, 15 U.S.C. 2681(17)
    [1975, [{ roomId: 'r1', isExterior: false, area: 6 }], []],
    [
      1975,
      [
        { roomId: 'r1', isExterior: false, area: 4 },
        { roomId: 'r1', isExterior: false, area: 3 },
      ],
      ['lead-safe-work'],
    ],
    [
      1975,
      [
        { roomId: 'r1', isExterior: false, area: 4 },
        { roomId: 'r2', isExterior: false, area: 3 },
      ],
      [],
    ],
    [1975, [{ roomId: 'x', isExterior: true, area: 20 }], []],
    [
      1975,
      [
        { roomId: 'x', isExterior: true, area: 12 },
        { roomId: 'y', isExterior: true, area: 9 },
      ],
      ['lead-safe-work'],
    ],
    [1978, [{ roomId: 'r1', isExterior: false, area: 100 }], []],
  ])('built %d, disturbed %j', (yearBuilt, disturbedPaint, expected) => {
    expect(ids({ yearBuilt, disturbedPaint })).toEqual(expected);
  });

  it('converts metric disturbed areas: 0.6 m² is 6.46 ft², over the 6 ft² room limit', () => {
    // 40 CFR 745.83; ft² factor NIST SP 811 App. B.8
    expect(ids({ lengthUnit: 'm', yearBuilt: 1960, disturbedPaint: [{ roomId: 'r', isExterior: false, area: 0.6 }] })).toEqual([
      'lead-safe-work',
    ]);
  });

  it.each([
    // 29 CFR 1926.501(b)(1): 6 ft or more; 29 CFR 1926.451(g)(1): more than 10 ft
    [5.9, []],
    [6, ['edge-fall-protection']],
    [10, ['edge-fall-protection']],
    [10.1, ['scaffold-fall-protection', 'edge-fall-protection']],
  ])('working level %d ft', (workingLevel, expected) => {
    expect(ids({ workingLevel })).toEqual(expected);
  });

  it.each([
    // 29 CFR 1910.106(a)(19): flammable liquid, flash point at or below 93 °C (199.4 °F)
    [12, ['flammable-liquid']], // isopropyl alcohol closed-cup flash point 12 °C (supplier SDS)
    [22.9, ['flammable-liquid']],
    [23, ['flammable-liquid']], // (a)(19)(iii): category 3 starts at 23 °C
    [40, ['flammable-liquid']], // mineral spirits, about 40 °C (DOMAIN.md §3.5)
    [93, ['flammable-liquid']], // (a)(19)(iv): category 4 up to 93 °C
    [93.5, []],
  ])('flash point %d °C', (flashPointC, expected) => {
    expect(ids({ products: [{ name: 'Solvent', flashPointC }] })).toEqual(expected);
  });

  it('names the category of each flammable product (29 CFR 1910.106(a)(19)(i)–(iv))', () => {
    const [c] = safetyCautions({
      ...QUIET,
      products: [
        { name: 'Isopropyl alcohol', flashPointC: 12 },
        { name: 'Mineral spirits', flashPointC: 40 },
        { name: 'Oil glaze', flashPointC: 70 },
      ],
    });
    expect(c?.bullets[0]).toBe(
      'Flammable: Isopropyl alcohol (category 1 or 2, flash point 12 °C), Mineral spirits (category 3, flash point 40 °C), Oil glaze (category 4, flash point 70 °C).',
    );
  });

  it.each([
    // 29 CFR 1926.1153: silica dust from any product flagged as containing it (dry mixing), or from sanding plaster
    [{ products: [{ name: 'Marble dust plaster', containsSilica: true }] }, ['plaster-dust-silica']],
    [{ sandsPlaster: true }, ['plaster-dust-silica']],
    [{ products: [{ name: 'Acrylic primer' }] }, []],
    // drying oils self-heat whatever their flash point (DOMAIN.md §3.5, from memory; manufacturers' SDS)
    [{ products: [{ name: 'Boiled linseed oil', flashPointC: 120, containsDryingOil: true }] }, ['oily-rags']],
    [{ products: [{ name: 'Oil glaze', flashPointC: 40, containsDryingOil: true }] }, ['flammable-liquid', 'oily-rags']],
    [{ products: [{ name: 'Isopropyl alcohol', flashPointC: 12 }] }, ['flammable-liquid']],
  ] as [Partial<SafetyFacts>, string[]][])('%j', (facts, expected) => {
    expect(ids(facts)).toEqual(expected);
  });

  it('names the silica products and the drying oils', () => {
    const all = safetyCautions({
      ...QUIET,
      products: [
        { name: 'Tung oil', containsDryingOil: true },
        { name: 'Marble dust plaster', containsSilica: true },
      ],
    });
    expect(all.map((c) => c.bullets[0])).toEqual([
      'Drying oils: Tung oil.',
      'Crystalline silica: Marble dust plaster. Dry mixing, cutting and sanding raise the dust.',
    ]);
    expect(all.find((c) => c.id === 'flammable-liquid')).toBeUndefined();
  });

  it('lime (ICSC 0408) and sanding plaster (29 CFR 1926.1153)', () => {
    expect(ids({ products: [{ name: 'Lime putty', isLime: true }], sandsPlaster: true })).toEqual(['lime-alkali', 'plaster-dust-silica']);
  });

  it('every caution names its rule and carries the standing line', () => {
    const all = safetyCautions({
      ...QUIET,
      yearBuilt: 1950,
      disturbedPaint: [{ roomId: 'r', isExterior: false, area: 50 }],
      workingLevel: 14,
      products: [
        { name: 'Isopropyl alcohol', flashPointC: 12 },
        { name: 'Lime putty', isLime: true },
      ],
      sandsPlaster: true,
    });
    expect(all.map((c) => [c.id, c.rule])).toEqual([
      ['lead-safe-work', '40 CFR 745 subpart E (EPA Renovation, Repair and Painting)'],
      ['scaffold-fall-protection', '29 CFR 1926.451(g)(1)'],
      ['edge-fall-protection', '29 CFR 1926.501(b)(1); 29 CFR 1926.1053(b)(1)'],
      ['flammable-liquid', '29 CFR 1910.106(a)(19) (flash point at or below 93 °C / 199.4 °F)'],
      ['lime-alkali', 'ICSC 0408 (calcium hydroxide)'],
      ['plaster-dust-silica', '29 CFR 1926.1153 (respirable crystalline silica)'],
    ]);
    for (const c of all) {
      expect(c.standing).toBe(STANDING_LINE);
      expect(c.bullets.length).toBeGreaterThan(0);
    }
    expect(STANDING_LINE).toMatch(/local codes.*safety data sheet.*licensed or qualified.*not legal or safety advice/);
  });

  it.each([
    // the cited rules are US federal (29 CFR, 40 CFR); lime and oily rags are guidance, not regulation
    [undefined, 'A US federal rule.', 'Guidance, not a regulation.'],
    ['US', 'A US federal rule.', 'Guidance, not a regulation.'],
    ['CA', `A US federal rule. ${OUTSIDE_US_LINE}`, `Guidance, not a regulation. ${OUTSIDE_US_LINE}`],
    ['GB', `A US federal rule. ${OUTSIDE_US_LINE}`, `Guidance, not a regulation. ${OUTSIDE_US_LINE}`],
  ])('firm in %s: each caution says whose rule it is', (firmCountry, federal, guidance) => {
    const all = safetyCautions({
      ...QUIET,
      firmCountry,
      workingLevel: 14,
      products: [{ name: 'Lime putty', isLime: true, flashPointC: 40 }],
    });
    expect(all.map((c) => [c.id, c.jurisdiction])).toEqual([
      ['scaffold-fall-protection', federal],
      ['edge-fall-protection', federal],
      ['flammable-liquid', federal],
      ['lime-alkali', guidance],
    ]);
    expect(OUTSIDE_US_LINE).toBe('Outside the US, check your national or provincial rules.');
  });

  it('names bad fields', () => {
    expectInputError(
      () => safetyCautions({ ...QUIET, yearBuilt: 1975, disturbedPaint: [{ roomId: 'r', isExterior: false, area: -1 }] }),
      'disturbedPaint[0].area',
    );
    expectInputError(() => safetyCautions({ ...QUIET, workingLevel: Number.NaN }), 'workingLevel');
  });
});

describe('the crew’s lead reminder within minor repair', () => {
  it('names the 1978 line, the minor-repair limits and the prohibited practices, each line read back to its key', () => {
    // 15 U.S.C. 2681(17) (before 1978); 40 CFR 745.83 (6 ft² a room, 20 ft² outside);
    // 40 CFR 745.85(a)(3) (prohibited practices; from memory of the rule's text)
    const known = crewLeadCaution(true);
    expect(known.id).toBe('lead-safe-work');
    expect(known.bullets[0]).toContain('Built before 1978');
    expect(known.bullets[0]).toContain('6 ft² in a room or 20 ft² outside');
    expect(known.bullets[2]).toContain('1100 °F');
    expect(known.bullets.map(cautionLineOf)).toEqual(known.lines);
    expect(crewLeadCaution(false).lines[0].key).toBe('lead-safe-work.minorRepairTreatedAs');
    expect(crewLeadCaution(true, 'CA').jurisdiction).toContain(OUTSIDE_US_LINE);
  });
});
