import { DOME_GLAZE, LIME_TWO_COATS, PRIMER } from '../finishes/fixtures';
import type { FinishLayer, Product } from '../finishes/finish-system';
import type { SurfaceShape } from '../geometry/surface-shape';
import type { EstimateInput } from './estimate-input';

/**
 * Large generated jobs for the regression snapshot of `computeEstimate` (invented data; rates are
 * illustrative, common practice, no source). Shared by the snapshot spec and its writer only.
 */
function layer(id: string, productId: string, rate: number, wait: number): FinishLayer {
  return {
    id,
    name: id,
    method: 'trowel',
    productId,
    coats: 1,
    waste: 0.1,
    coverage:
      productId === 'lime'
        ? { kind: 'consumption', unitPerSurface: 0.5, unit: 'kg', lengthUnit: 'm' }
        : { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' },
    productionRate: { surfacePerHour: rate, lengthUnit: 'ft' },
    waitHoursAfter: wait,
  };
}

const BENCH_PRODUCTS: Product[] = [
  {
    id: 'primer',
    name: 'Primer',
    unit: 'gallon',
    containers: [
      { label: '5 gal', size: 5, unit: 'gallon', price: '190.00' },
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
      { label: '25 kg', size: 25, unit: 'kg', price: '110.00' },
      { label: '20 kg', size: 20, unit: 'kg', price: '95.00' },
      { label: '5 kg', size: 5, unit: 'kg', price: '28.00' },
    ],
  },
  { id: 'sealer', name: 'Sealer', unit: 'gallon', containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '60.00' }] },
  { id: 'medium', name: 'Glazing medium', unit: 'quart', containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '22.00' }] },
  { id: 'paint', name: 'Tint paint', unit: 'quart', containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '18.00' }] },
  {
    id: 'oilWax',
    name: 'Oil wax',
    unit: 'L',
    hazards: { containsDryingOil: true, flashPointC: 45 },
    containers: [{ label: '1 L', size: 1, unit: 'L', price: '30.00' }],
  },
  {
    id: 'skim',
    name: 'Skim coat',
    unit: 'kg',
    hazards: { containsSilica: true },
    containers: [{ label: '20 kg', size: 20, unit: 'kg', price: '40.00' }],
  },
];

/** The benchmark's job: 50 rooms, walls and ceiling (2) or also round walls and a dome (4), 4 layers each. */
export function benchJob(surfacesPerRoom: 2 | 4, rooms = 50): EstimateInput {
  const allShapes: SurfaceShape[] = [
    {
      kind: 'walls',
      perimeter: 56,
      height: 9,
      openings: [
        { width: 3, height: 7 },
        { width: 4, height: 5, count: 2 },
      ],
    },
    { kind: 'ceilingRect', length: 14, width: 14, elevation: 9 },
    { kind: 'roundWalls', radius: 9, height: 10, openings: [{ width: 3, height: 7 }] },
    { kind: 'sphericalCap', baseRadius: 9, rise: 3, elevation: 10 },
  ];
  const shapes = allShapes.slice(0, surfacesPerRoom);
  return {
    startDate: '2025-06-05',
    property: { yearBuilt: 1965, isOccupied: true },
    settings: {
      currency: 'USD',
      lengthUnit: 'ft',
      minDeductedOpeningArea: 4,
      labourRate: '45.00',
      materialsMarkup: 0.2,
      overheadProfit: { method: 'margin', overhead: 0.2, profit: 0.15 },
      minimumCharge: '2500.00',
      tax: { mode: 'materials', rate: 0.0825 },
      rounding: { kind: 'nearest', increment: '5' },
      calendar: {
        workingWeekdays: [1, 2, 3, 4, 5],
        dayStartHour: 8,
        productiveHoursPerDay: 7,
        minimumBlockHours: 3,
        holidays: ['2025-07-04'],
      },
      crewSize: 3,
      setupHours: 6,
      cleanupHours: 4,
      multipliers: { ceiling: 1.4, curvedWall: 1.15, curvedCeiling: 1.5, height: 1.2, occupied: 1.1 },
      scaffoldHeight: 12,
      workingReach: 6,
    },
    products: BENCH_PRODUCTS.slice(0, 3),
    finishSystems: [
      {
        id: 'venetian',
        name: 'Venetian',
        layers: [
          layer('prime', 'primer', 250, 4),
          layer('coat1', 'lime', 60, 16),
          layer('coat2', 'lime', 40, 24),
          layer('seal', 'sealer', 120, 0),
        ],
      },
    ],
    rooms: Array.from({ length: rooms }, (_, r) => ({
      id: `room${r}`,
      name: `Room ${r + 1}`,
      surfaces: shapes.map((shape, s) => ({
        id: `r${r}s${s}`,
        name: shape.kind,
        shape,
        finishSystemId: 'venetian',
        disturbedPaintedArea: 2,
      })),
    })),
    perAreaRates: { venetian: '9.00' },
    options: [{ id: 'beams', label: 'Faux beams', labourHours: 12, materialsCost: '180.00' }],
  };
}

