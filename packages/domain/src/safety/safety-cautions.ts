import { isNonNegativeNumber, requireFiniteNumber, requireInteger, requireNonNegative } from '../errors/input-checks';
import { type LengthUnit, convertArea, convertLength } from '../units/length';
import { CAUTION_WORDS, type CautionLine, type CautionWordKey, cautionText, flammableItem } from './caution-words';
import { type FlammableClass, flammableClass } from './flammable';

export type CautionId =
  | 'lead-safe-work'
  | 'scaffold-fall-protection'
  | 'edge-fall-protection'
  | 'flammable-liquid'
  | 'lime-alkali'
  | 'plaster-dust-silica'
  | 'oily-rags';

export interface Caution {
  /** stable, for translation in the apps */
  id: CautionId;
  title: string;
  bullets: string[];
  /** the rule the caution points to */
  rule: string;
  /** whose rule it is (US federal, or guidance) and, for a firm outside the US, to check its own rules */
  jurisdiction: string;
  standing: string;
  /** keys of the words above (CAUTION_WORDS), for a translation: `title`, `rule`, each bullet, jurisdiction, standing */
  titleKey: CautionWordKey;
  ruleKey: CautionWordKey;
  /** parallel to `bullets`: each bullet's key and the words it inserts */
  lines: CautionLine[];
  /** the jurisdiction line's sentences in order */
  jurisdictionKeys: JurisdictionKey[];
  standingKey: 'standing';
}

export type JurisdictionKey = 'jurisdiction.usFederal' | 'jurisdiction.guidance' | 'jurisdiction.outsideUs';

export const STANDING_LINE: string = CAUTION_WORDS.standing;

export interface SafetyFacts {
  lengthUnit: LengthUnit;
  yearBuilt?: number;
  /** painted surface the work disturbs (sanding, scraping, removing trim), per room */
  disturbedPaint: ReadonlyArray<{ roomId: string; isExterior: boolean; area: number }>;
  /** highest standing or platform level the work needs, in `lengthUnit` */
  workingLevel: number;
  products: ReadonlyArray<{
    name: string;
    flashPointC?: number;
    boilingPointC?: number;
    isLime?: boolean;
    containsSilica?: boolean;
    containsDryingOil?: boolean;
  }>;
  /** a layer sands plaster (dust whether or not the product list says silica) */
  sandsPlaster: boolean;
  /** the firm's country, ISO 3166-1 alpha-2; the cited rules are US federal */
  firmCountry?: string;
}

/** Target housing: built before 1978 (15 U.S.C. 2681(17)). */
const LEAD_YEAR = 1978;
/** Minor repair and maintenance limits, 40 CFR 745.83: ≤ 6 ft² per room inside, ≤ 20 ft² outside. */
const INTERIOR_FT2 = 6;
const EXTERIOR_FT2 = 20;
/** 29 CFR 1926.451(g)(1): scaffold more than 10 ft above a lower level. */
const SCAFFOLD_FT = 10;
/** 29 CFR 1926.501(b)(1): unprotected side or edge 6 ft or more above a lower level. */
const EDGE_FT = 6;

/** Where each caution's rule comes from: US federal regulations, or guidance that is no regulation. */
const RULE_SOURCE: Readonly<Record<CautionId, 'us-federal' | 'guidance'>> = {
  'lead-safe-work': 'us-federal', // 40 CFR 745 (EPA)
  'scaffold-fall-protection': 'us-federal', // 29 CFR 1926 (OSHA)
  'edge-fall-protection': 'us-federal', // 29 CFR 1926 (OSHA)
  'flammable-liquid': 'us-federal', // 29 CFR 1910 (OSHA)
  'plaster-dust-silica': 'us-federal', // 29 CFR 1926 (OSHA)
  'lime-alkali': 'guidance', // ICSC 0408, an international chemical safety card
  'oily-rags': 'guidance', // safety data sheets
};

/** A reminder for the estimator, shown in the builder and never printed for the client (see OFFICE_ONLY_LINES). */
export const SCAFFOLD_PRICING_NOTE: string = CAUTION_WORDS['scaffold-fall-protection.pricingNote'];

