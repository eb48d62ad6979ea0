/**
 * The English words of every safety caution, by stable key, with `{{param}}` placeholders (the apps'
 * and the server catalog's syntax). The engine writes its English bullets from these templates and
 * hands the keys and params beside them, so a translation can say the same thing in another language;
 * a catalog's English file must equal this table (a test checks it, so the two never drift).
 *
 * Keys are `<caution id>.<line>`, plus `jurisdiction.*` and `standing`; the apps read them under the
 * `cautions.` area.
 */
export const CAUTION_WORDS = {
  'lead-safe-work.title': 'Lead-safe work practices',
  'lead-safe-work.rule': '40 CFR 745 subpart E (EPA Renovation, Repair and Painting)',
  'lead-safe-work.askYear':
    'The year the building was built is not recorded. Until it is, the home is treated as built before 1978, because the work disturbs painted surfaces: enter the year on the site.',
  'lead-safe-work.builtBefore':
    'Built before {{year}} and the work disturbs more painted surface than the minor-repair limits (more than 6 ft² in a room or 20 ft² outside).',
  'lead-safe-work.treatedAsBuiltBefore':
    'Treated as built before {{year}}, and the work disturbs more painted surface than the minor-repair limits (more than 6 ft² in a room or 20 ft² outside).',
  'lead-safe-work.certifiedFirm':
    'Use a certified firm with a certified renovator assigned, and record delivery of the lead pamphlet before work starts.',
  'lead-safe-work.containAndClean': 'Contain the work area and clean and verify under the rule; avoid the practices it prohibits.',
  'lead-safe-work.keepRecords': 'Keep the records for three years and give the compliance record with the final invoice.',
  /** the crew's reminder on a pre-1978 home whose planned work stays within minor repair (crewLeadCaution) */
  'lead-safe-work.minorRepairBuiltBefore':
    'Built before {{year}}: treat the painted surfaces as lead-based paint. The work as planned stays within the minor-repair limits (no more than 6 ft² in a room or 20 ft² outside).',
  'lead-safe-work.minorRepairTreatedAs':
    'Treated as built before {{year}} until the year is known: treat the painted surfaces as lead-based paint. The work as planned stays within the minor-repair limits (no more than 6 ft² in a room or 20 ft² outside).',
  'lead-safe-work.stopBeyondMinor':
    'If the work would disturb more painted surface than that, stop and call the office: lead-safe practices with a certified renovator then apply.',
  'lead-safe-work.noProhibitedPractices':
    'Never burn or torch paint, use a heat gun at 1100 °F or hotter, or power-sand or grind paint without a HEPA-exhaust shroud.',

  'scaffold-fall-protection.title': 'Scaffold fall protection',
  'scaffold-fall-protection.rule': '29 CFR 1926.451(g)(1)',
  'scaffold-fall-protection.guardrails':
    'Work on a scaffold more than 10 ft above a lower level needs guardrails or personal fall arrest, depending on the scaffold type.',
  'scaffold-fall-protection.competentPerson': 'Have a competent person erect and inspect the scaffold; lock the casters on rolling towers.',
  /** office only (OFFICE_ONLY_LINES): never on a proposal, the portal or the crew's sheet */
  'scaffold-fall-protection.pricingNote': 'Price the scaffold rental and the time to put it up and take it down.',

  'edge-fall-protection.title': 'Unprotected edges and ladders',
  'edge-fall-protection.rule': '29 CFR 1926.501(b)(1); 29 CFR 1926.1053(b)(1)',
  'edge-fall-protection.protectEdges': 'Protect sides and edges 6 ft or more above a lower level.',
  'edge-fall-protection.ladders': 'Ladders to an upper landing extend at least 3 ft above it, or are secured with a grab device.',

  'flammable-liquid.title': 'Flammable liquids in the mix',
  'flammable-liquid.rule': '29 CFR 1910.106(a)(19) (flash point at or below 93 °C / 199.4 °F)',
  /** products: "Isopropyl alcohol (category 1 or 2, flash point 12 °C), …" — each item below, joined by ", " */
  'flammable-liquid.products': 'Flammable: {{products}}.',
  'flammable-liquid.noFlames':
    'No open flames, pilot lights or sparks; ventilate; keep containers closed. Vapours can be heavier than air and travel to an ignition source.',

  'lime-alkali.title': 'Lime is caustic',
  'lime-alkali.rule': 'ICSC 0408 (calcium hydroxide)',
  'lime-alkali.products': 'Lime products: {{products}}.',
  'lime-alkali.protect':
    'Strongly alkaline: can burn eyes and skin. Wear goggles or a face shield, alkali-resistant gloves and covered skin.',
  'lime-alkali.eyewash': 'Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.',

  'oily-rags.title': 'Oily rags can catch fire by themselves',
  'oily-rags.rule': "The product's safety data sheet (drying oils self-heat as they cure)",
  'oily-rags.products': 'Drying oils: {{products}}.',
  'oily-rags.selfHeat':
    'Rags, pads and paper soaked in drying oils heat up as the oil cures and can ignite hours later with no flame nearby.',
  'oily-rags.layFlat':
    'Lay them flat outdoors to dry, or keep them under water in a closed metal can; never bunch them in a bin or leave them in the house overnight.',

  'plaster-dust-silica.title': 'Crystalline silica dust',
  'plaster-dust-silica.rule': '29 CFR 1926.1153 (respirable crystalline silica)',
  'plaster-dust-silica.products': 'Crystalline silica: {{products}}. Dry mixing, cutting and sanding raise the dust.',
  'plaster-dust-silica.sandsPlaster': "A layer sands plaster: check section 3 of each product's safety data sheet for crystalline silica.",
  'plaster-dust-silica.exposureLimit':
    'The standard applies unless exposure stays below 25 µg/m³ (8-hour average) under any foreseeable conditions.',
  'plaster-dust-silica.wetMethods':
    'Wet the mix or use a low-speed paddle with local exhaust; prefer wet methods and HEPA vacuums to dry sweeping or compressed air.',
  'plaster-dust-silica.respirators': 'Respirators need a written program, medical clearance and fit testing.',

  'jurisdiction.usFederal': 'A US federal rule.',
  'jurisdiction.guidance': 'Guidance, not a regulation.',
  'jurisdiction.outsideUs': 'Outside the US, check your national or provincial rules.',
  standing:
    "Follow local codes, the product's safety data sheet and licensed or qualified practice. This reminder is not legal or safety advice.",
} as const;

