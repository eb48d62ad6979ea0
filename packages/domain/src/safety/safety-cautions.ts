import { requireFiniteNumber, requireInteger, requireNonNegative } from '../errors/input-checks';
import { type LengthUnit, convertArea, convertLength } from '../units/length';
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
}

export const STANDING_LINE =
  "Follow local codes, the product's safety data sheet and licensed or qualified practice. This reminder is not legal or safety advice.";

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
export const SCAFFOLD_PRICING_NOTE = 'Price the scaffold rental and the time to put it up and take it down.';

/** Caution lines meant for the office alone: a proposal, its PDF and the portal leave them out. */
export const OFFICE_ONLY_LINES: ReadonlySet<string> = new Set([SCAFFOLD_PRICING_NOTE]);

export const OUTSIDE_US_LINE = 'Outside the US, check your national or provincial rules.';

/** "US federal rule." or "Guidance, not a regulation.", plus the outside-US line for a firm elsewhere. */
export function jurisdictionLine(id: CautionId, firmCountry: string | undefined): string {
  const source = RULE_SOURCE[id] === 'us-federal' ? 'A US federal rule.' : 'Guidance, not a regulation.';
  const isOutsideUs = firmCountry !== undefined && firmCountry.trim().toUpperCase() !== 'US';
  return isOutsideUs ? `${source} ${OUTSIDE_US_LINE}` : source;
}

/** Reminders drawn from job facts; English text, stable ids for the apps to translate. */
export function safetyCautions(facts: SafetyFacts): Caution[] {
  const out: Caution[] = [];
  const unit = facts.lengthUnit;
  const caution = (id: CautionId, title: string, rule: string, bullets: string[]): Caution => ({
    id,
    title,
    bullets,
    rule,
    jurisdiction: jurisdictionLine(id, facts.firmCountry),
    standing: STANDING_LINE,
  });

  if (facts.yearBuilt !== undefined) requireInteger(facts.yearBuilt, 'yearBuilt', 1000, 'year built');
  if (facts.yearBuilt !== undefined && facts.yearBuilt < LEAD_YEAR) {
    const perRoom = new Map<string, number>();
    let exterior = 0;
    facts.disturbedPaint.forEach((d, i) => {
      const ft2 = convertArea(requireNonNegative(d.area, `disturbedPaint[${i}].area`, 'disturbed area'), unit, 'ft');
      if (d.isExterior) exterior += ft2;
      else perRoom.set(d.roomId, (perRoom.get(d.roomId) ?? 0) + ft2);
    });
    const overInside = [...perRoom.values()].some((a) => a > INTERIOR_FT2);
    if (overInside || exterior > EXTERIOR_FT2) {
      out.push(
        caution('lead-safe-work', 'Lead-safe work practices', '40 CFR 745 subpart E (EPA Renovation, Repair and Painting)', [
          `Built before ${LEAD_YEAR} and the work disturbs more painted surface than the minor-repair limits (more than 6 ft² in a room or 20 ft² outside).`,
          'Use a certified firm with a certified renovator assigned, and record delivery of the lead pamphlet before work starts.',
          'Contain the work area and clean and verify under the rule; avoid the practices it prohibits.',
          'Keep the records for three years and give the compliance record with the final invoice.',
        ]),
      );
    }
  }

  const levelFt = convertLength(requireFiniteNumber(facts.workingLevel, 'workingLevel', 'working level'), unit, 'ft');
  if (levelFt > SCAFFOLD_FT) {
    out.push(
      caution('scaffold-fall-protection', 'Scaffold fall protection', '29 CFR 1926.451(g)(1)', [
        'Work on a scaffold more than 10 ft above a lower level needs guardrails or personal fall arrest, depending on the scaffold type.',
        'Have a competent person erect and inspect the scaffold; lock the casters on rolling towers.',
        SCAFFOLD_PRICING_NOTE,
      ]),
    );
  }
  if (levelFt >= EDGE_FT) {
    out.push(
      caution('edge-fall-protection', 'Unprotected edges and ladders', '29 CFR 1926.501(b)(1); 29 CFR 1926.1053(b)(1)', [
        'Protect sides and edges 6 ft or more above a lower level.',
        'Ladders to an upper landing extend at least 3 ft above it, or are secured with a grab device.',
      ]),
    );
  }

  const flammable = facts.products.flatMap((p, i) => {
    const cls: FlammableClass | null = flammableClass(p.flashPointC, p.boilingPointC, `products[${i}].flashPointC`);
    return cls ? [`${p.name} (${cls.label}, flash point ${p.flashPointC} °C)`] : [];
  });
  if (flammable.length > 0) {
    out.push(
      caution('flammable-liquid', 'Flammable liquids in the mix', '29 CFR 1910.106(a)(19) (flash point at or below 93 °C / 199.4 °F)', [
        `Flammable: ${flammable.join(', ')}.`,
        'No open flames, pilot lights or sparks; ventilate; keep containers closed. Vapours can be heavier than air and travel to an ignition source.',
      ]),
    );
  }

  const lime = facts.products.filter((p) => p.isLime === true);
  if (lime.length > 0) {
    out.push(
      caution('lime-alkali', 'Lime is caustic', 'ICSC 0408 (calcium hydroxide)', [
        `Lime products: ${lime.map((p) => p.name).join(', ')}.`,
        'Strongly alkaline: can burn eyes and skin. Wear goggles or a face shield, alkali-resistant gloves and covered skin.',
        'Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.',
      ]),
    );
  }

  const oily = facts.products.filter((p) => p.containsDryingOil === true);
  if (oily.length > 0) {
    out.push(
      // drying oils self-heat as they cure, whatever their flash point (DOMAIN.md §3.5: from memory; manufacturers' SDS)
      caution(
        'oily-rags',
        'Oily rags can catch fire by themselves',
        "The product's safety data sheet (drying oils self-heat as they cure)",
        [
          `Drying oils: ${oily.map((p) => p.name).join(', ')}.`,
          'Rags, pads and paper soaked in drying oils heat up as the oil cures and can ignite hours later with no flame nearby.',
          'Lay them flat outdoors to dry, or keep them under water in a closed metal can; never bunch them in a bin or leave them in the house overnight.',
        ],
      ),
    );
  }

  const silica = facts.products.filter((p) => p.containsSilica === true);
  if (facts.sandsPlaster || silica.length > 0) {
    const bullets: string[] = [];
    if (silica.length > 0) {
      bullets.push(`Crystalline silica: ${silica.map((p) => p.name).join(', ')}. Dry mixing, cutting and sanding raise the dust.`);
    }
    if (facts.sandsPlaster) {
      bullets.push("A layer sands plaster: check section 3 of each product's safety data sheet for crystalline silica.");
    }
    bullets.push(
      'The standard applies unless exposure stays below 25 µg/m³ (8-hour average) under any foreseeable conditions.',
      'Wet the mix or use a low-speed paddle with local exhaust; prefer wet methods and HEPA vacuums to dry sweeping or compressed air.',
      'Respirators need a written program, medical clearance and fit testing.',
    );
    out.push(caution('plaster-dust-silica', 'Crystalline silica dust', '29 CFR 1926.1153 (respirable crystalline silica)', bullets));
  }
  return out;
}
