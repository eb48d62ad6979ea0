import { assembleEstimateInput } from '@layerbook/contracts/engine';
import type { EstimateContext, EstimateInputs } from '@layerbook/contracts/types';
import { DomainInputError, computeEstimate, toResultJson, type EstimateResultJson } from '@layerbook/domain';
import { type FieldTarget, engineTarget } from './field-targets';

export type LiveAttempt =
  | { readonly kind: 'ok'; readonly variantId: string; readonly result: EstimateResultJson }
  /** the engine refused: its message, and the field it names */
  | { readonly kind: 'refused'; readonly variantId: string; readonly message: string; readonly target: FieldTarget }
  /** nothing to compute yet, or the form itself has errors */
  | { readonly kind: 'waiting'; readonly variantId: string; readonly message: string };

/**
 * One option computed in the browser with the same engine and the same input assembly the
 * server uses on save, so what the office sees while typing is what gets stored.
 */
export function computeLive(context: EstimateContext, inputs: EstimateInputs, variantId: string): LiveAttempt {
  const variant = inputs.variants.find((v) => v.id === variantId);
  if (!variant) return { kind: 'waiting', variantId, message: 'Choose an option.' };
  if (variant.surfaces.length === 0) {
    return { kind: 'waiting', variantId, message: 'Choose a finish for at least one surface to see numbers.' };
  }
  const input = assembleEstimateInput(context, inputs, variantId);
  try {
    return { kind: 'ok', variantId, result: toResultJson(computeEstimate(input)) };
  } catch (error) {
    if (error instanceof DomainInputError) {
      return { kind: 'refused', variantId, message: error.message, target: engineTarget(error.field, input) };
    }
    throw error;
  }
}
