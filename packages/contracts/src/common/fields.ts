import { z } from 'zod';
import {
  DATE_YEAR_MAX,
  DATE_YEAR_MESSAGE,
  DATE_YEAR_MIN,
  ISO_DATE_PATTERN,
  MONEY_AMOUNT_PATTERN,
  YEAR_BUILT_MAX,
  YEAR_BUILT_MIN,
} from './field-limits';
import { CURSOR_MAX_LENGTH, PAGE_SIZE_DEFAULT, PAGE_SIZE_MAX } from './lists';

/** Trimmed text with a length cap; empty allowed unless `min` says otherwise. */
export const text = (max: number, label = 'This field') =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(max, { error: `Use at most ${max} characters.` });

export const requiredText = (max: number, missing: string) =>
  z
    .string({ error: missing })
    .trim()
    .min(1, { error: missing })
    .max(max, { error: `Use at most ${max} characters.` });

/** Money in API bodies is a decimal string ("1250.00"), never a float. */
export const moneyAmount = z
  .string({ error: 'Enter an amount, like 1250.00.' })
  .trim()
  // Two checks that never both fire (one message, saying why); neither aborts, so a form's own checks
  // across fields (margins, sums) still run and name their fields beside this one.
  .refine((v) => !v.startsWith('-'), { error: 'The amount cannot be negative.' })
  .refine((v) => v.startsWith('-') || MONEY_AMOUNT_PATTERN.test(v), { error: 'Enter an amount with at most two decimals, like 1250.00.' });

export const isoDate = z
  .string({ error: 'Enter a date.' })
  .regex(ISO_DATE_PATTERN, { error: 'Enter a date as YYYY-MM-DD.', abort: true })
  .refine((d) => Number(d.slice(0, 4)) >= DATE_YEAR_MIN && Number(d.slice(0, 4)) <= DATE_YEAR_MAX, {
    error: DATE_YEAR_MESSAGE,
    abort: true,
  })
  .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)) && new Date(`${d}T00:00:00Z`).toISOString().startsWith(d), {
    error: 'That date does not exist.',
  });

export const yearBuilt = z.coerce
  .number({ error: 'Enter a year like 1925.' })
  .int({ error: 'Enter a whole year like 1925.' })
  .min(YEAR_BUILT_MIN, { error: `Enter a year after ${YEAR_BUILT_MIN}.` })
  .max(YEAR_BUILT_MAX, { error: `Enter a year before ${YEAR_BUILT_MAX}.` });

export const uuid = (label = 'id') => z.uuid({ error: `Not a valid ${label}.` });

const pageSizeWords = `Use 1 to ${PAGE_SIZE_MAX}.`;

/** Keyset page: `after` is an opaque cursor from the previous page. */
export const pageQuery = {
  after: z.string().max(CURSOR_MAX_LENGTH).optional(),
  limit: z.coerce.number().int().min(1, { error: pageSizeWords }).max(PAGE_SIZE_MAX, { error: pageSizeWords }).default(PAGE_SIZE_DEFAULT),
};
