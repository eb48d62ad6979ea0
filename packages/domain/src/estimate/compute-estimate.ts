import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { requireNonEmpty, requireNonNegative } from '../errors/input-checks';
import { type ContainerPack, chooseContainers } from '../finishes/container-pack';
import type { FinishSystem, Product } from '../finishes/finish-system';
import { type LayerQuantity, applyLayerQuantity } from '../finishes/layer-quantity';
import { measureSurface } from '../geometry/measure-surface';
import type { SurfaceMeasure } from '../geometry/surface-shape';
import { type CrewTime, type LayerHours, applyLayerHours, crewTime } from '../labour/layer-hours';
import { perAreaCheck } from '../pricing/per-area-check';
import { type PriceBreakdown, priceJob } from '../pricing/price-job';
import { type Caution, safetyCautions, treatedAsTargetHousing } from '../safety/safety-cautions';
import { type LeadStatus, leadRuleYear, leadStatus } from './lead-status';
import { type JobSchedule, type WorkChain, scheduleJob } from '../schedule/schedule-job';
import { type Dimension, dimensionOf, fromBase } from '../units/quantity-unit';
import { convertArea, convertLength, type LengthUnit } from '../units/length';
import type { EstimateInput } from './estimate-input';
import { LayerPlan, conditionMask } from './layer-plan';

export interface LayerLine {
  layerId: string;
  name: string;
  quantity: LayerQuantity;
  labour: LayerHours;
}

export interface SurfaceResult {
  roomId: string;
  surfaceId: string;
  name: string;
  finishSystemId: string;
  measure: SurfaceMeasure;
  layers: LayerLine[];
}

export interface ProductTotal {
  productId: string;
  name: string;
  dimension: Dimension;
  /** whole-job need in base units (mL or g), summed before rounding to containers */
  need: number;
  /** the same need in the product's own unit */
  needInUnit: number;
  unit: Product['unit'];
  pack: ContainerPack;
}

export interface EstimateResult {
  surfaces: SurfaceResult[];
  products: ProductTotal[];
  labour: CrewTime;
  schedule: JobSchedule;
  price: PriceBreakdown;
  options: Array<{ id: string; label: string; price: PriceBreakdown }>;
  perAreaCheck: { total: Decimal; lines: Array<{ surfaceId: string; amount: Decimal }> } | null;
  cautions: Caution[];
  /** where the home stands under the lead rules; `assumed-target-housing` asks for the year built */
  lead: LeadStatus;
  totals: { area: number; length: number; materialsCost: Decimal };
}

/**
 * Everything an estimate shows, from the job's surfaces and the firm's settings. Pure and
 * deterministic, so the browser recomputing on each keystroke and the server recomputing on
 * save get the same numbers.
 */
/**
 * The most one estimate measures, in feet and converted to the firm's unit (common practice, no source: far past what a firm of one
 * to fifteen people prices at once). Checked before the container search and the day plan, whose
 * work grows with the need: a slip of three zeros in the takeoff is a 400, not a server stalled for
 * minutes or out of memory.
 */
export const JOB_SIZE_LIMITS = { areaFt2: 500_000, lengthFt: 100_000 } as const;

function requireJobSize(area: number, length: number, unit: LengthUnit): void {
  const fmt = (n: number) => Math.round(n).toLocaleString('en-US');
  const areaMax = convertArea(JOB_SIZE_LIMITS.areaFt2, 'ft', unit);
  const lengthMax = convertLength(JOB_SIZE_LIMITS.lengthFt, 'ft', unit);
  if (area > areaMax)
    throw new DomainInputError(
      'rooms',
      `The surfaces measure ${fmt(area)} ${unit}² in all, more than the ${fmt(areaMax)} ${unit}² one estimate takes. Check the sizes in the takeoff.`,
    );
  if (length > lengthMax)
    throw new DomainInputError(
      'rooms',
      `The running items measure ${fmt(length)} ${unit} in all, more than the ${fmt(lengthMax)} ${unit} one estimate takes. Check the sizes in the takeoff.`,
    );
}