/** Every shape kind the takeoff knows, sized by `k` so rooms differ. */
function shapesFor(k: number): SurfaceShape[] {
  const d = 1 + (k % 7) / 10;
  return [
    {
      kind: 'walls',
      perimeter: 40 * d,
      height: 8 + (k % 3),
      openings: [
        { width: 3, height: 6.8 },
        { width: 2, height: 1.5, count: 3 },
      ],
    },
    { kind: 'gable', base: 20 * d, height: 8, elevation: 9 },
    { kind: 'trapezoid', base1: 10 * d, base2: 6, height: 4 },
    { kind: 'ceilingRect', length: 12 * d, width: 14, elevation: 8 + (k % 5) },
    { kind: 'ceilingCircle', radius: 6 * d, elevation: 10 },
    {
      kind: 'ceilingPolygon',
      corners: [
        [0, 0],
        [12 * d, 0],
        [12 * d, 9],
        [5, 12],
        [0, 9],
      ],
      elevation: 9,
    },
    { kind: 'roundWalls', radius: 7 * d, height: 10, openings: [{ width: 3, height: 7 }] },
    { kind: 'curvedWall', radius: 9, angleDegrees: 30 + 10 * (k % 6), height: 10 },
    { kind: 'cone', radius: 8, rise: 3 + (k % 4), elevation: 12 },
    { kind: 'pyramid', sides: 3 + (k % 6), sideLength: 4, rise: 6, elevation: 11 },
    { kind: 'hemisphere', radius: 5 * d, elevation: 10 },
    { kind: 'sphericalCap', baseRadius: 9, rise: 1 + (k % 5), elevation: 10 },
    { kind: 'sphericalCapFromSphere', sphereRadius: 10, rise: 2 + (k % 3) },
    { kind: 'barrelVault', radius: 6, length: 20 * d, elevation: 9 },
    { kind: 'segmentalVault', span: 12, rise: 3, length: 20 * d, elevation: 9 },
    { kind: 'groinVault', side: 10 * d, elevation: 12 },
    { kind: 'cloisterVault', side: 10 * d, elevation: 14 },
    { kind: 'coffers', count: 6, innerPerimeter: 12, depth: 0.5, panelArea: 9, elevation: 10 },
    { kind: 'crownStraight', length: 48 * d, elevation: 9 },
    { kind: 'crownCircular', radius: 9, elevation: 10 },
    { kind: 'beams', count: 3, length: 16, width: 8 / 12, depth: 10 / 12, elevation: 9 },
    { kind: 'beams', count: 2, length: 14, width: 0.5, depth: 0.75, measureBy: 'length', elevation: 9 },
    { kind: 'border', length: 30 * d, elevation: 7 },
  ];
}

const sand: FinishLayer = {
  id: 'sand',
  name: 'Sand between coats',
  method: 'sand',
  productId: 'skim',
  coats: 1,
  waste: 0.05,
  coverage: { kind: 'consumption', unitPerSurface: 0.2, unit: 'kg', lengthUnit: 'm' },
  productionRate: { surfacePerHour: 90, lengthUnit: 'ft' },
  multipliers: { ceiling: 1.8, height: 1 },
  waitHoursAfter: 0,
};
const oilWax: FinishLayer = {
  id: 'oilWax',
  name: 'Oil wax',
  method: 'wax',
  productId: 'oilWax',
  coats: 2,
  waste: 0.1,
  coverage: { kind: 'spreadRate', surfacePerUnit: 30, unit: 'L', lengthUnit: 'm' },
  productionRate: { surfacePerHour: 80, lengthUnit: 'ft' },
  waitHoursAfter: 2.5,
};
const trimPaint: FinishLayer = {
  id: 'trimPaint',
  name: 'Trim paint',
  method: 'brush',
  productId: 'paint',
  coats: 2,
  waste: 0.1,
  coverage: { kind: 'spreadRate', surfacePerUnit: 120, unit: 'quart', lengthUnit: 'ft' },
  productionRate: { surfacePerHour: 35, lengthUnit: 'ft' },
  waitHoursAfter: 1,
};

