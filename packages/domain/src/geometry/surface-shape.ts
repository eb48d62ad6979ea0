/**
 * Every takeoff shape the estimator can measure. Dimensions are plain numbers in the
 * firm's length unit; `elevation` (optional) is the height of the shape's lowest edge above
 * the floor, so the top of the work can be known for scaffold and fall-protection cautions.
 */
export interface Opening {
  width: number;
  height: number;
  /** identical openings, default 1 */
  count?: number;
}

export type SurfaceShape =
  | { kind: 'walls'; perimeter: number; height: number; openings?: Opening[] }
  | { kind: 'gable'; base: number; height: number; elevation?: number }
  | { kind: 'trapezoid'; base1: number; base2: number; height: number; elevation?: number }
  | { kind: 'ceilingRect'; length: number; width: number; elevation?: number }
  | { kind: 'ceilingCircle'; radius: number; elevation?: number }
  | { kind: 'ceilingPolygon'; corners: ReadonlyArray<readonly [number, number]>; elevation?: number }
  | { kind: 'roundWalls'; radius: number; height: number; openings?: Opening[] }
  | { kind: 'curvedWall'; radius: number; angleDegrees: number; height: number; openings?: Opening[] }
  | { kind: 'cone'; radius: number; rise: number; elevation?: number }
  | { kind: 'pyramid'; sides: number; sideLength: number; rise: number; elevation?: number }
  | { kind: 'hemisphere'; radius: number; elevation?: number }
  | { kind: 'sphericalCap'; baseRadius: number; rise: number; elevation?: number }
  | { kind: 'sphericalCapFromSphere'; sphereRadius: number; rise: number; elevation?: number }
  | { kind: 'barrelVault'; radius: number; length: number; elevation?: number }
  | { kind: 'segmentalVault'; span: number; rise: number; length: number; elevation?: number }
  | { kind: 'groinVault'; side: number; elevation?: number }
  | { kind: 'cloisterVault'; side: number; elevation?: number }
  | { kind: 'coffers'; count: number; innerPerimeter: number; depth: number; panelArea: number; elevation?: number }
  | { kind: 'crownStraight'; length: number; elevation?: number }
  | { kind: 'crownCircular'; radius: number; elevation?: number }
  | { kind: 'beams'; count?: number; length: number; width: number; depth: number; measureBy?: 'faces' | 'length'; elevation?: number }
  | { kind: 'border'; length: number; elevation?: number };

export type SurfaceKind = SurfaceShape['kind'];

export interface TakeoffSettings {
  /** Openings smaller than this (in unit²) are not deducted; the cutting-in is real either way. */
  minDeductedOpeningArea: number;
  /**
   * Deduct each opening as saved even when it is taller or wider than its wall. Only for reading a
   * surface saved before such openings were refused, so its takeoff page still opens and it can be
   * corrected; a save and an estimate leave it unset and refuse them.
   */
  openingsAsSaved?: boolean;
}

export interface SurfaceMeasure {
  /** 'area' in unit², 'length' in unit (running items such as crown and borders) */
  measure: 'area' | 'length';
  /** net amount to finish: gross − deductions */
  quantity: number;
  gross: number;
  deductions: number;
  /** short, human-readable audit string, e.g. "2π·r·H − openings" */
  formula: string;
  isCeiling: boolean;
  isCurved: boolean;
  /** top of the work above the floor, when the inputs say so */
  topHeight: number | null;
}
