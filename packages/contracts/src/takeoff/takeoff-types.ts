import type { Caution, LengthUnit, SurfaceMeasure, SurfaceShape } from '@layerbook/domain';

/*
 * The takeoff's limits, request bodies and answers, free of zod so the apps can import them
 * (`@layerbook/contracts/types`); the schemas in takeoff.ts are checked against these types.
 */

export const TAKEOFF_LIMITS = {
  roomNameMax: 120,
  surfaceNameMax: 120,
  notesMax: 2000,
  /** in the length unit squared; far beyond any surface */
  disturbedAreaMax: 1_000_000,
} as const;

/** Painted area the prep disturbs: the noun its messages use. */
export const DISTURBED_AREA_NOUN = 'painted area the prep disturbs';

/** A disturbed painted area is kept to hundredths (of a ft² or m²): half of one is the slack of that rounding. */
const KEPT_HALF_HUNDREDTH = 0.005;

/**
 * Whether a disturbed painted area is more than the surface it is on (`gross`, the same unit
 * squared). The whole surface as kept may read up to half a hundredth over its exact area (a fully
 * sanded 50 ft² ceiling goes metric as 4.65 m² of 4.645152 m²), and that is not more than the surface.
 */
export function isMoreThanSurface(disturbed: number, gross: number): boolean {
  return disturbed > gross + KEPT_HALF_HUNDREDTH;
}

/** Takeoffs are measured in the firm's unit system: feet or metres. */
export const TAKEOFF_LENGTH_UNITS = ['ft', 'm'] as const satisfies readonly LengthUnit[];
export type TakeoffLengthUnit = (typeof TAKEOFF_LENGTH_UNITS)[number];

/** A surface is stored in exactly the engine's shape. */
export type SurfaceShapeInput = SurfaceShape;
export type SurfaceKindInput = SurfaceShape['kind'];

export interface RoomInput {
  name: string;
  isExterior: boolean;
  notes: string;
}
/** A partial update changes only what it names. */
export type RoomUpdate = Partial<RoomInput>;

export interface SurfaceInput {
  name: string;
  shape: SurfaceShapeInput;
  /**
   * Painted area the prep disturbs (sanding, scraping, removing trim), in the length unit squared.
   * Drives the lead-safe reminder for older buildings (40 CFR 745.83 minor-repair limits). Null: none or not known.
   */
  disturbedPaintedArea: number | null;
  notes: string;
}
export type SurfaceUpdate = Partial<SurfaceInput>;

/** Moves a room or surface to a place in its list (0 = first); the rest close up around it. */
export interface MoveInput {
  to: number;
}

export interface TakeoffTotals {
  /** net area in the view's length unit squared */
  readonly area: number;
  /** running length (crown, borders, beams by length) in the view's length unit */
  readonly length: number;
  /** painted area the prep disturbs, in the view's length unit squared */
  readonly disturbedPaintedArea: number;
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
  /** the firm's smallest deducted opening, in lengthUnit² (an estimating setting): smaller openings stay in the area, as the estimate prices them */
  readonly minDeductedOpeningArea: number;
  readonly rooms: readonly RoomView[];
  readonly totals: TakeoffTotals;
  /**
   * The lead-safe reminder once the measurements show enough disturbed paint in a building from
   * before 1978 (40 CFR 745.83 minor-repair limits); null otherwise. A building whose year is not
   * known counts as before 1978 while paint is disturbed, as in the estimate, the proposal and the
   * crew's sheet, and the reminder then asks for the year first.
   */
  readonly leadCaution: Caution | null;
}
