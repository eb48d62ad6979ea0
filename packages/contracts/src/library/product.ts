import { isMassUnit } from '@layerbook/domain';
import { z } from 'zod';
import { moneyAmount, requiredText, text } from '../common/fields';
import { requestSchema } from '../common/schema-check';
import {
  ARCHIVED_FILTERS,
  type ContainerInput,
  PRODUCT_KINDS,
  PRODUCT_LIMITS,
  type ProductHazardsInput,
  type ProductInput,
  type ProductUpdate,
} from './library-types';
import { numberField, quantityUnit } from './units';

const L = PRODUCT_LIMITS;
const boilingPointRange = `Check the boiling point: it should be between −${-L.boilingPointMinC} and ${L.boilingPointMaxC} °C.`;
const flashPointRange = `Check the flash point: it should be between −${-L.flashPointMinC} and ${L.flashPointMaxC} °C.`;

export const containerInput = requestSchema<ContainerInput>()(
  z.strictObject({
    label: requiredText(L.containerLabelMax, 'Name the container, like "1 gal" or "20 kg pail".'),
    size: numberField('Enter the container size as a number.').positive({ error: 'The container size must be more than zero.' }),
    unit: quantityUnit,
    price: moneyAmount,
  }),
);

export const productHazards = requestSchema<ProductHazardsInput>()(
  z.strictObject({
    /** closed-cup flash point from the SDS; leave out when the product does not burn */
    flashPointC: numberField('Enter the flash point in °C as a number.')
      .min(L.flashPointMinC, { error: flashPointRange })
      .max(L.flashPointMaxC, { error: flashPointRange })
      .optional(),
    /** initial boiling point from the SDS; only splits categories 1 and 2 below 23 °C (29 CFR 1910.106(a)(19)) */
    boilingPointC: numberField('Enter the boiling point in °C as a number.')
      .min(L.boilingPointMinC, { error: boilingPointRange })
      .max(L.boilingPointMaxC, { error: boilingPointRange })
      .optional(),
    /** raises the alkali and eye-protection caution; the server sets it for every product of kind lime */
    isLime: z.boolean({ error: 'Say whether the product contains lime.' }).optional(),
    containsSilica: z.boolean({ error: 'Say whether the SDS lists crystalline silica.' }).optional(),
    containsDryingOil: z.boolean({ error: 'Say whether the product contains a drying oil (linseed, tung, oil glaze).' }).optional(),
  }),
);

const sdsUrl = z.union([
  z
    .url({ protocol: /^https?$/, error: 'Enter a web address starting with https://.' })
    .max(L.sdsUrlMax, { error: `Use at most ${L.sdsUrlMax} characters.` }),
  z.literal(''),
]);

/** Fields without defaults, so `productUpdate` (a partial) changes only what it names. */
const productFields = {
  name: requiredText(L.nameMax, 'Enter the product name.'),
  kind: z.enum(PRODUCT_KINDS, { error: 'Choose what kind of product this is.' }),
  unit: quantityUnit,
  containers: z
    .array(containerInput, { error: 'Add at least one container with its price.' })
    .min(1, { error: 'Add at least one container with its price.' })
    .max(L.containersMax, { error: `Use at most ${L.containersMax} container sizes.` }),
  hazards: productHazards,
  sdsUrl,
  notes: text(L.notesMax),
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
        message: byWeight
          ? 'This product is counted by weight; give the container size by weight too.'
          : 'This product is counted by volume; give the container size by volume too.',
      });
    }
  });
}

export const productInput = requestSchema<ProductInput>()(
  z
    .strictObject({
      ...productFields,
      hazards: productFields.hazards.default({}),
      sdsUrl: productFields.sdsUrl.default(''),
      notes: productFields.notes.default(''),
    })
    .superRefine(checkContainerUnits),
);
/** No defaults: a partial update changes only what it names. The server re-checks the merged product with `productInput`. */
export const productUpdate = requestSchema<ProductUpdate>()(z.strictObject(productFields).partial());

export const productListQuery = z.strictObject({
  archived: z.enum(ARCHIVED_FILTERS, { error: 'Use exclude, include or only.' }).default('exclude'),
});
