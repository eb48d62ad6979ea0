import { z } from 'zod';
import { moneyAmount, requiredText, text } from '../common/fields';
import { isMassUnit, numberField, quantityUnit } from './units';

export const PRODUCT_KINDS = ['primer', 'paint', 'plaster', 'lime', 'glaze', 'medium', 'colorant', 'sealer', 'wax', 'solvent', 'other'] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

/** 29 CFR 1910.106(a)(19): a liquid with a flash point below 73.4 °F (23 °C) counts as flammable (categories 1 and 2). */
export const FLAMMABLE_BELOW_C = 23;

export const containerInput = z.strictObject({
  label: requiredText(40, 'Name the container, like "1 gal" or "20 kg pail".'),
  size: numberField('Enter the container size as a number.').positive({ error: 'The container size must be more than zero.' }),
  unit: quantityUnit,
  price: moneyAmount,
});
export type ContainerInput = z.infer<typeof containerInput>;

export const productHazards = z.strictObject({
  /** closed-cup flash point from the SDS; leave out when the product does not burn */
  flashPointC: numberField('Enter the flash point in °C as a number.')
    .min(-100, { error: 'Check the flash point: it should be between −100 and 400 °C.' })
    .max(400, { error: 'Check the flash point: it should be between −100 and 400 °C.' })
    .optional(),
  isLime: z.boolean({ error: 'Say whether the product contains lime.' }).optional(),
  containsSilica: z.boolean({ error: 'Say whether the SDS lists crystalline silica.' }).optional(),
});
export type ProductHazardsInput = z.infer<typeof productHazards>;

const sdsUrl = z.union([z.url({ protocol: /^https?$/, error: 'Enter a web address starting with https://.' }).max(500, { error: 'Use at most 500 characters.' }), z.literal('')]);

/** Fields without defaults, so `productUpdate` (a partial) changes only what it names. */
const productFields = {
  name: requiredText(120, 'Enter the product name.'),
  kind: z.enum(PRODUCT_KINDS, { error: 'Choose what kind of product this is.' }),
  unit: quantityUnit,
  containers: z
    .array(containerInput, { error: 'Add at least one container with its price.' })
    .min(1, { error: 'Add at least one container with its price.' })
    .max(12, { error: 'Use at most 12 container sizes.' }),
  hazards: productHazards,
  sdsUrl,
  notes: text(2000),
};

/** Every container must be measured like the product (volume or weight): converting needs a density. */
function checkContainerUnits(p: { unit?: ProductInput['unit']; containers?: ContainerInput[] }, ctx: z.RefinementCtx): void {
  if (!p.unit || !p.containers) return;
  const byWeight = isMassUnit(p.unit);
  p.containers.forEach((c, i) => {
    if (isMassUnit(c.unit) !== byWeight) {
      ctx.addIssue({
        code: 'custom',
        path: ['containers', i, 'unit'],
        message: byWeight ? 'This product is counted by weight; give the container size by weight too.' : 'This product is counted by volume; give the container size by volume too.',
      });
    }
  });
}

export const productInput = z
  .strictObject({
    ...productFields,
    hazards: productFields.hazards.default({}),
    sdsUrl: productFields.sdsUrl.default(''),
    notes: productFields.notes.default(''),
  })
  .superRefine(checkContainerUnits);
export type ProductInput = z.infer<typeof productInput>;
/** No defaults: a partial update changes only what it names. The server re-checks the merged product with `productInput`. */
export const productUpdate = z.strictObject(productFields).partial();
export type ProductUpdate = z.infer<typeof productUpdate>;

export const productListQuery = z.strictObject({
  archived: z.enum(['exclude', 'include', 'only'], { error: 'Use exclude, include or only.' }).default('exclude'),
});

/** Crew read the library on site but see no money figures (PRODUCT.md), so their prices come back null. */
export interface ContainerView {
  readonly label: string;
  readonly size: number;
  readonly unit: ContainerInput['unit'];
  readonly price: string | null;
}

export interface ProductView {
  readonly id: string;
  readonly name: string;
  readonly kind: ProductKind;
  readonly unit: ProductInput['unit'];
  readonly containers: readonly ContainerView[];
  readonly hazards: ProductHazardsInput;
  /** derived from the flash point (below FLAMMABLE_BELOW_C) */
  readonly isFlammable: boolean;
  readonly sdsUrl: string;
  readonly notes: string;
  readonly archivedAt: string | null;
  readonly createdAt: string;
  readonly updatedAt: string;
}