export function computeEstimate(input: EstimateInput): EstimateResult {
  const s = input.settings;
  requireNonEmpty(input.rooms, 'rooms', 'list of rooms');
  const products = new Map<string, Product>(input.products.map((p) => [p.id, p]));
  const systems = new Map<string, { system: FinishSystem; index: number }>();
  input.finishSystems.forEach((f, i) => {
    requireNonEmpty(f.layers, `finishSystems[${i}].layers`, 'layer list');
    systems.set(f.id, { system: f, index: i });
  });
  const takeoff = { minDeductedOpeningArea: s.minDeductedOpeningArea };
  const isOccupied = input.property?.isOccupied === true;
  const plan = new LayerPlan(products, s.lengthUnit, s.multipliers);

  const surfaces: SurfaceResult[] = [];
  const chains: WorkChain[] = [];
  const disturbedPaint: Array<{ roomId: string; isExterior: boolean; area: number }> = [];
  let layerTotal = 0;
  let sandsPlaster = false;
  let highestTop = 0;
  let area = 0;
  let length = 0;

  for (let r = 0; r < input.rooms.length; r++) {
    const room = input.rooms[r];
    const roomPrefix = `${room.name} – `;
    for (let k = 0; k < room.surfaces.length; k++) {
      const surface = room.surfaces[k];
      const found = systems.get(surface.finishSystemId);
      if (!found)
        throw new DomainInputError(`rooms[${r}].surfaces[${k}].finishSystemId`, `No finish system with id "${surface.finishSystemId}".`);
      const { system, index: systemIndex } = found;
      const m = measureSurface(surface.shape, takeoff, `rooms[${r}].surfaces[${k}].shape`);
      if (m.measure === 'area') area += m.quantity;
      else length += m.quantity;
      if (m.topHeight !== null) highestTop = Math.max(highestTop, m.topHeight);
      if (surface.disturbedPaintedArea !== undefined) {
        disturbedPaint.push({ roomId: room.id, isExterior: room.isExterior === true, area: surface.disturbedPaintedArea });
      }
      const conditions = {
        isCeiling: m.isCeiling,
        isCurved: m.isCurved,
        topHeight: m.topHeight,
        isOccupied,
        scaffoldHeight: s.scaffoldHeight,
      };
      // The same for every layer of the surface: which multipliers apply.
      const mask = conditionMask(conditions);
      // Checked here once rather than by each layer: it is the only per-surface input check.
      requireNonNegative(m.quantity, 'surface.quantity', 'surface');
      const layerCount = system.layers.length;
      const layers = new Array<LayerLine>(layerCount);
      const chainSteps = new Array<WorkChain['steps'][number]>(layerCount);
      for (let li = 0; li < layerCount; li++) {
        const layer = system.layers[li];
        const planned = plan.layer(systemIndex, layer, li);
        const quantity = applyLayerQuantity(planned.quantity, m.quantity, m.measure);
        plan.addNeeds(planned, quantity);
        if (layer.method === 'sand') sandsPlaster = true;
        const labour = applyLayerHours(planned.hours, m.quantity, m.measure, plan.steps(planned, conditions, mask));
        layerTotal += labour.hours;
        layers[li] = { layerId: layer.id, name: layer.name, quantity, labour };
        chainSteps[li] = { layerId: layer.id, label: layer.name, crewHours: labour.hours, waitHoursAfter: layer.waitHoursAfter };
      }
      surfaces.push({ roomId: room.id, surfaceId: surface.id, name: surface.name, finishSystemId: system.id, measure: m, layers });
      chains.push({ id: surface.id, label: roomPrefix + surface.name, steps: chainSteps });
    }
  }

  requireJobSize(area, length, s.lengthUnit);

  // Whole-job totals first, containers second: tinted products are bought once and boxed.
  let materialsCost = new Decimal(0);
  const productTotals: ProductTotal[] = [];
  for (let slot = 0; slot < plan.needIds.length; slot++) {
    const productId = plan.needIds[slot];
    const need = plan.needs[slot];
    const p = products.get(productId) as Product;
    const index = input.products.indexOf(p);
    const dimension = dimensionOf(p.unit, `products[${index}].unit`);
    const pack = chooseContainers(need, dimension, p.containers, `products[${index}].containers`);
    materialsCost = materialsCost.plus(pack.totalCost);
    productTotals.push({ productId, name: p.name, dimension, need, needInUnit: fromBase(need, p.unit), unit: p.unit, pack });
  }

  const labour = crewTime(layerTotal, s.setupHours, s.cleanupHours, s.crewSize, s.calendar.productiveHoursPerDay);
  const schedule = scheduleJob({
    startDate: input.startDate,
    calendar: s.calendar,
    crewSize: s.crewSize,
    setupHours: s.setupHours,
    cleanupHours: s.cleanupHours,
    chains,
  });

  const priceRules = { currency: s.currency, overheadProfit: s.overheadProfit, tax: s.tax, rounding: s.rounding };
  const price = priceJob({
    ...priceRules,
    minimumCharge: s.minimumCharge,
    discount: input.discount,
    direct: {
      labourHours: labour.totalCrewHours,
      labourRate: s.labourRate,
      materialsCost: materialsCost,
      materialsMarkup: s.materialsMarkup,
      equipment: input.equipment,
      subcontracts: input.subcontracts,
      sundries: input.sundries,
    },
  });
  const options = (input.options ?? []).map((o, i) => ({
    id: o.id,
    label: o.label,
    price: priceJob(
      {
        ...priceRules,
        direct: {
          labourHours: o.labourHours,
          labourRate: s.labourRate,
          materialsCost: o.materialsCost,
          materialsMarkup: s.materialsMarkup,
          equipment: o.equipment,
          subcontracts: o.subcontracts,
          sundries: o.sundries,
        },
      },
      `options[${i}]`,
    ),
  }));

  let perArea: EstimateResult['perAreaCheck'] = null;
  const rates = input.perAreaRates;
  if (rates) {
    const priced = surfaces.filter((x) => Object.prototype.hasOwnProperty.call(rates, x.finishSystemId));
    const check = perAreaCheck(priced.map((x) => ({ label: x.name, quantity: x.measure.quantity, rate: rates[x.finishSystemId] })));
    perArea = { total: check.total, lines: priced.map((x, i) => ({ surfaceId: x.surfaceId, amount: check.lines[i] })) };
  }

  // An unknown year with paint disturbed counts as before 1978 until the year is recorded (40 CFR 745).
  const disturbsPaint = disturbedPaint.some((d) => d.area > 0);
  const lead = leadStatus(input.property?.yearBuilt, disturbsPaint);
  const ruleYear = leadRuleYear(input.property?.yearBuilt, disturbsPaint);
  const cautions = safetyCautions({
    lengthUnit: s.lengthUnit,
    ...(ruleYear !== undefined ? { yearBuilt: ruleYear } : {}),
    disturbedPaint,
    workingLevel: Math.max(0, highestTop - s.workingReach),
    products: plan.needIds.map((id) => {
      const p = products.get(id) as Product;
      return { name: p.name, ...p.hazards };
    }),
    sandsPlaster,
    ...(input.firmCountry !== undefined ? { firmCountry: input.firmCountry } : {}),
  });
  if (lead === 'assumed-target-housing') {
    const at = cautions.findIndex((c) => c.id === 'lead-safe-work');
    if (at >= 0) cautions[at] = treatedAsTargetHousing(cautions[at]);
  }

  return {
    surfaces,
    products: productTotals,
    labour,
    schedule,
    price,
    options,
    perAreaCheck: perArea,
    cautions,
    lead,
    totals: { area, length, materialsCost },
  };
}