export type CautionWordKey = keyof typeof CAUTION_WORDS;

/**
 * Words of list entries inside a line (never a line by themselves), kept apart from CAUTION_WORDS so
 * that table stays exactly the lines' words; a catalog may add them under the same keys.
 */
export const CAUTION_ITEM_WORDS = {
  /** one flammable product: its category and flash point (29 CFR 1910.106(a)(19)) */
  'flammable-liquid.product': '{{name}} (category {{category}}, flash point {{flashPoint}} °C)',
  /** one flammable product whose boiling point is unknown below 23 °C: category 1 or 2 ((a)(19)(i)–(ii)) */
  'flammable-liquid.productCategories': '{{name}} (category {{first}} or {{second}}, flash point {{flashPoint}} °C)',
} as const;

export type CautionItemKey = keyof typeof CAUTION_ITEM_WORDS;

/** One entry of a list inside a line. */
export interface CautionItem {
  key: CautionItemKey;
  params: Record<string, string>;
}

/**
 * One line of a caution as a key and the words it inserts (product lists, a year). A list whose
 * entries have words of their own (the flammable products, each with its category and flash point)
 * also gives them as `items`: a translation renders each item and joins them with ", " as the list
 * param (`products`); the English param is exactly that join in English.
 */
export interface CautionLine {
  key: CautionWordKey;
  params: Record<string, string>;
  items?: CautionItem[];
}

/** The English text of a line: its template with each `{{param}}` replaced. */
export function cautionText(line: {
  readonly key: CautionWordKey | CautionItemKey;
  readonly params: Readonly<Record<string, string>>;
}): string {
  const words: string =
    line.key in CAUTION_ITEM_WORDS ? CAUTION_ITEM_WORDS[line.key as CautionItemKey] : CAUTION_WORDS[line.key as CautionWordKey];
  return words.replace(/\{\{(\w+)\}\}/g, (_, name: string) => line.params[name] ?? '');
}

const escapeRegExp = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Each bullet template as an anchored pattern capturing its params; titles, rules and fixed lines are left out. */
const LINE_PATTERNS: ReadonlyArray<{ key: CautionWordKey; pattern: RegExp; names: string[] }> = (
  Object.keys(CAUTION_WORDS) as CautionWordKey[]
)
  .filter((key) => !/\.(title|rule)$/.test(key) && !key.startsWith('jurisdiction.') && key !== 'standing')
  .map((key) => {
    const names: string[] = [];
    const source = CAUTION_WORDS[key]
      .split(/(\{\{\w+\}\})/)
      .map((part) => {
        const m = /^\{\{(\w+)\}\}$/.exec(part);
        if (!m) return escapeRegExp(part);
        names.push(m[1]);
        return '(.+)';
      })
      .join('');
    return { key, pattern: new RegExp(`^${source}$`, 's'), names };
  });

/**
 * The key and params of an English bullet the engine wrote — also for results stored before the
 * engine sent keys, and for bullets merged across options ("Lime products: A, B."). Null for a line
 * that is none of the engine's (show it as written).
 */
export function cautionLineOf(bullet: string): CautionLine | null {
  for (const { key, pattern, names } of LINE_PATTERNS) {
    const m = pattern.exec(bullet);
    if (!m) continue;
    const params = Object.fromEntries(names.map((n, i) => [n, m[i + 1]]));
    const items = key === 'flammable-liquid.products' ? flammableItemsOf(params['products']) : null;
    return items ? { key, params, items } : { key, params };
  }
  return null;
}

/** One entry of the English list, read from where the last one ended (a name may hold commas). */
const FLAMMABLE_ITEM = /(.+?) \(category (\d)(?: or (\d))?, flash point (-?\d+(?:\.\d+)?) °C\)(?:, |$)/sy;

/** The flammable products of an English list, or null when an entry is not in the engine's words. */
function flammableItemsOf(list: string): CautionItem[] | null {
  const items: CautionItem[] = [];
  const pattern = new RegExp(FLAMMABLE_ITEM);
  while (pattern.lastIndex < list.length) {
    const m = pattern.exec(list);
    if (!m) return null;
    const [, name, first, second, flashPoint] = m;
    items.push(
      second === undefined
        ? { key: 'flammable-liquid.product', params: { name, category: first, flashPoint } }
        : { key: 'flammable-liquid.productCategories', params: { name, first, second, flashPoint } },
    );
  }
  return items.length > 0 ? items : null;
}

/** A flammable product as a list item: its category (or the two it may be) and its flash point. */
export function flammableItem(name: string, categories: readonly number[], flashPointC: number): CautionItem {
  const flashPoint = String(flashPointC);
  return categories.length === 2
    ? {
        key: 'flammable-liquid.productCategories',
        params: { name, first: String(categories[0]), second: String(categories[1]), flashPoint },
      }
    : { key: 'flammable-liquid.product', params: { name, category: String(categories[0]), flashPoint } };
}