/** Caution lines meant for the office alone: a proposal, its PDF and the portal leave them out. */
export const OFFICE_ONLY_LINES: ReadonlySet<string> = new Set([SCAFFOLD_PRICING_NOTE]);

export const OUTSIDE_US_LINE: string = CAUTION_WORDS['jurisdiction.outsideUs'];

/** The jurisdiction line's sentences: whose rule it is, plus the outside-US line for a firm elsewhere. */
export function jurisdictionKeys(id: CautionId, firmCountry: string | undefined): JurisdictionKey[] {
  const source: JurisdictionKey = RULE_SOURCE[id] === 'us-federal' ? 'jurisdiction.usFederal' : 'jurisdiction.guidance';
  const isOutsideUs = firmCountry !== undefined && firmCountry.trim().toUpperCase() !== 'US';
  return isOutsideUs ? [source, 'jurisdiction.outsideUs'] : [source];
}

/** "A US federal rule." or "Guidance, not a regulation.", plus the outside-US line for a firm elsewhere. */
export function jurisdictionLine(id: CautionId, firmCountry: string | undefined): string {
  return jurisdictionKeys(id, firmCountry)
    .map((k) => CAUTION_WORDS[k])
    .join(' ');
}

const line = (key: CautionWordKey, params: Record<string, string> = {}): CautionLine => ({ key, params });

/** A caution from its lines: the English words and the keys beside them, for a firm in `firmCountry`. */
function cautionOf(id: CautionId, lines: CautionLine[], firmCountry: string | undefined): Caution {
  const titleKey = `${id}.title` as CautionWordKey;
  const ruleKey = `${id}.rule` as CautionWordKey;
  return {
    id,
    title: CAUTION_WORDS[titleKey],
    bullets: lines.map(cautionText),
    rule: CAUTION_WORDS[ruleKey],
    jurisdiction: jurisdictionLine(id, firmCountry),
    standing: STANDING_LINE,
    titleKey,
    ruleKey,
    lines,
    jurisdictionKeys: jurisdictionKeys(id, firmCountry),
    standingKey: 'standing',
  };
}

/**
 * The crew's lead reminder on a home treated as built before 1978 (`isYearKnown` false: the year is
 * not recorded and paint is disturbed) whose planned work stays within minor repair, so the engine
 * raised no lead-safe caution: treat the paint as lead-based, stop if the work grows past the
 * limits, and never use the practices the rule prohibits. Limits: 40 CFR 745.83 (6 ft² a room,
 * 20 ft² outside); prohibited practices: 40 CFR 745.85(a)(3) (open-flame burning or torching, heat
 * guns at 1100 °F or above, high-speed sanding or grinding without HEPA exhaust control) — from
 * memory of the rule's text, check it before relying on the figures.
 */
export function crewLeadCaution(isYearKnown: boolean, firmCountry?: string): Caution {
  const year = String(LEAD_YEAR);
  return cautionOf(
    'lead-safe-work',
    [
      line(isYearKnown ? 'lead-safe-work.minorRepairBuiltBefore' : 'lead-safe-work.minorRepairTreatedAs', { year }),
      line('lead-safe-work.stopBeyondMinor'),
      line('lead-safe-work.noProhibitedPractices'),
    ],
    firmCountry,
  );
}

