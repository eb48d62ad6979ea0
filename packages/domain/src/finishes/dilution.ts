import { DomainInputError } from '../errors/domain-input-error';
import { requireFiniteNumber } from '../errors/input-checks';
import type { Dilution } from './finish-system';

/**
 * Most water a layer takes as a share of the concentrate: 10 parts water to 1 part product (1000 %).
 * Washes of 1:1 and 2:1 (100 %, 200 %) are ordinary; past 10:1 it is surely a typo (common practice, no source).
 */
export const DILUTION_OF_CONCENTRATE_MAX = 10;

export function validateDilution(d: Dilution, field: string): Dilution {
  requireFiniteNumber(d.share, `${field}.share`, 'dilution');
  if (d.share < 0) throw new DomainInputError(`${field}.share`, 'The dilution cannot be negative.');
  if (d.convention === 'ofConcentrate') {
    if (d.share > DILUTION_OF_CONCENTRATE_MAX) {
      throw new DomainInputError(
        `${field}.share`,
        `Water as a share of the product is at most ${DILUTION_OF_CONCENTRATE_MAX * 100} % (${DILUTION_OF_CONCENTRATE_MAX} parts water to 1).`,
      );
    }
  } else if (d.convention === 'ofMix') {
    if (d.share >= 1) {
      throw new DomainInputError(`${field}.share`, 'Water as a share of the final mix must be under 100 %, or no product is left.');
    }
  } else {
    throw new DomainInputError(`${field}.convention`, 'Say whether the water is a share of the concentrate or of the final mix.');
  }
  return d;
}

/** Share of the final mix that is concentrate (product as bought). */
export function concentrateShare(d: Dilution | undefined, field = 'dilution'): number {
  if (!d) return 1;
  validateDilution(d, field);
  return d.convention === 'ofConcentrate' ? 1 / (1 + d.share) : 1 - d.share;
}

/** Splits an amount of final mix into concentrate and water. */
export function splitDilutedMix(mix: number, d: Dilution | undefined, field = 'dilution'): { concentrate: number; water: number } {
  const concentrate = mix * concentrateShare(d, field);
  return { concentrate, water: mix - concentrate };
}
