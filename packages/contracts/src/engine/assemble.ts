import { percentShare, roomWallHeight, withCeilingElevation, type EstimateInput } from '@layerbook/domain';
import type { EstimateInputs } from '../proposals/estimate-types';
import type { EstimateContext } from './context';
import { toEngineSettings } from './settings';

/**
 * The engine input for one option (variant) of an estimate. The browser runs this on every
 * keystroke and the server on save, so both compute from exactly the same input.
 * Surfaces without a finish in this option are left out; rooms left empty are dropped. A ceiling
 * measured without its elevation starts at the room's wall height (all its walls, finished or not).
 */
export function assembleEstimateInput(context: EstimateContext, inputs: EstimateInputs, variantId: string): EstimateInput {
  const variant = inputs.variants.find((v) => v.id === variantId) ?? inputs.variants[0];
  const finishBySurface = new Map(variant.surfaces.map((s) => [s.surfaceId, s.finishSystemId]));
  const rooms = context.rooms
    .map((room) => ({ room, wallHeight: roomWallHeight(room.surfaces.map((s) => s.shape)) }))
    .map(({ room, wallHeight }) => ({
      id: room.id,
      name: room.name,
      isExterior: room.isExterior,
      surfaces: room.surfaces
        .filter((s) => finishBySurface.has(s.id))
        .map((s) => ({
          id: s.id,
          name: s.name,
          shape: withCeilingElevation(s.shape, wallHeight),
          finishSystemId: finishBySurface.get(s.id)!,
          ...(s.disturbedPaintedArea !== null ? { disturbedPaintedArea: Number(s.disturbedPaintedArea) } : {}),
        })),
    }))
    .filter((room) => room.surfaces.length > 0);
  const usedSystems = new Set(finishBySurface.values());
  return {
    settings: toEngineSettings(context.settings, context.lengthUnit, context.currency),
    ...(context.firmCountry !== undefined ? { firmCountry: context.firmCountry } : {}),
    startDate: inputs.startDate,
    property: { ...(context.yearBuilt !== null ? { yearBuilt: context.yearBuilt } : {}), isOccupied: inputs.isOccupied },
    rooms,
    finishSystems: context.finishSystems.filter((f) => usedSystems.has(f.id)),
    products: [...context.products],
    equipment: inputs.equipment,
    subcontracts: inputs.subcontracts,
    sundries: inputs.sundries,
    ...(inputs.discount
      ? {
          discount:
            inputs.discount.kind === 'percent'
              ? { kind: 'share' as const, share: percentShare(inputs.discount.percent) }
              : { kind: 'amount' as const, amount: inputs.discount.amount },
        }
      : {}),
    options: inputs.addOns.map((a) => ({ id: a.id, label: a.label, labourHours: a.labourHours, materialsCost: a.materialsCost })),
    perAreaRates: inputs.perAreaRates,
  };
}
