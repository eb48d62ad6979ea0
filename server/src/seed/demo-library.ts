import { type FinishLayerInput, finishSystemInput, type ProductInput, productInput } from '@layerbook/contracts';
import { finishSystems, products, TenantTx } from '@layerbook/db';
import { parse } from '../http/validate';
import { checkLayers } from '../library/layer-checks';

/*
 * The demo firm's library. Every product is generic and invented (no brands); every price is made up.
 * Coverage, production rates and waits are illustrative: common practice, no source, chosen inside
 * the ranges of DOMAIN.md §3.6 (primer 200–300 ft²/gal, paint 350–400 ft²/gal, lime 0.2–0.6 kg/m²
 * per thin coat, troweled coats 30–80 ft²/h, burnished 20–50 ft²/h, glaze 60–150 ft²/h).
 */
const PRODUCTS = {
  primer: {
    name: 'Acrylic primer',
    kind: 'primer',
    unit: 'gallon',
    sdsUrl: '',
    notes: 'Tint toward the base colour.',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '45.00' },
      { label: '1 qt', size: 1, unit: 'quart', price: '16.00' },
      { label: '5 gal pail', size: 5, unit: 'gallon', price: '199.00' },
    ],
    hazards: {},
  },
  bondingPrimer: {
    name: 'Sanded bonding primer',
    kind: 'primer',
    unit: 'gallon',
    sdsUrl: '',
    notes: 'Gives lime coats a tooth on painted walls.',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '62.00' },
      { label: '3.5 gal pail', size: 3.5, unit: 'gallon', price: '189.00' },
    ],
    // quartz sand in the primer: the SDS lists crystalline silica
    hazards: { containsSilica: true },
  },
  sandFinish: {
    name: 'Marble dust sand-finish plaster',
    kind: 'plaster',
    unit: 'kg',
    sdsUrl: '',
    notes: 'Body coat; mix to a stiff paste.',
    containers: [{ label: '25 kg bag', size: 25, unit: 'kg', price: '62.00' }],
    hazards: { isLime: true, containsSilica: true },
  },
  limePutty: {
    name: 'Lime putty plaster',
    kind: 'lime',
    unit: 'kg',
    sdsUrl: '',
    notes: 'Keep the pail sealed under a film of water.',
    containers: [
      { label: '20 kg pail', size: 20, unit: 'kg', price: '95.00' },
      { label: '5 kg pail', size: 5, unit: 'kg', price: '28.00' },
    ],
    hazards: { isLime: true },
  },
  wax: {
    name: 'Paste wax',
    kind: 'wax',
    unit: 'lb',
    sdsUrl: '',
    notes: '',
    containers: [{ label: '1 lb tin', size: 1, unit: 'lb', price: '24.00' }],
    // invented demo product: beeswax let down with linseed oil, so its rags self-heat (oily-rags caution)
    hazards: { containsDryingOil: true },
  },
  basePaint: {
    name: 'Eggshell base paint',
    kind: 'paint',
    unit: 'gallon',
    sdsUrl: '',
    notes: '',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '52.00' },
      { label: '1 qt', size: 1, unit: 'quart', price: '19.00' },
    ],
    hazards: {},
  },
  sealer: {
    name: 'Clear acrylic sealer',
    kind: 'sealer',
    unit: 'gallon',
    sdsUrl: '',
    notes: 'Seals the base so the glaze stays open to work.',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '48.00' },
      { label: '1 qt', size: 1, unit: 'quart', price: '17.00' },
    ],
    hazards: {},
  },
  medium: {
    name: 'Glazing medium',
    kind: 'medium',
    unit: 'gallon',
    sdsUrl: '',
    notes: '',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '58.00' },
      { label: '1 qt', size: 1, unit: 'quart', price: '19.00' },
    ],
    hazards: {},
  },
  tint: {
    name: 'Umber tint paint',
    kind: 'paint',
    unit: 'quart',
    sdsUrl: '',
    notes: 'Raw umber; box all quarts for one job.',
    containers: [
      { label: '1 qt', size: 1, unit: 'quart', price: '18.00' },
      { label: '8 fl oz sample', size: 8, unit: 'floz', price: '7.50' },
    ],
    hazards: {},
  },
  alcohol: {
    name: 'Isopropyl alcohol',
    kind: 'solvent',
    unit: 'quart',
    sdsUrl: '',
    notes: 'Spattered into wet glaze to open small rings.',
    containers: [
      { label: '1 qt', size: 1, unit: 'quart', price: '8.00' },
      { label: '1 gal', size: 1, unit: 'gallon', price: '21.00' },
    ],
    // closed-cup flash point from an SDS (DOMAIN.md §3.5, R13): below 23 °C, so flammable
    hazards: { flashPointC: 12 },
  },
  limewash: {
    name: 'Limewash concentrate',
    kind: 'lime',
    unit: 'L',
    sdsUrl: '',
    notes: 'Stir often; thin with clean water only.',
    containers: [
      { label: '10 L pail', size: 10, unit: 'L', price: '89.00' },
      { label: '2.5 L pail', size: 2.5, unit: 'L', price: '29.00' },
    ],
    hazards: { isLime: true },
  },
} satisfies Record<string, ProductInput>;