/**
 * A mixed job: every shape kind, five finish systems (recipes, per-coat coverage, sanding,
 * drying-oil wax, running items), exterior rooms, a six-day week with holidays, extras and a discount.
 */
export function mixedJob(rooms = 40): EstimateInput {
  const systems = ['venetian', 'glazed', 'skim', 'waxed', 'trim'];
  return {
    startDate: '2025-11-20',
    property: { isOccupied: false },
    firmCountry: 'US',
    settings: {
      currency: 'USD',
      lengthUnit: 'ft',
      minDeductedOpeningArea: 2.5,
      labourRate: '52.50',
      materialsMarkup: '0.25',
      overheadProfit: { method: 'markup', overhead: 0.12, profit: 0.1 },
      tax: { mode: 'wholeJob', rate: '0.0625' },
      rounding: { kind: 'minorUnit' },
      calendar: {
        workingWeekdays: [1, 2, 3, 4, 5, 6],
        dayStartHour: 7.5,
        productiveHoursPerDay: 8,
        minimumBlockHours: 2,
        holidays: ['2025-11-27', '2025-12-25', '2026-01-01'],
      },
      crewSize: 2,
      setupHours: 5,
      cleanupHours: 3,
      multipliers: { ceiling: 1.5, curvedWall: 1.2, curvedCeiling: 1.35, height: 1.25, occupied: 1.1 },
      scaffoldHeight: 11,
      workingReach: 6,
    },
    products: BENCH_PRODUCTS,
    finishSystems: [
      { id: 'venetian', name: 'Lime Venetian', layers: [PRIMER, LIME_TWO_COATS, layer('seal', 'sealer', 120, 0)] },
      { id: 'glazed', name: 'Base and glaze', layers: [PRIMER, DOME_GLAZE] },
      { id: 'skim', name: 'Skim and sand', layers: [layer('skim1', 'lime', 70, 12), sand, layer('skim2', 'lime', 70, 12), sand] },
      { id: 'waxed', name: 'Waxed plaster', layers: [layer('base', 'lime', 50, 20), oilWax] },
      { id: 'trim', name: 'Trim', layers: [trimPaint] },
    ],
    rooms: Array.from({ length: rooms }, (_, r) => ({
      id: `room${r}`,
      name: `Room ${r + 1}`,
      ...(r % 9 === 4 ? { isExterior: true } : {}),
      surfaces: Array.from({ length: 3 + (r % 5) }, (_, s) => shapesFor(r)[(r * 5 + s * 7) % 23]).map((shape, s) => ({
        id: `r${r}s${s}`,
        name: `${shape.kind} ${s + 1}`,
        shape,
        finishSystemId:
          shape.kind === 'crownStraight' || shape.kind === 'crownCircular' || shape.kind === 'border' ? 'trim' : systems[(r * 3 + s) % 4],
        ...(s % 3 === 1 ? { disturbedPaintedArea: (r % 4) * 3 } : {}),
      })),
    })),
    equipment: [{ label: 'Scaffold tower, 2 weeks', amount: '640.00' }],
    subcontracts: [{ label: 'Ceiling repair', amount: '1200.00' }],
    sundries: [{ label: 'Tape and paper', amount: '85.40' }],
    discount: { kind: 'share', share: '0.05' },
    perAreaRates: { venetian: '8.50', glazed: '4.25', trim: '6.00' },
    options: [
      { id: 'stencil', label: 'Stencilled border', labourHours: 9.5, materialsCost: '75.00' },
      { id: 'gilding', label: 'Gilded cornice', labourHours: 20, materialsCost: '410.00', sundries: [{ label: 'Size', amount: '30.00' }] },
    ],
  };
}

/** The jobs the snapshot holds, by name. */
export const LARGE_JOBS: ReadonlyArray<readonly [string, () => EstimateInput]> = [
  ['bench 50 × 4 × 4', () => benchJob(4)],
  ['mixed 40 rooms', () => mixedJob(40)],
];
