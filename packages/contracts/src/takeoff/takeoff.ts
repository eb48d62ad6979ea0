import { z } from 'zod';
import { requiredText, text } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import { surfaceShape } from './shape';
import { DISTURBED_AREA_NOUN, type MoveInput, type RoomInput, type RoomUpdate, type SurfaceInput, TAKEOFF_LIMITS } from './takeoff-types';

const L = TAKEOFF_LIMITS;

const roomFields = {
  name: requiredText(L.roomNameMax, 'Enter the room name.'),
  isExterior: z.boolean({ error: 'Say whether this is outside.' }),
  notes: text(L.notesMax),
};
export const roomInput = requestSchema<RoomInput>()(
  z.strictObject({
    ...roomFields,
    isExterior: roomFields.isExterior.default(false),
    notes: roomFields.notes.default(''),
  }),
);
/** No defaults: zod 4 applies defaults inside .partial(), which would blank what was not sent. */
export const roomUpdate = requestSchema<RoomUpdate>()(z.strictObject(roomFields).partial());

const disturbedMessage = `Enter the ${DISTURBED_AREA_NOUN}, 0 or more, or leave it empty.`;
const surfaceFields = {
  name: requiredText(L.surfaceNameMax, 'Enter a name for the surface, like "North wall".'),
  shape: surfaceShape,
  disturbedPaintedArea: z
    .number({ error: disturbedMessage })
    .min(0, { error: disturbedMessage })
    .max(L.disturbedAreaMax, { error: disturbedMessage })
    .nullable(),
  notes: text(L.notesMax),
};
export const surfaceInput = z.strictObject({
  ...surfaceFields,
  disturbedPaintedArea: surfaceFields.disturbedPaintedArea.default(null),
  notes: surfaceFields.notes.default(''),
});
export const surfaceUpdate = z.strictObject(surfaceFields).partial();

const moveMessage = 'Enter the new place as a whole number, 0 or more.';
export const moveInput = requestSchema<MoveInput>()(
  z.strictObject({
    to: z.number({ error: moveMessage }).int({ error: moveMessage }).min(0, { error: moveMessage }),
  }),
);

// Parsed surfaces fit the plain request types the apps send; not the reverse only because the
// engine's shape holds its polygon corners as read-only arrays.
type Assignable<A, B> = [A] extends [B] ? true : false;
export const SURFACE_SCHEMAS_MATCH_TYPES: [
  Assignable<z.infer<typeof surfaceInput>, SurfaceInput>,
  Assignable<z.infer<typeof surfaceUpdate>, Partial<SurfaceInput>>,
] = [true, true];
