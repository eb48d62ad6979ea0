import { z } from 'zod';
import { requestSchema } from '../common/schema-check';
import { uuid } from '../common/fields';
import { photoFields } from '../files/photo-fields';
import type { JobPhotoFields } from './sheet-types';

/**
 * The text sent beside a progress photo (multipart, POST /api/jobs/:id/photos): the caption and,
 * optionally, the work item (a layer on a surface) the photo shows. A form sends an empty field as
 * '', read here as no work item.
 */
export const jobPhotoFields = requestSchema<JobPhotoFields>()(
  photoFields.extend({
    workItemId: z.preprocess((v) => (v === '' ? undefined : v), uuid('work item id').optional()),
  }),
);
