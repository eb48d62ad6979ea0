import { requireNonNegative } from '../errors/input-checks';
import { type VolumeUnit, toBase } from './quantity-unit';

export interface KitchenVolume {
  /** e.g. "¾ cup", "2 tbsp", "≈ 11⅓ tbsp" */
  text: string;
  /** true when the fraction shown is rounded from the exact amount */
  isApproximate: boolean;
  unit: VolumeUnit;
  /** the amount shown, in `unit`, as a number (¾ → 0.75) */
  shown: number;
  /** metric alongside, e.g. "177.4 mL" or "1.42 L" */
  metric: string;
  /** exact amount kept for the record */
  millilitres: number;
}

/** Crews measure with gallon and quart cans, cups and spoons; fluid ounces and pints read poorly on a mix card. */
const LADDER: ReadonlyArray<{ unit: VolumeUnit; label: string; plural: string; minimum: number }> = [
  { unit: 'gallon', label: 'gal', plural: 'gal', minimum: 1 },
  { unit: 'quart', label: 'qt', plural: 'qt', minimum: 1 },
  { unit: 'cup', label: 'cup', plural: 'cups', minimum: 0.25 },
  { unit: 'tbsp', label: 'tbsp', plural: 'tbsp', minimum: 1 },
  { unit: 'tsp', label: 'tsp', plural: 'tsp', minimum: 0 },
];

const FRACTIONS: ReadonlyArray<{ value: number; glyph: string }> = [
  { value: 0, glyph: '' },
  { value: 1 / 8, glyph: '⅛' },
  { value: 1 / 4, glyph: '¼' },
  { value: 1 / 3, glyph: '⅓' },
  { value: 1 / 2, glyph: '½' },
  { value: 2 / 3, glyph: '⅔' },
  { value: 3 / 4, glyph: '¾' },
  { value: 1, glyph: '' },
];

const EXACT = 1e-9;
/** A rounded fraction within 2 % reads better in a larger unit than an exact one in a tiny unit (common practice, no source). */
const GOOD_ENOUGH = 0.02;

function nearestNice(value: number): { shown: number; whole: number; glyph: string } {
  const whole = Math.floor(value);
  let best = FRACTIONS[0];
  for (const f of FRACTIONS) {
    if (Math.abs(whole + f.value - value) < Math.abs(whole + best.value - value)) best = f;
  }
  const shownWhole = best.value === 1 ? whole + 1 : whole;
  return { shown: whole + best.value, whole: shownWhole, glyph: best.glyph };
}

export function formatMetricVolume(millilitres: number): string {
  if (millilitres >= 1000) return `${(millilitres / 1000).toFixed(2)} L`;
  if (millilitres < 10) return `${millilitres.toFixed(2)} mL`;
  return `${millilitres.toFixed(1)} mL`;
}

export function formatMetricMass(grams: number): string {
  if (grams >= 1000) return `${(grams / 1000).toFixed(2)} kg`;
  if (grams < 10) return `${grams.toFixed(2)} g`;
  return `${grams.toFixed(1)} g`;
}

/**
 * Shows a volume in the largest kitchen unit that lands on a common fraction
 * (⅛, ¼, ⅓, ½, ⅔, ¾), with metric alongside; exact amounts stay in `millilitres`.
 */
export function formatKitchenVolume(millilitres: number, field = 'millilitres'): KitchenVolume {
  requireNonNegative(millilitres, field, 'volume');
  type Candidate = { step: (typeof LADDER)[number]; nice: ReturnType<typeof nearestNice>; error: number };
  let chosen: Candidate | null = null;
  let closest: Candidate | null = null;
  for (const step of LADDER) {
    const value = millilitres / toBase(1, step.unit);
    if (value < step.minimum || value === 0) continue;
    const nice = nearestNice(value);
    const error = Math.abs(nice.shown - value) / value;
    const candidate = { step, nice, error };
    if (error <= EXACT) {
      chosen = candidate;
      break;
    }
    if (!closest || error < closest.error) closest = candidate;
    if (!chosen && error <= GOOD_ENOUGH) chosen = candidate;
  }
  const pick = chosen ?? closest;
  if (!pick) {
    return { text: '0 tsp', isApproximate: false, unit: 'tsp', shown: 0, metric: formatMetricVolume(0), millilitres };
  }
  const { step, nice, error } = pick;
  const number = nice.whole === 0 && nice.glyph ? nice.glyph : `${nice.whole}${nice.glyph}`;
  const unitLabel = nice.shown > 1 ? step.plural : step.label;
  const isApproximate = error > EXACT;
  return {
    text: `${isApproximate ? '≈ ' : ''}${number} ${unitLabel}`,
    isApproximate,
    unit: step.unit,
    shown: nice.shown,
    metric: formatMetricVolume(millilitres),
    millilitres,
  };
}
