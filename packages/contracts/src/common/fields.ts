import { z } from 'zod';

/** Trimmed text with a length cap; empty allowed unless `min` says otherwise. */
export const text = (max: number, label = 'This field') =>
  z.string({ error: `${label} must be text.` }).trim().max(max, { error: `Use at most ${max} characters.` });

export const requiredText = (max: number, missing: string) =>
  z.string({ error: missing }).trim().min(1, { error: missing }).max(max, { error: `Use at most ${max} characters.` });

/** Money in API bodies is a decimal string ("1250.00"), never a float. */
export const moneyAmount = z
  .string({ error: 'Enter an amount, like 1250.00.' })
  .trim()
  .regex(/^\d{1,12}(\.\d{1,2})?$/, { error: 'Enter an amount with at most two decimals, like 1250.00.' });

export const isoDate = z
  .string({ error: 'Enter a date.' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'Enter a date as YYYY-MM-DD.' })
  .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)) && new Date(`${d}T00:00:00Z`).toISOString().startsWith(d), {
    error: 'That date does not exist.',
  });

export const yearBuilt = z.coerce
  .number({ error: 'Enter a year like 1925.' })
  .int({ error: 'Enter a whole year like 1925.' })
  .min(1600, { error: 'Enter a year after 1600.' })
  .max(2100, { error: 'Enter a year before 2100.' });

export const uuid = (label = 'id') => z.uuid({ error: `Not a valid ${label}.` });

/** Keyset page: `after` is an opaque cursor from the previous page. */
export const pageQuery = {
  after: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1, { error: 'Use 1 to 100.' }).max(100, { error: 'Use 1 to 100.' }).default(50),
};

export interface Page<T> {
  readonly items: readonly T[];
  readonly nextCursor: string | null;
}
