import { z } from 'zod';
import { PHOTO_CAPTION_MAX, type PhotoFields } from './photo-types';

/** The text fields sent beside an uploaded photo. */
export const photoFields = z.strictObject({
  caption: z
    .string()
    .trim()
    .max(PHOTO_CAPTION_MAX, { error: `Keep the caption under ${PHOTO_CAPTION_MAX} characters.` })
    .optional(),
}) satisfies z.ZodType<PhotoFields>;
