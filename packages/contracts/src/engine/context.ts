import type { FinishSystem, Product, SurfaceShape } from '@layerbook/domain';
import type { EstimatingSettings } from '../firms/estimating-types';

/** A measured room as the estimate needs it (from the site's takeoff). */
export interface EngineRoom {
  readonly id: string;
  readonly name: string;
  readonly isExterior: boolean;
  readonly surfaces: ReadonlyArray<{
    readonly id: string;
    readonly name: string;
    readonly shape: SurfaceShape;
    readonly disturbedPaintedArea: string | null;
  }>;
}

/** Everything an estimate is computed from, besides the office's choices. */
export interface EstimateContext {
  readonly settings: EstimatingSettings;
  readonly lengthUnit: 'ft' | 'm';
  readonly currency: string;
  /** the firm's country (ISO 3166-1 alpha-2); the engine's safety cautions say when US federal rules may not apply */
  readonly firmCountry?: string;
  readonly yearBuilt: number | null;
  readonly rooms: readonly EngineRoom[];
  readonly finishSystems: readonly FinishSystem[];
  readonly products: readonly Product[];
}
