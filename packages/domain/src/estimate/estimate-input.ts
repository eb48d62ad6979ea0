import type { IsoDate } from '../calendar/local-date';
import type { FinishSystem, LabourMultipliers, Product } from '../finishes/finish-system';
import type { SurfaceShape } from '../geometry/surface-shape';
import type { MoneyInput } from '../money/money';
import type { OverheadProfitRule } from '../pricing/overhead-profit';
import type { CostLine, Discount } from '../pricing/price-job';
import type { RoundingRule } from '../pricing/price-rounding';
import type { Ratio } from '../pricing/ratio';
import type { TaxRule } from '../pricing/sales-tax';
import type { WorkCalendar } from '../schedule/work-calendar';
import type { LengthUnit } from '../units/length';

/** The firm's settings that shape every estimate. Lengths are in `lengthUnit`. */
export interface FirmSettings {
  currency: string;
  lengthUnit: LengthUnit;
  /** openings smaller than this (unit²) are not deducted */
  minDeductedOpeningArea: number;
  /** burdened rate per crew-hour */
  labourRate: MoneyInput;
  materialsMarkup: Ratio;
  overheadProfit: OverheadProfitRule;
  minimumCharge?: MoneyInput;
  tax: TaxRule;
  rounding: RoundingRule;
  calendar: WorkCalendar;
  crewSize: number;
  setupHours: number;
  cleanupHours: number;
  /** default labour multipliers; a layer may override any of them */
  multipliers: LabourMultipliers;
  /** work whose top is above this gets the height multiplier */
  scaffoldHeight: number;
  /** how far a worker reaches above where they stand, to find the standing level for safety cautions */
  workingReach: number;
}

export interface EstimateSurface {
  id: string;
  name: string;
  shape: SurfaceShape;
  finishSystemId: string;
  /** painted area the prep disturbs (sanding, scraping, removing trim), unit² */
  disturbedPaintedArea?: number;
}

export interface EstimateRoom {
  id: string;
  name: string;
  isExterior?: boolean;
  surfaces: EstimateSurface[];
}

/** An option or alternate, priced separately with the firm's method (no minimum charge). */
export interface EstimateOption {
  id: string;
  label: string;
  labourHours: number;
  materialsCost: MoneyInput;
  equipment?: CostLine[];
  subcontracts?: CostLine[];
  sundries?: CostLine[];
}

export interface EstimateInput {
  settings: FirmSettings;
  /** the firm's country (ISO 3166-1 alpha-2): safety cautions cite US federal rules and say so */
  firmCountry?: string;
  /** first working day is this date or the next working day after it */
  startDate: IsoDate;
  property?: { yearBuilt?: number; isOccupied?: boolean };
  rooms: EstimateRoom[];
  finishSystems: FinishSystem[];
  products: Product[];
  equipment?: CostLine[];
  subcontracts?: CostLine[];
  sundries?: CostLine[];
  discount?: Discount;
  options?: EstimateOption[];
  /** price per unit² (or per unit of length) by finish system id, for the per-area check */
  perAreaRates?: Readonly<Record<string, MoneyInput>>;
}
