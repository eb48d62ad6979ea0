import type { FinishLayer, Product } from './finish-system';

/**
 * Illustrative products and layers of DOMAIN.md §2.3–2.6 (rates are illustrative, not sourced
 * norms: common practice, no source). Shared by specs; not part of the public API.
 */
export const PRODUCTS: Product[] = [
  {
    id: 'primer',
    name: 'Acrylic primer',
    unit: 'gallon',
    containers: [
      { label: '1 gal', size: 1, unit: 'gallon', price: '45.00' },
      { label: '1 qt', size: 1, unit: 'quart', price: '16.00' },
    ],
  },
  {
    id: 'lime',
    name: 'Lime plaster',
    unit: 'kg',
    hazards: { isLime: true },
    containers: [
      { label: '20 kg pail', size: 20, unit: 'kg', price: '95.00' },
      { label: '5 kg pail', size: 5, unit: 'kg', price: '28.00' },
    ],
  },
  { id: 'medium', name: 'Glazing medium', unit: 'quart', containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '22.00' }] },
  { id: 'paint', name: 'Tint paint', unit: 'quart', containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '18.00' }] },
  { id: 'wax', name: 'Finishing wax', unit: 'L', containers: [{ label: '1 L', size: 1, unit: 'L', price: '30.00' }] },
];

export const productMap = (): Map<string, Product> => new Map(PRODUCTS.map((p) => [p.id, p]));

export const PRIMER: FinishLayer = {
  id: 'primer',
  name: 'Primer',
  method: 'roll',
  productId: 'primer',
  coats: 1,
  waste: 0.1,
  waitHoursAfter: 4,
  coverage: { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' },
  productionRate: { surfacePerHour: 250, lengthUnit: 'ft' },
};

export const LIME_TWO_COATS: FinishLayer = {
  id: 'lime',
  name: 'Lime plaster, two coats',
  method: 'trowel',
  productId: 'lime',
  coats: 2,
  waste: 0.1,
  waitHoursAfter: 16,
  coverage: { kind: 'consumption', unitPerSurface: 0.5, unit: 'kg', lengthUnit: 'm' },
  coatCoverages: [
    { kind: 'consumption', unitPerSurface: 0.5, unit: 'kg', lengthUnit: 'm' },
    { kind: 'consumption', unitPerSurface: 0.3, unit: 'kg', lengthUnit: 'm' },
  ],
  productionRate: { surfacePerHour: 60, lengthUnit: 'ft' },
};

export const DOME_GLAZE: FinishLayer = {
  id: 'glaze',
  name: 'Antiquing glaze',
  method: 'glaze',
  coats: 1,
  waste: 0.15,
  waitHoursAfter: 4,
  coverageShare: 0.3,
  coverage: { kind: 'spreadRate', surfacePerUnit: 400, unit: 'gallon', lengthUnit: 'ft' },
  dilution: { share: 0.1, convention: 'ofConcentrate' },
  recipe: {
    by: 'volume',
    baseProductId: 'paint',
    components: [
      { productId: 'medium', parts: 4 },
      { productId: 'paint', parts: 1 },
    ],
  },
  productionRate: { surfacePerHour: 100, lengthUnit: 'ft' },
};