/** Reminders drawn from job facts; English text, stable ids for the apps to translate. */
export function safetyCautions(facts: SafetyFacts): Caution[] {
  const out: Caution[] = [];
  const unit = facts.lengthUnit;
  const caution = (id: CautionId, lines: CautionLine[]): Caution => cautionOf(id, lines, facts.firmCountry);

  if (facts.yearBuilt !== undefined) requireInteger(facts.yearBuilt, 'yearBuilt', 1000, 'year built');
  if (facts.yearBuilt !== undefined && facts.yearBuilt < LEAD_YEAR) {
    const perRoom = new Map<string, number>();
    let exterior = 0;
    facts.disturbedPaint.forEach((d, i) => {
      // The field path is only built for a bad value: this runs for every surface.
      const area = isNonNegativeNumber(d.area) ? d.area : requireNonNegative(d.area, `disturbedPaint[${i}].area`, 'disturbed area');
      const ft2 = convertArea(area, unit, 'ft');
      if (d.isExterior) exterior += ft2;
      else perRoom.set(d.roomId, (perRoom.get(d.roomId) ?? 0) + ft2);
    });
    const overInside = [...perRoom.values()].some((a) => a > INTERIOR_FT2);
    if (overInside || exterior > EXTERIOR_FT2) {
      out.push(
        caution('lead-safe-work', [
          line('lead-safe-work.builtBefore', { year: String(LEAD_YEAR) }),
          line('lead-safe-work.certifiedFirm'),
          line('lead-safe-work.containAndClean'),
          line('lead-safe-work.keepRecords'),
        ]),
      );
    }
  }

  const levelFt = convertLength(requireFiniteNumber(facts.workingLevel, 'workingLevel', 'working level'), unit, 'ft');
  if (levelFt > SCAFFOLD_FT) {
    out.push(
      caution('scaffold-fall-protection', [
        line('scaffold-fall-protection.guardrails'),
        line('scaffold-fall-protection.competentPerson'),
        line('scaffold-fall-protection.pricingNote'),
      ]),
    );
  }
  if (levelFt >= EDGE_FT) {
    out.push(caution('edge-fall-protection', [line('edge-fall-protection.protectEdges'), line('edge-fall-protection.ladders')]));
  }

  const flammable = facts.products.flatMap((p, i) => {
    const cls: FlammableClass | null = flammableClass(p.flashPointC, p.boilingPointC, `products[${i}].flashPointC`);
    return cls && p.flashPointC !== undefined ? [flammableItem(p.name, cls.categories, p.flashPointC)] : [];
  });
  if (flammable.length > 0) {
    const products = flammable.map(cautionText).join(', ');
    out.push(
      caution('flammable-liquid', [
        { ...line('flammable-liquid.products', { products }), items: flammable },
        line('flammable-liquid.noFlames'),
      ]),
    );
  }

  const names = (list: ReadonlyArray<{ name: string }>): string => list.map((p) => p.name).join(', ');
  const lime = facts.products.filter((p) => p.isLime === true);
  if (lime.length > 0) {
    out.push(
      caution('lime-alkali', [
        line('lime-alkali.products', { products: names(lime) }),
        line('lime-alkali.protect'),
        line('lime-alkali.eyewash'),
      ]),
    );
  }

  const oily = facts.products.filter((p) => p.containsDryingOil === true);
  if (oily.length > 0) {
    // drying oils self-heat as they cure, whatever their flash point (DOMAIN.md §3.5: from memory; manufacturers' SDS)
    out.push(
      caution('oily-rags', [line('oily-rags.products', { products: names(oily) }), line('oily-rags.selfHeat'), line('oily-rags.layFlat')]),
    );
  }

  const silica = facts.products.filter((p) => p.containsSilica === true);
  if (facts.sandsPlaster || silica.length > 0) {
    const lines: CautionLine[] = [];
    if (silica.length > 0) lines.push(line('plaster-dust-silica.products', { products: names(silica) }));
    if (facts.sandsPlaster) lines.push(line('plaster-dust-silica.sandsPlaster'));
    lines.push(line('plaster-dust-silica.exposureLimit'), line('plaster-dust-silica.wetMethods'), line('plaster-dust-silica.respirators'));
    out.push(caution('plaster-dust-silica', lines));
  }
  return out;
}

/**
 * The lead-safe caution for a home whose year is not recorded while paint is disturbed (treated as
 * built before 1978 until someone records it, 40 CFR 745): the line asking for the year first, and
 * the first line saying "treated as"; bullets and their keys stay parallel.
 */
export function treatedAsTargetHousing(c: Caution): Caution {
  const lines = [
    line('lead-safe-work.askYear'),
    ...c.lines.map((l) => (l.key === 'lead-safe-work.builtBefore' ? line('lead-safe-work.treatedAsBuiltBefore', l.params) : l)),
  ];
  return { ...c, lines, bullets: lines.map(cautionText) };
}
