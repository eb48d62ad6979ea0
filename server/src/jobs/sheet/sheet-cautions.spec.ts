import { ASK_FOR_YEAR, CAUTION_WORDS, STANDING_LINE, safetyCautions } from '@layerbook/domain';
import { sheetCautions, withCrewLead } from './sheet-cautions';

const PRICING_NOTE = CAUTION_WORDS['scaffold-fall-protection.pricingNote'];

// a pre-1978 home with paint disturbed (40 CFR 745.83: over 6 ft² in a room), work at 14 ft (over the
// 10 ft of 29 CFR 1926.451(g)(1)) and a lime product (ICSC 0408)
const engine = safetyCautions({
  lengthUnit: 'ft',
  yearBuilt: 1950,
  disturbedPaint: [{ roomId: 'r', isExterior: false, area: 50 }],
  workingLevel: 14,
  products: [{ name: 'Lime putty', isLime: true }],
  sandsPlaster: false,
});

describe('cautions on the crew sheet', () => {
  it('are the engine’s, less the office’s pricing line, each line with its key', () => {
    const sheet = sheetCautions(engine, 'US');
    expect(sheet.map((c) => c.id)).toEqual(engine.map((c) => c.id));
    const scaffold = sheet.find((c) => c.id === 'scaffold-fall-protection')!;
    expect(scaffold.bullets).not.toContain(PRICING_NOTE);
    expect(scaffold.lines.map((l) => l.key)).toEqual(['scaffold-fall-protection.guardrails', 'scaffold-fall-protection.competentPerson']);
    for (const [i, c] of sheet.entries()) {
      const source = engine[i];
      expect(c.lines).toEqual(source.lines.filter((_, k) => source.bullets[k] !== PRICING_NOTE));
      expect([c.titleKey, c.ruleKey, c.jurisdictionKeys, c.standingKey]).toEqual([
        source.titleKey,
        source.ruleKey,
        source.jurisdictionKeys,
        'standing',
      ]);
    }
  });

  it('a result stored before keys and jurisdictions still translates line by line', () => {
    const stored = [
      {
        id: 'lead-safe-work',
        title: 'Lead-safe work practices',
        rule: '40 CFR 745 subpart E (EPA Renovation, Repair and Painting)',
        bullets: [
          ASK_FOR_YEAR,
          engine[0].bullets[0].replace(/^Built before 1978 and/, 'Treated as built before 1978, and'),
          'Call the office first.',
        ],
      },
    ];
    const [c] = sheetCautions(stored, 'CA');
    expect(c.lines).toEqual([
      { key: 'lead-safe-work.askYear', params: {} },
      { key: 'lead-safe-work.treatedAsBuiltBefore', params: { year: '1978' } }, // 15 U.S.C. 2681(17)
      { key: null, params: {} },
    ]);
    // no jurisdiction stored: the firm's today (a US federal rule, and outside the US check your own)
    expect(c.jurisdictionKeys).toEqual(['jurisdiction.usFederal', 'jurisdiction.outsideUs']);
    expect(c.jurisdiction).toBe('A US federal rule. Outside the US, check your national or provincial rules.');
    expect(c.standing).toBe(STANDING_LINE);
  });

  it('keeps the jurisdiction as it was written when the firm has since moved', () => {
    const [c] = sheetCautions([{ ...engine[0], jurisdiction: 'A US federal rule.' }], 'MX');
    expect(c.jurisdiction).toBe('A US federal rule.');
    expect(c.jurisdictionKeys).toEqual(['jurisdiction.usFederal']);
  });
});

describe('the crew’s lead reminder on the sheet', () => {
  // Target housing: built before 1978, 15 U.S.C. 2681(17). Minor repair: 40 CFR 745.83, at most
  // 6 ft² in a room or 20 ft² outside, under which the engine raises no lead-safe caution.
  const withinMinorRepair = safetyCautions({
    lengthUnit: 'ft',
    yearBuilt: 1924,
    disturbedPaint: [{ roomId: 'r', isExterior: false, area: 6 }],
    workingLevel: 0,
    products: [{ name: 'Lime putty', isLime: true }],
    sandsPlaster: false,
  });

  it('comes first on a home built before 1978 whose work stays within minor repair', () => {
    expect(withinMinorRepair.map((c) => c.id)).toEqual(['lime-alkali']);
    const sheet = sheetCautions(withCrewLead(withinMinorRepair, 'target-housing', 'US'), 'US');
    expect(sheet.map((c) => c.id)).toEqual(['lead-safe-work', 'lime-alkali']);
    expect(sheet[0].lines.map((l) => l.key)).toEqual([
      'lead-safe-work.minorRepairBuiltBefore',
      'lead-safe-work.stopBeyondMinor',
      'lead-safe-work.noProhibitedPractices',
    ]);
    expect(sheet[0].lines[0].params).toEqual({ year: '1978' });
    expect(sheet[0].bullets[0]).toBe(
      'Built before 1978: treat the painted surfaces as lead-based paint. The work as planned stays within the minor-repair limits (no more than 6 ft² in a room or 20 ft² outside).',
    );
  });

  it('says the home is treated as before 1978 while its year is unknown and paint is disturbed', () => {
    const [lead] = sheetCautions(withCrewLead([], 'assumed-target-housing', 'US'), 'US');
    expect(lead.lines[0]).toEqual({ key: 'lead-safe-work.minorRepairTreatedAs', params: { year: '1978' } });
  });

  it('is not added to a home built in 1978 or later, with its year unknown and no paint disturbed, or where the engine’s caution is there', () => {
    expect(withCrewLead(withinMinorRepair, 'built-1978-or-later', 'US')).toBe(withinMinorRepair);
    expect(withCrewLead(withinMinorRepair, 'year-unknown', 'US')).toBe(withinMinorRepair);
    expect(withCrewLead(withinMinorRepair, undefined, 'US')).toBe(withinMinorRepair);
    expect(withCrewLead(engine, 'target-housing', 'US')).toBe(engine);
  });
});
