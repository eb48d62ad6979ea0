import { requireFiniteNumber } from '../errors/input-checks';

/** The four categories of a flammable liquid, 29 CFR 1910.106(a)(19)(i)–(iv). */
export type FlammableCategory = 1 | 2 | 3 | 4;

/** 29 CFR 1910.106(a)(19): a flammable liquid has a flash point at or below 93 °C (199.4 °F). */
export const FLAMMABLE_FLASH_MAX_C = 93;
/** 29 CFR 1910.106(a)(19)(i)–(ii): categories 1 and 2 have a flash point below 23 °C (73.4 °F). */
export const CATEGORY_1_2_FLASH_BELOW_C = 23;
/** 29 CFR 1910.106(a)(19)(iii): category 3 has a flash point at or above 23 °C and at or below 60 °C (140 °F). */
export const CATEGORY_3_FLASH_MAX_C = 60;
/** 29 CFR 1910.106(a)(19)(i): category 1 boils at or below 35 °C (95 °F); category 2 above it. */
export const CATEGORY_1_BOILING_MAX_C = 35;

export interface FlammableClass {
  /** one category, or [1, 2] when the boiling point is unknown below 23 °C */
  categories: FlammableCategory[];
  /** "category 3", "category 1 or 2" */
  label: string;
}

/**
 * The flammable-liquid category of a product from its closed-cup flash point and, below 23 °C, its
 * initial boiling point (29 CFR 1910.106(a)(19)); null when it is not a flammable liquid under that
 * rule (flash point above 93 °C, or none given).
 */
export function flammableClass(flashPointC: number | undefined, boilingPointC?: number, field = 'flashPointC'): FlammableClass | null {
  if (flashPointC === undefined) return null;
  requireFiniteNumber(flashPointC, field, 'flash point');
  if (boilingPointC !== undefined) requireFiniteNumber(boilingPointC, 'boilingPointC', 'boiling point');
  if (flashPointC > FLAMMABLE_FLASH_MAX_C) return null;
  let categories: FlammableCategory[];
  if (flashPointC < CATEGORY_1_2_FLASH_BELOW_C) {
    if (boilingPointC === undefined) categories = [1, 2];
    else categories = boilingPointC <= CATEGORY_1_BOILING_MAX_C ? [1] : [2];
  } else {
    categories = flashPointC <= CATEGORY_3_FLASH_MAX_C ? [3] : [4];
  }
  return { categories, label: `category ${categories.join(' or ')}` };
}
