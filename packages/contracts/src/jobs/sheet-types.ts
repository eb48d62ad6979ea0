import type {
  CautionId,
  CautionItemKey,
  CautionWordKey,
  Coverage,
  Dilution,
  JurisdictionKey,
  LengthUnit,
  MixRecipe,
  PlanDay,
  ProductHazards,
  QuantityUnit,
} from '@layerbook/domain';
import type { WorkItemView } from '../billing/job-billing-types';
import type { PhotoView } from '../files/photo-types';
import type { Language, UnitSystem } from '../firms/firm-types';
import type { JobStatus } from './job';

/**
 * The crew's job sheet (GET /api/jobs/sheets, /api/jobs/:id/sheet; crew, office, owner). Everything a
 * crew needs on site and nothing about money: the server builds it from the accepted option's stored
 * result and a test walks every crew answer for money fields.
 */
export interface JobSheetSummary {
  readonly id: string;
  readonly title: string;
  /** street, town — where the crew goes */
  readonly siteAddress: string;
  readonly status: JobStatus;
  readonly startDate: string | null;
  readonly finishDate: string | null;
  readonly layersDone: number;
  readonly layersTotal: number;
}

/** A product as the crew handles it: its unit and the hazard flags from its data sheet. */
export interface SheetProduct {
  readonly id: string;
  readonly name: string;
  readonly unit: QuantityUnit;
  readonly hazards: ProductHazards;
}

/** One layer of a finish, in the order it goes on. */
export interface SheetLayer {
  readonly id: string;
  readonly name: string;
  readonly method: string;
  /** the product applied as is (null when `recipe` names the components) */
  readonly productId: string | null;
  readonly recipe: MixRecipe | null;
  readonly dilution: Dilution | null;
  readonly coats: number;
  readonly coverage: Coverage;
  /** per-coat coverage when the coats differ (a first coat on a porous wall goes less far); one per coat */
  readonly coatCoverages?: readonly Coverage[];
  /** share of the surface this layer covers, 0–1 */
  readonly coverageShare: number;
  /** calendar hours to wait after this layer before the next one on the same surface */
  readonly waitHoursAfter: number;
}

export interface SheetFinish {
  readonly id: string;
  readonly name: string;
  readonly layers: readonly SheetLayer[];
}

/** One layer on one surface: its work item (what a mark is made against) and its material need. */
export interface SheetSurfaceLayer {
  readonly layerId: string;
  readonly name: string;
  readonly workItemId: string | null;
  readonly doneOn: string | null;
  /** product need for this surface in base units (mL or g), per product (a quantity, never money) */
  readonly products: ReadonlyArray<{ readonly productId: string; readonly quantity: number }>;
  /** water in the mix, base units */
  readonly water: number;
}

export interface SheetSurface {
  readonly id: string;
  /** the approved change order that added this surface's work; null for the work sold */
  readonly changeOrder: number | null;
  readonly name: string;
  readonly finishId: string;
  /** 'area' in lengthUnit², 'length' in lengthUnit */
  readonly measure: 'area' | 'length';
  readonly quantity: number;
  readonly gross: number;
  readonly deductions: number;
  readonly formula: string;
  readonly isCeiling: boolean;
  readonly isCurved: boolean;
  readonly topHeight: number | null;
  readonly layers: readonly SheetSurfaceLayer[];
}

export interface SheetRoom {
  readonly id: string;
  readonly name: string;
  readonly surfaces: readonly SheetSurface[];
}

/**
 * One line of a caution by key: the apps show `cautions.<key>` with `params` (words from the shared
 * `cautions` area), or the English bullet at the same index when `key` is null (a line that is not
 * one of the engine's) or the key has no words yet.
 */
export interface SheetCautionLine {
  readonly key: CautionWordKey | null;
  readonly params: Readonly<Record<string, string>>;
  /**
   * a list whose entries have words of their own (each flammable product with its category and flash
   * point): translate each item, join them with ", " and use that as the list param (`products`)
   */
  readonly items?: ReadonlyArray<{ readonly key: CautionItemKey; readonly params: Readonly<Record<string, string>> }>;
}

/**
 * A caution the engine raised for this job (the accepted option's stored result, less the lines meant
 * for the office). English text as sent, and beside each text its key for translation — keys have no
 * area prefix: the apps read `cautions.<titleKey>`, `cautions.<lines[i].key>` and so on.
 */
export interface SheetCaution {
  readonly id: CautionId;
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  readonly jurisdiction: string;
  readonly standing: string;
  /** '<id>.title' */
  readonly titleKey: CautionWordKey;
  /** '<id>.rule' */
  readonly ruleKey: CautionWordKey;
  /** parallel to `bullets` */
  readonly lines: readonly SheetCautionLine[];
  /** the jurisdiction's sentences in order ('jurisdiction.usFederal' | 'jurisdiction.guidance', then 'jurisdiction.outsideUs') */
  readonly jurisdictionKeys: readonly JurisdictionKey[];
  readonly standingKey: 'standing';
}

/** An approved change order as the crew reads it: what changes in the work, never its price. */
export interface SheetChange {
  readonly number: number;
  readonly title: string;
  readonly description: string;
  /** the firm's day the client approved it */
  readonly approvedOn: string;
  /** priced from surfaces and a finish: which finish on which surfaces, with the measured quantity */
  readonly finishName: string | null;
  readonly surfaces: ReadonlyArray<{ readonly room: string; readonly surface: string; readonly quantity: string }>;
}

export interface JobSheet {
  readonly id: string;
  readonly title: string;
  readonly siteAddress: string;
  readonly status: JobStatus;
  readonly startDate: string | null;
  readonly finishDate: string | null;
  /** the firm's units: what the crew reads sizes in (mix cards show both) */
  readonly units: UnitSystem;
  /** the unit the stored sizes are in */
  readonly lengthUnit: LengthUnit;
  /** the firm's IANA time zone (day plan times are local to it) */
  readonly timeZone: string;
  readonly firmCountry: string;
  readonly rooms: readonly SheetRoom[];
  readonly finishes: readonly SheetFinish[];
  readonly products: readonly SheetProduct[];
  /** the dated day plan with drying waits */
  readonly dayPlan: readonly PlanDay[];
  readonly cautions: readonly SheetCaution[];
  /** change orders the client approved, oldest first: extra or less work the crew must know of (no money) */
  readonly changes: readonly SheetChange[];
  readonly workItems: readonly WorkItemView[];
  readonly photos: readonly JobPhotoView[];
  /** the language the sheet's English text was written in (always 'en'); the apps translate by id */
  readonly sourceLanguage: Language;
}

/** A progress photo: the shared photo view plus the work item it shows. */
export interface JobPhotoView extends PhotoView {
  readonly workItemId: string | null;
  /** whether the reader may delete it: owner and office any photo, a crew member the ones they took */
  readonly canDelete: boolean;
}

/** The text sent beside a progress photo (multipart fields `caption`, `workItemId`). */
export interface JobPhotoFields {
  readonly caption?: string;
  /** the layer on a surface the photo shows */
  readonly workItemId?: string;
}
