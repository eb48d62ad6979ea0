import { requireFiniteNumber, requireFraction, requireInteger, requireNonNegative, requirePositive } from '../errors/input-checks';
import type { FinishLayer, LabourMultipliers } from '../finishes/finish-system';
import type { SurfaceAmount } from '../finishes/layer-quantity';
import { type LengthUnit, type UnitScale, scaleArea, scaleLength, unitScale } from '../units/length';

export interface MultiplierStep {
  name: keyof LabourMultipliers;
  factor: number;
}

export interface LayerHours {
  layerId: string;
  /** effective surface × coats / production rate, before multipliers */
  baseHours: number;
  /** each multiplier that applied, once, in a fixed order */
  chain: MultiplierStep[];
  hours: number;
}

export interface SurfaceConditions {
  isCeiling: boolean;
  isCurved: boolean;
  /** top of the work, in the surface's length unit */
  topHeight: number | null;
  isOccupied: boolean;
  /** above this top height (same unit) the height/scaffold multiplier applies */
  scaffoldHeight: number;
}

const ORDER: ReadonlyArray<keyof LabourMultipliers> = ['ceiling', 'height', 'curvedWall', 'curvedCeiling', 'occupied'];

function applies(name: keyof LabourMultipliers, c: SurfaceConditions): boolean {
  switch (name) {
    case 'ceiling':
      return c.isCeiling;
    case 'height':
      return c.topHeight !== null && c.topHeight > c.scaffoldHeight;
    case 'curvedWall':
      return c.isCurved && !c.isCeiling;
    case 'curvedCeiling':
      return c.isCurved && c.isCeiling;
    case 'occupied':
      return c.isOccupied;
  }
}

/** A layer's labour inputs, checked and looked up once per estimate rather than per surface. */
export interface PreparedLayerHours {
  layer: FinishLayer;
  rate: number;
  coats: number;
  share: number;
  scale: UnitScale;
  field: string;
}

/** Every check `layerHours` makes before the multipliers, in the same order. */
export function prepareLayerHours(layer: FinishLayer, surfaceUnit: LengthUnit, field = 'layer'): PreparedLayerHours {
  const rate = requirePositive(layer.productionRate.surfacePerHour, `${field}.productionRate.surfacePerHour`, 'production rate');
  const coats = requireInteger(layer.coats, `${field}.coats`, 1, 'number of coats');
  const share = layer.coverageShare === undefined ? 1 : requireFraction(layer.coverageShare, `${field}.coverageShare`, 'coverage share');
  return { layer, rate, coats, share, scale: unitScale(surfaceUnit, layer.productionRate.lengthUnit), field };
}

/**
 * The multipliers that apply under these conditions, checked. Layer multipliers override the
 * firm's defaults key by key; each applies at most once, in a fixed order.
 */
export function multiplierSteps(
  p: PreparedLayerHours,
  conditions: SurfaceConditions,
  firmMultipliers: LabourMultipliers,
): MultiplierStep[] {
  const { layer, field } = p;
  const chain: MultiplierStep[] = [];
  for (const name of ORDER) {
    if (!applies(name, conditions)) continue;
    const factor = layer.multipliers?.[name] ?? firmMultipliers[name];
    if (factor === undefined || factor === 1) continue;
    requirePositive(
      factor,
      layer.multipliers?.[name] !== undefined ? `${field}.multipliers.${name}` : `settings.multipliers.${name}`,
      'multiplier',
    );
    // Frozen: every surface under the same conditions shares these steps (see applyLayerHours).
    chain.push(Object.freeze({ name, factor }));
  }
  return chain;
}

/** Hours of a prepared layer on one surface (quantity in the unit it was prepared for). */
export function applyLayerHours(
  p: PreparedLayerHours,
  quantity: number,
  measure: SurfaceAmount['measure'],
  steps: readonly Readonly<MultiplierStep>[],
): LayerHours {
  const counted = measure === 'area' ? scaleArea(quantity, p.scale) : scaleLength(quantity, p.scale);
  const baseHours = (counted * p.share * p.coats) / p.rate;
  // A fresh chain per surface (callers may keep or reorder one surface's list), sized up front;
  // the steps in it are the frozen ones `multiplierSteps` made, shared rather than copied.
  const chain = new Array<MultiplierStep>(steps.length);
  let hours = baseHours;
  for (let i = 0; i < steps.length; i++) {
    chain[i] = steps[i];
    hours *= steps[i].factor;
  }
  return { layerId: p.layer.id, baseHours, chain, hours };
}

/**
 * hours = surface × share × coats / rate × Π multipliers. Layer multipliers override the
 * firm's defaults key by key; each applies at most once and the chain is returned for display.
 */
export function layerHours(
  surface: SurfaceAmount,
  layer: FinishLayer,
  conditions: SurfaceConditions,
  firmMultipliers: LabourMultipliers,
  field = 'layer',
): LayerHours {
  requirePositive(layer.productionRate.surfacePerHour, `${field}.productionRate.surfacePerHour`, 'production rate');
  requireInteger(layer.coats, `${field}.coats`, 1, 'number of coats');
  if (layer.coverageShare !== undefined) requireFraction(layer.coverageShare, `${field}.coverageShare`, 'coverage share');
  requireFiniteNumber(surface.quantity, 'value');
  const p = prepareLayerHours(layer, surface.unit, field);
  return applyLayerHours(p, surface.quantity, surface.measure, multiplierSteps(p, conditions, firmMultipliers));
}

export interface CrewTime {
  layerHours: number;
  setupHours: number;
  cleanupHours: number;
  totalCrewHours: number;
  /** crew-days at crew size × productive hours per day */
  crewDays: number;
}

/** job hours = Σ layers + setup + clean-up; crew-days = hours / (crew × productive hours). */
export function crewTime(
  layerTotal: number,
  setupHours: number,
  cleanupHours: number,
  crewSize: number,
  productiveHoursPerDay: number,
): CrewTime {
  requireNonNegative(layerTotal, 'layerHours', 'layer hours');
  requireNonNegative(setupHours, 'settings.setupHours', 'setup hours');
  requireNonNegative(cleanupHours, 'settings.cleanupHours', 'clean-up hours');
  requireInteger(crewSize, 'settings.crewSize', 1, 'crew size');
  requirePositive(productiveHoursPerDay, 'settings.calendar.productiveHoursPerDay', 'productive hours per day');
  const total = layerTotal + setupHours + cleanupHours;
  return {
    layerHours: layerTotal,
    setupHours,
    cleanupHours,
    totalCrewHours: total,
    crewDays: total / (crewSize * productiveHoursPerDay),
  };
}
