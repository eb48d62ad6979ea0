import {
  APPLICATION_METHODS,
  AREA_UNIT_SYMBOLS,
  DILUTION_CONVENTIONS,
  FLAMMABLE_FLASH_MAX_C,
  LENGTH_UNITS,
  MASS_UNITS,
  MULTIPLIER_NAMES,
  PRODUCT_KINDS,
  VOLUME_UNITS,
  type ProductHazardsInput,
} from '@layerbook/contracts/types';
import { flammableClass } from '@layerbook/domain';
import { numberFormat } from '../../../../../shared/i18n/format/intl-cache';

/** Words to show: a key of the library's words (`library.…`) and its params, for `| translate: w.params`. */
export interface Words {
  readonly key: string;
  readonly params?: Readonly<Record<string, string | number>>;
}

/** A pick-list from one of the contract's lists, each value named by a key of the library's words. */
function choices<V extends string>(values: readonly V[], group: string): readonly { readonly value: V; readonly key: string }[] {
  return values.map((value) => ({ value, key: `library.${group}.${value}` }));
}

export const PRODUCT_KIND_CHOICES = choices(PRODUCT_KINDS, 'kinds');
export const UNIT_GROUPS = [
  { key: 'library.unitGroups.volume', units: choices(VOLUME_UNITS, 'units') },
  { key: 'library.unitGroups.weight', units: choices(MASS_UNITS, 'units') },
] as const;
/** Surfaces are counted in a length unit squared (running length for trim, but the unit is the same); symbols read alike in both languages. */
export const AREA_UNIT_CHOICES = LENGTH_UNITS.map((value) => ({ value, symbol: AREA_UNIT_SYMBOLS[value] }));
export const METHOD_CHOICES = choices(APPLICATION_METHODS, 'methods');
export const DILUTION_CHOICES = DILUTION_CONVENTIONS.map((value) => ({
  value,
  key: `library.dilutions.${value}.label`,
  explainKey: `library.dilutions.${value}.explain`,
}));
export const MULTIPLIER_CHOICES = choices(MULTIPLIER_NAMES, 'multipliers');

/** Waits the trade names most often (DOMAIN.md §2.7): set, recoat, overnight, a day, a short cure. */
export const WAIT_PICKS = [
  { hours: 1, key: 'library.waitPicks.h1' },
  { hours: 4, key: 'library.waitPicks.h4' },
  { hours: 16, key: 'library.waitPicks.overnight' },
  { hours: 24, key: 'library.waitPicks.h24' },
  { hours: 72, key: 'library.waitPicks.days3' },
] as const;

/** A number in the reader's language, at most two decimals ("6.5" / "6,5"). */
export function numberText(n: number, locale: string): string {
  return numberFormat(locale, { maximumFractionDigits: 2 }).format(n);
}

/** A layer's wait, as the domain's waitText words it: "no wait", "16 h", "72 h (3 days)", "100 h (4 days 4 h)". */
export function waitWords(hours: number, locale: string): Words {
  if (hours === 0) return { key: 'library.wait.none' };
  const h = numberText(hours, locale);
  if (hours < 48) return { key: 'library.wait.hours', params: { hours: h } };
  const days = Math.floor(hours / 24);
  const rest = Number((hours - days * 24).toFixed(2));
  return rest
    ? { key: 'library.wait.daysHours', params: { hours: h, days, rest: numberText(rest, locale) } }
    : { key: 'library.wait.days', params: { hours: h, days } };
}

export interface HazardWord extends Words {
  readonly icon: string;
}

/** "category 3" or "category 1 or 2", as params for the words that name it. */
function categoryParams(categories: readonly number[]): { key: 'One' | 'Two'; params: Record<string, number> } {
  const [first = 0, second] = categories;
  return second === undefined ? { key: 'One', params: { category: first } } : { key: 'Two', params: { first, second } };
}

/** Hazard flags in words with an icon (never colour alone); flammable as 29 CFR 1910.106(a)(19) defines it. */
export function hazardWords(h: ProductHazardsInput, locale: string): HazardWord[] {
  const words: HazardWord[] = [];
  const flammable = flammableClass(h.flashPointC, h.boilingPointC);
  if (flammable && h.flashPointC !== undefined) {
    const c = categoryParams(flammable.categories);
    words.push({
      icon: 'local_fire_department',
      key: `library.hazards.flammable${c.key}`,
      params: { ...c.params, flash: numberText(h.flashPointC, locale) },
    });
  }
  if (h.containsDryingOil) words.push({ icon: 'whatshot', key: 'library.hazards.dryingOil' });
  if (h.isLime) words.push({ icon: 'science', key: 'library.hazards.lime' });
  if (h.containsSilica) words.push({ icon: 'masks', key: 'library.hazards.silica' });
  return words;
}

const isNumber = (n: number | null | undefined): n is number => typeof n === 'number' && Number.isFinite(n);

/** Shown beside the flash point as it is typed, so the rule is visible rather than hidden in the server. */
export function flammableNote(flashPointC: number | null | undefined, boilingPointC: number | null | undefined, locale: string): Words {
  const max = numberText(FLAMMABLE_FLASH_MAX_C, locale);
  if (!isNumber(flashPointC)) return { key: 'library.flammableNote.empty', params: { max } };
  const flammable = flammableClass(flashPointC, isNumber(boilingPointC) ? boilingPointC : undefined);
  if (!flammable) return { key: 'library.flammableNote.notFlammable', params: { max } };
  const c = categoryParams(flammable.categories);
  return { key: `library.flammableNote.flammable${c.key}`, params: { ...c.params, flash: numberText(flashPointC, locale), max } };
}
