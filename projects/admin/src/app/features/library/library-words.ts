import {
  APPLICATION_METHOD_LABELS,
  APPLICATION_METHODS,
  AREA_UNIT_SYMBOLS,
  DILUTION_CONVENTION_LABELS,
  DILUTION_CONVENTIONS,
  FLAMMABLE_FLASH_MAX_C,
  LENGTH_UNITS,
  MASS_UNITS,
  MULTIPLIER_LABELS,
  MULTIPLIER_NAMES,
  PRODUCT_KIND_LABELS,
  PRODUCT_KINDS,
  QUANTITY_UNIT_LABELS,
  VOLUME_UNITS,
  type ProductHazardsInput,
} from '@layerbook/contracts/types';
import { flammableClass } from '@layerbook/domain';

/** A pick-list from one of the contract's lists and its labels, in the list's order. */
function choices<V extends string>(
  values: readonly V[],
  labels: Readonly<Record<V, string>>,
): readonly { readonly value: V; readonly label: string }[] {
  return values.map((value) => ({ value, label: labels[value] }));
}

export const PRODUCT_KIND_CHOICES = choices(PRODUCT_KINDS, PRODUCT_KIND_LABELS);
export const UNIT_GROUPS = [
  { label: 'By volume', units: choices(VOLUME_UNITS, QUANTITY_UNIT_LABELS) },
  { label: 'By weight', units: choices(MASS_UNITS, QUANTITY_UNIT_LABELS) },
] as const;
/** Surfaces are counted in a length unit squared (running length for trim, but the unit is the same). */
export const AREA_UNIT_CHOICES = choices(LENGTH_UNITS, AREA_UNIT_SYMBOLS);
export const METHOD_CHOICES = choices(APPLICATION_METHODS, APPLICATION_METHOD_LABELS);
export const DILUTION_CHOICES = DILUTION_CONVENTIONS.map((value) => ({ value, ...DILUTION_CONVENTION_LABELS[value] }));
export const MULTIPLIER_CHOICES = choices(MULTIPLIER_NAMES, MULTIPLIER_LABELS);

/** Waits the trade names most often (DOMAIN.md §2.7): set, recoat, overnight, a day, a short cure. */
export const WAIT_PICKS = [
  { hours: 1, label: '1 h' },
  { hours: 4, label: '4 h' },
  { hours: 16, label: 'overnight (16 h)' },
  { hours: 24, label: '24 h' },
  { hours: 72, label: '3 days' },
] as const;

export interface HazardWord {
  readonly icon: string;
  readonly text: string;
}

/** Hazard flags in words with an icon (never colour alone); flammable as 29 CFR 1910.106(a)(19) defines it. */
export function hazardWords(h: ProductHazardsInput): HazardWord[] {
  const words: HazardWord[] = [];
  const flammable = flammableClass(h.flashPointC, h.boilingPointC);
  if (flammable) {
    words.push({ icon: 'local_fire_department', text: `Flammable, ${flammable.label} (flash point ${h.flashPointC}\u00a0°C)` });
  }
  if (h.containsDryingOil) words.push({ icon: 'whatshot', text: 'Oily rags self-heat (drying oil)' });
  if (h.isLime) words.push({ icon: 'science', text: 'Caustic (lime)' });
  if (h.containsSilica) words.push({ icon: 'masks', text: 'Contains silica' });
  return words;
}

const isNumber = (n: number | null | undefined): n is number => typeof n === 'number' && Number.isFinite(n);

/** Shown beside the flash point as it is typed, so the rule is visible rather than hidden in the server. */
export function flammableNote(flashPointC: number | null | undefined, boilingPointC?: number | null): string {
  if (!isNumber(flashPointC)) {
    return `Leave empty if it does not burn. At or below ${FLAMMABLE_FLASH_MAX_C}\u00a0°C it counts as flammable (29 CFR 1910.106(a)(19)).`;
  }
  const flammable = flammableClass(flashPointC, isNumber(boilingPointC) ? boilingPointC : undefined);
  return flammable
    ? `Flammable, ${flammable.label}: ${flashPointC}\u00a0°C is at or below ${FLAMMABLE_FLASH_MAX_C}\u00a0°C (29 CFR 1910.106(a)(19)). Crew sheets will carry the fire cautions.`
    : `Above ${FLAMMABLE_FLASH_MAX_C}\u00a0°C, so not a flammable liquid under 29 CFR 1910.106(a)(19); it can still burn. Keep it away from flames.`;
}
