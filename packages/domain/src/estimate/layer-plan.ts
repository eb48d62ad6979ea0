import type { FinishLayer, LabourMultipliers, Product } from '../finishes/finish-system';
import { type LayerQuantity, type PreparedLayerQuantity, prepareLayerQuantity } from '../finishes/layer-quantity';
import {
  type MultiplierStep,
  type PreparedLayerHours,
  type SurfaceConditions,
  multiplierSteps,
  prepareLayerHours,
} from '../labour/layer-hours';
import type { LengthUnit } from '../units/length';

/** One finish-system layer, checked and looked up once for all the surfaces it goes on. */
export interface PlannedLayer {
  quantity: PreparedLayerQuantity;
  hours: PreparedLayerHours;
  /** checked multiplier steps by condition mask (see `conditionMask`), filled on first use */
  steps: Array<readonly MultiplierStep[] | undefined>;
  /** where each of the layer's products is totalled in `LayerPlan.needs` */
  needSlots: number[];
}

/** The four facts that decide which multipliers apply; 16 combinations at most. */
export function conditionMask(c: SurfaceConditions): number {
  const high = c.topHeight !== null && c.topHeight > c.scaffoldHeight;
  return (c.isCeiling ? 1 : 0) | (c.isCurved ? 2 : 0) | (high ? 4 : 0) | (c.isOccupied ? 8 : 0);
}

/**
 * The estimate's layers, prepared lazily. A layer is prepared when the first surface using it
 * reaches it, so a bad input fails with the same error, in the same order, as checking every
 * layer on every surface would: every check here depends only on the layer and the firm, so
 * once it has passed it would pass again on every later surface.
 */
export class LayerPlan {
  private readonly bySystem: Array<Array<PlannedLayer | undefined> | undefined> = [];
  /**
   * Whole-job need per product (base units), in the order products first come up. A slot is
   * opened when a layer is prepared, just before that layer first adds to it, so the order is
   * the order of first use and every total is summed in the same order as a map would.
   */
  readonly needIds: string[] = [];
  readonly needs: number[] = [];
  private readonly needSlotOf = new Map<string, number>();

  constructor(
    private readonly products: ReadonlyMap<string, Product>,
    private readonly surfaceUnit: LengthUnit,
    private readonly firmMultipliers: LabourMultipliers,
  ) {}

  /** Layer `li` of finish system `systemIndex`, prepared (quantity checks first, then labour). */
  layer(systemIndex: number, layer: FinishLayer, li: number): PlannedLayer {
    let layers = this.bySystem[systemIndex];
    if (layers === undefined) {
      layers = [];
      this.bySystem[systemIndex] = layers;
    }
    let planned = layers[li];
    if (planned === undefined) {
      const field = `finishSystems[${systemIndex}].layers[${li}]`;
      const quantity = prepareLayerQuantity(layer, this.products, this.surfaceUnit, field);
      const hours = prepareLayerHours(layer, this.surfaceUnit, field);
      planned = { quantity, hours, steps: [], needSlots: quantity.products.map((p) => this.needSlot(p.productId)) };
      layers[li] = planned;
    }
    return planned;
  }

  /** Adds one surface's quantities of a layer to the job totals. */
  addNeeds(planned: PlannedLayer, quantity: LayerQuantity): void {
    const slots = planned.needSlots;
    for (let i = 0; i < slots.length; i++) this.needs[slots[i]] += quantity.products[i].amount;
  }

  private needSlot(productId: string): number {
    let slot = this.needSlotOf.get(productId);
    if (slot === undefined) {
      slot = this.needIds.length;
      this.needIds.push(productId);
      this.needs.push(0);
      this.needSlotOf.set(productId, slot);
    }
    return slot;
  }

  /** The multipliers for a surface's conditions (`mask` is `conditionMask(conditions)`), checked the first time they come up. */
  steps(planned: PlannedLayer, conditions: SurfaceConditions, mask: number): readonly MultiplierStep[] {
    let steps = planned.steps[mask];
    if (steps === undefined) {
      steps = multiplierSteps(planned.hours, conditions, this.firmMultipliers);
      planned.steps[mask] = steps;
    }
    return steps;
  }
}