type ProductIds = Record<keyof typeof PRODUCTS, string>;

const ft = (surfacePerHour: number) => ({ surfacePerHour, lengthUnit: 'ft' as const });

/** (a) Layered lime plaster: long waits (overnight, 24 h, then 72 h of cure before wax). */
const layeredLime = (p: ProductIds): FinishLayerInput[] => [
  {
    id: 'bond',
    name: 'Bonding primer',
    method: 'roll',
    productId: p.bondingPrimer,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 4,
    coverage: { kind: 'spreadRate', surfacePerUnit: 250, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(200),
  },
  {
    id: 'body',
    name: 'Body coat',
    method: 'trowel',
    productId: p.sandFinish,
    coats: 1,
    coverageShare: 1,
    waste: 0.12,
    waitHoursAfter: 16,
    coverage: { kind: 'consumption', unitPerSurface: 0.6, unit: 'kg', lengthUnit: 'm' },
    productionRate: ft(50),
  },
  // first finish coat goes further into the body coat than the second (DOMAIN.md §2.3: allow per-coat rates)
  {
    id: 'finish',
    name: 'Lime finish coats',
    method: 'trowel',
    productId: p.limePutty,
    coats: 2,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 24,
    coverage: { kind: 'consumption', unitPerSurface: 0.4, unit: 'kg', lengthUnit: 'm' },
    coatCoverages: [
      { kind: 'consumption', unitPerSurface: 0.4, unit: 'kg', lengthUnit: 'm' },
      { kind: 'consumption', unitPerSurface: 0.3, unit: 'kg', lengthUnit: 'm' },
    ],
    productionRate: ft(60),
  },
  {
    id: 'burnish',
    name: 'Burnish (tight skim)',
    method: 'burnish',
    productId: p.limePutty,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 72,
    coverage: { kind: 'consumption', unitPerSurface: 0.05, unit: 'kg', lengthUnit: 'm' },
    productionRate: ft(40),
  },
  {
    id: 'wax',
    name: 'Wax and buff',
    method: 'wax',
    productId: p.wax,
    coats: 1,
    coverageShare: 1,
    waste: 0.05,
    waitHoursAfter: 24,
    coverage: { kind: 'spreadRate', surfacePerUnit: 300, unit: 'lb', lengthUnit: 'ft' },
    productionRate: ft(80),
  },
];

/** (b) Antiqued glaze on a sealed base: partial coverage, dilution of the concentrate, a 1 : 4 mix recipe. */
const antiquedGlaze = (p: ProductIds): FinishLayerInput[] => [
  {
    id: 'prime',
    name: 'Primer',
    method: 'roll',
    productId: p.primer,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 4,
    coverage: { kind: 'spreadRate', surfacePerUnit: 300, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(250),
  },
  {
    id: 'base',
    name: 'Base coat',
    method: 'roll',
    productId: p.basePaint,
    coats: 2,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 4,
    coverage: { kind: 'spreadRate', surfacePerUnit: 375, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(250),
  },
  {
    id: 'seal',
    name: 'Clear seal over the base',
    method: 'roll',
    productId: p.sealer,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 16,
    coverage: { kind: 'spreadRate', surfacePerUnit: 400, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(250),
  },
  // 1 part tint : 4 parts medium (DOMAIN.md §2.4, R24), thinned 10 % of the concentrate, rubbed onto about 30 % of the surface
  {
    id: 'glaze',
    name: 'Antiquing glaze',
    method: 'glaze',
    coats: 1,
    coverageShare: 0.3,
    waste: 0.15,
    waitHoursAfter: 0,
    recipe: {
      by: 'volume',
      baseProductId: p.medium,
      components: [
        { productId: p.medium, parts: 4 },
        { productId: p.tint, parts: 1 },
      ],
    },
    dilution: { share: 0.1, convention: 'ofConcentrate' },
    coverage: { kind: 'spreadRate', surfacePerUnit: 400, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(100),
    multipliers: { ceiling: 1.5, curvedCeiling: 1.25 },
  },
  {
    id: 'spatter',
    name: 'Alcohol spatter into the wet glaze',
    method: 'other',
    productId: p.alcohol,
    coats: 1,
    coverageShare: 0.1,
    waste: 0.2,
    waitHoursAfter: 24,
    coverage: { kind: 'spreadRate', surfacePerUnit: 800, unit: 'quart', lengthUnit: 'ft' },
    productionRate: ft(300),
  },
];

/** (c) Limewash: each coat thinned by a share of the final mix (30 % water, then 20 %). */
const limewash = (p: ProductIds): FinishLayerInput[] => [
  {
    id: 'bond',
    name: 'Mineral bonding primer',
    method: 'roll',
    productId: p.bondingPrimer,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 6,
    coverage: { kind: 'spreadRate', surfacePerUnit: 250, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: ft(200),
  },
  {
    id: 'wash-1',
    name: 'Limewash, first coat',
    method: 'brush',
    productId: p.limewash,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 16,
    dilution: { share: 0.3, convention: 'ofMix' },
    coverage: { kind: 'spreadRate', surfacePerUnit: 8, unit: 'L', lengthUnit: 'm' },
    productionRate: ft(120),
    multipliers: { occupied: 1.15 },
  },
  {
    id: 'wash-2',
    name: 'Limewash, second coat',
    method: 'brush',
    productId: p.limewash,
    coats: 1,
    coverageShare: 1,
    waste: 0.1,
    waitHoursAfter: 24,
    dilution: { share: 0.2, convention: 'ofMix' },
    coverage: { kind: 'spreadRate', surfacePerUnit: 10, unit: 'L', lengthUnit: 'm' },
    productionRate: ft(140),
    multipliers: { occupied: 1.15 },
  },
];

export interface DemoLibrary {
  readonly productIds: ProductIds;
  readonly systemIds: { readonly layeredLime: string; readonly antiquedGlaze: string; readonly limewash: string };
}

/** Invented demo products and the three finish systems. Checked by the same rules as the API, so the demo never holds a system the engine cannot compute. */
export async function seedDemoLibrary(tx: TenantTx): Promise<DemoLibrary> {
  const productIds = {} as ProductIds;
  for (const [key, input] of Object.entries(PRODUCTS) as [keyof typeof PRODUCTS, ProductInput][]) {
    const [row] = await tx.db
      .insert(products)
      .values({ ...parse(productInput, input), tenantId: tx.tenantId })
      .returning({ id: products.id });
    productIds[key] = row.id;
  }
  const addSystem = async (name: string, description: string, layers: FinishLayerInput[]) => {
    const system = parse(finishSystemInput, { name, description, layers });
    await checkLayers(tx, system.layers);
    const [row] = await tx.db
      .insert(finishSystems)
      .values({ ...system, tenantId: tx.tenantId })
      .returning({ id: finishSystems.id });
    return row.id;
  };
  return {
    productIds,
    systemIds: {
      layeredLime: await addSystem(
        'Layered lime plaster, burnished and waxed',
        'Body coat and two lime finish coats, burnished, then waxed after a three-day cure.',
        layeredLime(productIds),
      ),
      antiquedGlaze: await addSystem(
        'Antiqued umber glaze on a sealed base',
        'Eggshell base sealed clear, then a thinned umber glaze rubbed into about a third of the surface.',
        antiquedGlaze(productIds),
      ),
      limewash: await addSystem(
        'Two-coat limewash',
        'Soft, cloudy limewash over a mineral primer; brush in crossing strokes.',
        limewash(productIds),
      ),
    },
  };
}
