import type { ItemList, JobSheet, JobSheetSummary, SheetCaution, SheetLayer, SheetProduct } from '@layerbook/contracts/types';

/** Invented demo data for the sheet's specs: a dining room in lime plaster and a glazed ceiling. */
export const products: readonly SheetProduct[] = [
  { id: 'p-lime', name: 'Slaked lime putty', unit: 'kg', hazards: { isLime: true } },
  { id: 'p-pigment', name: 'Earth pigment', unit: 'kg', hazards: {} },
  { id: 'p-paint', name: 'Umber base paint', unit: 'gallon', hazards: {} },
  { id: 'p-medium', name: 'Oil glazing medium', unit: 'gallon', hazards: { flashPointC: 40, containsDryingOil: true } },
];

/** 1 part paint to 4 parts medium by volume, water 10 % of the concentrate. */
export const glazeLayer: SheetLayer = {
  id: 'l-glaze',
  name: 'Glaze coat',
  method: 'glaze',
  productId: null,
  recipe: {
    by: 'volume',
    baseProductId: 'p-paint',
    components: [
      { productId: 'p-paint', parts: 1 },
      { productId: 'p-medium', parts: 4 },
    ],
  },
  dilution: { share: 0.1, convention: 'ofConcentrate' },
  coats: 1,
  coverage: { kind: 'spreadRate', surfacePerUnit: 400, unit: 'gallon', lengthUnit: 'ft' },
  coverageShare: 1,
  waitHoursAfter: 24,
};

/** 100 parts lime to 3 parts pigment by weight. */
export const limeLayer: SheetLayer = {
  id: 'l-lime',
  name: 'Lime base coat',
  method: 'trowel',
  productId: null,
  recipe: {
    by: 'weight',
    baseProductId: 'p-lime',
    components: [
      { productId: 'p-lime', parts: 100 },
      { productId: 'p-pigment', parts: 3 },
    ],
  },
  dilution: null,
  coats: 2,
  coverage: { kind: 'consumption', unitPerSurface: 1.2, unit: 'kg', lengthUnit: 'm' },
  coverageShare: 1,
  waitHoursAfter: 48,
};

export const limeCaution: SheetCaution = {
  id: 'lime-alkali',
  title: 'Lime is caustic',
  bullets: [
    'Lime products: Slaked lime putty.',
    'Strongly alkaline: can burn eyes and skin. Wear goggles or a face shield, alkali-resistant gloves and covered skin.',
    'Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.',
  ],
  rule: 'ICSC 0408 (calcium hydroxide)',
  jurisdiction: 'Guidance, not a regulation. Outside the US, check your national or provincial rules.',
  standing:
    "Follow local codes, the product's safety data sheet and licensed or qualified practice. This reminder is not legal or safety advice.",
  titleKey: 'lime-alkali.title',
  ruleKey: 'lime-alkali.rule',
  lines: [
    { key: 'lime-alkali.products', params: { products: 'Slaked lime putty' } },
    { key: 'lime-alkali.protect', params: {} },
    { key: 'lime-alkali.eyewash', params: {} },
  ],
  jurisdictionKeys: ['jurisdiction.guidance', 'jurisdiction.outsideUs'],
  standingKey: 'standing',
};

export const flammableCaution: SheetCaution = {
  id: 'flammable-liquid',
  title: 'Flammable liquids in the mix',
  bullets: [
    'Flammable: Oil glazing medium (category 3, flash point 40 °C).',
    'No open flames, pilot lights or sparks; ventilate; keep containers closed. Vapours can be heavier than air and travel to an ignition source.',
  ],
  rule: '29 CFR 1910.106(a)(19) (flash point at or below 93 °C / 199.4 °F)',
  jurisdiction: 'A US federal rule. Outside the US, check your national or provincial rules.',
  standing: limeCaution.standing,
  titleKey: 'flammable-liquid.title',
  ruleKey: 'flammable-liquid.rule',
  lines: [
    {
      key: 'flammable-liquid.products',
      params: { products: 'Oil glazing medium (category 3, flash point 40 °C)' },
      items: [{ key: 'flammable-liquid.product', params: { name: 'Oil glazing medium', category: '3', flashPoint: '40' } }],
    },
    { key: 'flammable-liquid.noFlames', params: {} },
  ],
  jurisdictionKeys: ['jurisdiction.usFederal', 'jurisdiction.outsideUs'],
  standingKey: 'standing',
};

export const sheet: JobSheet = {
  id: 'job-1',
  title: 'Dining room in lime plaster',
  siteAddress: '14 Orchard Lane, Millbrook',
  status: 'in_progress',
  startDate: '2026-12-07',
  finishDate: '2026-12-11',
  units: 'imperial',
  lengthUnit: 'm',
  timeZone: 'America/Chicago',
  firmCountry: 'CA',
  rooms: [
    {
      id: 'r-1',
      name: 'Dining room',
      surfaces: [
        {
          id: 's-1',
          changeOrder: null,
          name: 'Walls',
          finishId: 'f-lime',
          measure: 'area',
          quantity: 40,
          gross: 44,
          deductions: 4,
          formula: '2 × (5 + 4) × 2.44 − 4',
          isCeiling: false,
          isCurved: false,
          topHeight: 2.44,
          layers: [
            { layerId: 'l-lime', name: 'Lime base coat', workItemId: 'w-1', doneOn: '2026-12-07', products: [], water: 0 },
            { layerId: 'l-glaze', name: 'Glaze coat', workItemId: 'w-2', doneOn: null, products: [], water: 0 },
          ],
        },
      ],
    },
  ],
  finishes: [{ id: 'f-lime', name: 'Glazed lime plaster', layers: [limeLayer, glazeLayer] }],
  products,
  dayPlan: [
    {
      date: '2026-12-08',
      workingDay: 1,
      crewHours: 7,
      capacity: 8,
      steps: [{ key: 't-1#0', label: 'Dining room – Walls: Lime base coat', startHour: 8, endHour: 15, crewHours: 7 }],
      waits: [{ key: 't-1', label: 'Dining room – Walls: Lime base coat', untilDate: '2026-12-10', untilHour: 9 }],
    },
  ],
  changes: [],
  cautions: [limeCaution, flammableCaution],
  workItems: [],
  photos: [],
  sourceLanguage: 'en',
};

/** The crew's jobs as GET /api/jobs/sheets answers them: one under way with dates, one not yet dated. */
export const sheetSummaries: ItemList<JobSheetSummary> = {
  items: [
    {
      id: 'job-1',
      title: 'Dining room in lime plaster',
      siteAddress: '14 Orchard Lane, Millbrook',
      status: 'in_progress',
      startDate: '2026-12-07',
      finishDate: '2026-12-11',
      layersDone: 3,
      layersTotal: 8,
    },
    {
      id: 'job-2',
      title: 'Hall glaze',
      siteAddress: '2 Mill Road',
      status: 'scheduled',
      startDate: null,
      finishDate: null,
      layersDone: 0,
      layersTotal: 4,
    },
  ],
};
