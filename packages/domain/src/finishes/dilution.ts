import { DomainInputError } from '../errors/domain-input-error';
import { requireFiniteNumber } from '../errors/input-checks';
import type { Dilution } from './finish-system';

export function validateDilution(d: Dilution, field: string): Dilution {
  requireFiniteNumber(d.share, `${field}.share`, 'dilution');
  if (d.share < 0) throw new DomainInputError(`${field}.share`, 'The dilution cannot be negative.');
  if (d.share >= 1) {
    throw new DomainInputError(`${field}.share`, 'A dilution of 100 % or more leaves no product; enter it as a share below 1.');
  }
  if (d.convention !== 'ofConcentrate' && d.convention !== 'ofMix') {
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
