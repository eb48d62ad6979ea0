import { z } from 'zod';
import { pageQuery, requiredText, text, uuid } from '../common/fields';
import {
  SAMPLE_COMMENT_MAX,
  SAMPLE_LABEL_MAX,
  SAMPLE_NOTES_MAX,
  type SampleBoardCreate,
  type SampleBoardListQuery,
  type SampleBoardUpdate,
  type SampleChangeRequest,
} from './sample-types';

const label = requiredText(SAMPLE_LABEL_MAX, 'Give the board a label, like "Stair hall, board A".');
const notes = text(SAMPLE_NOTES_MAX, 'Notes');

export const sampleBoardInput = z.strictObject({
  clientId: uuid('client'),
  siteId: uuid('site').optional(),
  estimateId: uuid('estimate').optional(),
  label,
  finishSystemId: uuid('finish system').optional(),
  notes: notes.default(''),
}) satisfies z.ZodType<SampleBoardCreate>;
/** As the server reads it: notes always present (empty when left out). */
export type SampleBoardInput = z.infer<typeof sampleBoardInput>;

/** No defaults: a partial update changes only what it names. The finish can be chosen again while a draft. */
export const sampleBoardUpdate = z
  .strictObject({ label, notes, finishSystemId: uuid('finish system').nullable() })
  .partial() satisfies z.ZodType<SampleBoardUpdate>;

export const sampleBoardListQuery = z.strictObject({
  clientId: uuid('client').optional(),
  siteId: uuid('site').optional(),
  ...pageQuery,
}) satisfies z.ZodType<SampleBoardListQuery>;
/** As the server reads it: the page size always present. */
export type SampleBoardListParams = z.infer<typeof sampleBoardListQuery>;

export const sampleChangeRequest = z.strictObject({
  comment: requiredText(SAMPLE_COMMENT_MAX, 'Tell us what you would like changed.'),
}) satisfies z.ZodType<SampleChangeRequest>;
