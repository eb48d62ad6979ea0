import { requireInteger, requireFraction, requireNonNegative, requirePositive } from '../errors/input-checks';
import type { FinishLayer, LabourMultipliers } from '../finishes/finish-system';
import type { SurfaceAmount } from '../finishes/layer-quantity';
import { convertArea, convertLength } from '../units/length';

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
  const rate = requirePositive(layer.productionRate.surfacePerHour, `${field}.productionRate.surfacePerHour`, 'production rate');
  const coats = requireInteger(layer.coats, `${field}.coats`, 1, 'number of coats');
  const share = layer.coverageShare === undefined ? 1 : requireFraction(layer.coverageShare, `${field}.coverageShare`, 'coverage share');
  const unit = layer.productionRate.lengthUnit;
  const counted =
    surface.measure === 'area' ? convertArea(surface.quantity, surface.unit, unit) : convertLength(surface.quantity, surface.unit, unit);
  const baseHours = (counted * share * coats) / rate;
  const chain: MultiplierStep[] = [];
  let hours = baseHours;
  for (const name of ORDER) {
    if (!applies(name, conditions)) continue;
    const factor = layer.multipliers?.[name] ?? firmMultipliers[name];
    if (factor === undefined || factor === 1) continue;
    requirePositive(factor, layer.multipliers?.[name] !== undefined ? `${field}.multipliers.${name}` : `settings.multipliers.${name}`, 'multiplier');
    chain.push({ name, factor });
    hours *= factor;
  }
  return { layerId: layer.id, baseHours, chain, hours };
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
