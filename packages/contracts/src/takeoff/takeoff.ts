import { z } from 'zod';
import type { LengthUnit, SurfaceMeasure } from '@layerbook/domain';
import { requiredText, text } from '../common/fields';
import { surfaceShape, type SurfaceShapeInput } from './shape';

const roomFields = {
  name: requiredText(120, 'Enter the room name.'),
  isExterior: z.boolean({ error: 'Say whether this is outside.' }),
  notes: text(2000),
};
export const roomInput = z.strictObject({
  ...roomFields,
  isExterior: roomFields.isExterior.default(false),
  notes: roomFields.notes.default(''),
});
export type RoomInput = z.infer<typeof roomInput>;
/** No defaults: zod 4 applies defaults inside .partial(), which would blank what was not sent. */
export const roomUpdate = z.strictObject(roomFields).partial();
export type RoomUpdate = z.infer<typeof roomUpdate>;

const disturbedMessage = 'Enter the painted area the prep disturbs, 0 or more, or leave it empty.';
const surfaceFields = {
  name: requiredText(120, 'Enter a name for the surface, like "North wall".'),
  shape: surfaceShape,
  /**
   * Painted area the prep disturbs (sanding, scraping, removing trim), in the length unit squared.
   * Drives the lead-safe reminder for older buildings (40 CFR 745.83 minor-repair limits). Null: none or not known.
   */
  disturbedPaintedArea: z.number({ error: disturbedMessage }).min(0, { error: disturbedMessage }).max(1_000_000, { error: disturbedMessage }).nullable(),
  notes: text(2000),
};
export const surfaceInput = z.strictObject({
  ...surfaceFields,
  disturbedPaintedArea: surfaceFields.disturbedPaintedArea.default(null),
  notes: surfaceFields.notes.default(''),
});
export type SurfaceInput = z.infer<typeof surfaceInput>;
export const surfaceUpdate = z.strictObject(surfaceFields).partial();
export type SurfaceUpdate = z.infer<typeof surfaceUpdate>;

/** Moves a room or surface to a place in its list (0 = first); the rest close up around it. */
export const moveInput = z.strictObject({
  to: z.number({ error: 'Enter the new place as a whole number, 0 or more.' }).int({ error: 'Enter the new place as a whole number, 0 or more.' }).min(0, { error: 'Enter the new place as a whole number, 0 or more.' }),
});
export type MoveInput = z.infer<typeof moveInput>;

export type TakeoffLengthUnit = Extract<LengthUnit, 'ft' | 'm'>;

export interface TakeoffTotals {
  /** net area in the view's length unit squared */
  readonly area: number;
  /** running length (crown, borders, beams by length) in the view's length unit */
  readonly length: number;
}

export interface SurfaceView {
  readonly id: string;
  readonly roomId: string;
  readonly name: string;
  readonly position: number;
  /** exactly as measured, in `lengthUnit` */
  readonly shape: SurfaceShapeInput;
  /** the firm's unit when this surface was saved */
  readonly lengthUnit: TakeoffLengthUnit;
  readonly disturbedPaintedArea: number | null;
  readonly notes: string;
  /** computed by the server from `shape` in `lengthUnit` */
  readonly measure: SurfaceMeasure;
}

export interface RoomView {
  readonly id: string;
  readonly siteId: string;
  readonly name: string;
  readonly position: number;
  readonly isExterior: boolean;
  readonly notes: string;
  readonly surfaces: readonly SurfaceView[];
  /** in the takeoff's `lengthUnit` (surfaces saved in another unit are converted) */
  readonly totals: TakeoffTotals;
}

export interface TakeoffSite {
  readonly id: string;
  readonly clientId: string;
  readonly clientName: string;
  readonly label: string;
  readonly addressLine1: string;
  readonly city: string;
  readonly yearBuilt: number | null;
  /** null when the year built is not known */
  readonly isPre1978: boolean | null;
  readonly accessNotes: string;
}

export interface TakeoffView {
  readonly site: TakeoffSite;
  /** the firm's unit now: new surfaces are measured in it, totals are given in it */
  readonly lengthUnit: TakeoffLengthUnit;
  readonly rooms: readonly RoomView[];
  readonly totals: TakeoffTotals;
}
