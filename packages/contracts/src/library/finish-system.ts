import { z } from 'zod';
import { requiredText, text, uuid } from '../common/fields';
import {
  ARCHIVED_FILTERS,
  DILUTION_CONVENTIONS,
  FINISH_SYSTEM_LIMITS,
  type CoverageInput,
  type FinishLayerInput,
  type FinishSystemInput,
  RECIPE_BASES,
} from './library-types';
import { applicationMethod, lengthUnit, numberField, quantityUnit } from './units';

const L = FINISH_SYSTEM_LIMITS;

const positive = (missing: string, tooSmall: string) => numberField(missing).positive({ error: tooSmall });

/**
 * How far a product goes per coat: surface per unit for paints and glazes (400 ft² per gallon),
 * or product per surface for plasters, whose data sheets give kg per m².
 */
export const coverageInput = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({
      kind: z.literal('spreadRate'),
      surfacePerUnit: positive('Enter how much surface one unit covers.', 'The spread rate must be more than zero.'),
      unit: quantityUnit,
      lengthUnit,
    }),
    z.strictObject({
      kind: z.literal('consumption'),
      unitPerSurface: positive('Enter how much product one unit of surface takes.', 'The consumption must be more than zero.'),
      unit: quantityUnit,
      lengthUnit,
    }),
  ],
  { error: 'Choose spread rate (surface per unit) or consumption (product per surface).' },
);

const concentrateMaxPercent = L.dilutionOfConcentrateMax * 100;
/** Water as a share of the product may pass 100 % (a 1:1 wash is 100 %, 2:1 is 200 %); as a share of the mix it may not. */
export const dilutionInput = z
  .strictObject({
    share: numberField('Enter the dilution as a share, like 0.1 for 10 %.').min(0, { error: 'The dilution cannot be negative.' }),
    convention: z.enum(DILUTION_CONVENTIONS, { error: 'Say whether the water is a share of the product or of the final mix.' }),
  })
  .superRefine((d, ctx) => {
    if (d.convention === 'ofMix' && d.share >= 1) {
      ctx.addIssue({ code: 'custom', path: ['share'], message: 'Water as a share of the final mix must be under 100 %.' });
    }
    if (d.convention === 'ofConcentrate' && d.share > L.dilutionOfConcentrateMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['share'],
        message: `Water as a share of the product is at most ${concentrateMaxPercent} % (${L.dilutionOfConcentrateMax} parts water to 1).`,
      });
    }
  });

export const mixRecipeInput = z
  .strictObject({
    by: z.enum(RECIPE_BASES, { error: 'Say whether the parts are by volume or by weight.' }),
    baseProductId: uuid('product'),
    components: z
      .array(
        z.strictObject({ productId: uuid('product'), parts: positive('Enter the parts as a number.', 'Parts must be more than zero.') }),
        {
          error: 'List the products in the mix.',
        },
      )
      .min(L.recipeProductsMin, { error: 'A mix recipe needs at least two products; use a single product otherwise.' })
      .max(L.recipeProductsMax, { error: `Use at most ${L.recipeProductsMax} products in one mix.` }),
  })
  .superRefine((r, ctx) => {
    const seen = new Set<string>();
    r.components.forEach((c, i) => {
      if (seen.has(c.productId))
        ctx.addIssue({ code: 'custom', path: ['components', i, 'productId'], message: 'This product is already in the mix.' });
      seen.add(c.productId);
    });
    if (!seen.has(r.baseProductId))
      ctx.addIssue({ code: 'custom', path: ['baseProductId'], message: 'The base must be one of the products in the mix.' });
  });

const multiplier = numberField('Enter the multiplier as a number, like 1.25.')
  .min(L.multiplierMin, { error: 'A multiplier is at least 1 (no extra time).' })
  .max(L.multiplierMax, { error: 'A multiplier above 5 is surely a typo.' })
  .optional();

export const finishLayerInput = z
  .strictObject({
    /** made by the browser (a uuid or short id); keeps a layer's identity across reorders */
    id: z.string({ error: 'Each layer needs an id.' }).regex(new RegExp(`^[A-Za-z0-9_-]{1,${L.layerIdMax}}$`), {
      error: `A layer id uses letters, digits, - and _ (at most ${L.layerIdMax}).`,
    }),
    name: requiredText(L.layerNameMax, 'Name the layer, like "Scratch coat" or "Glaze".'),
    method: applicationMethod,
    productId: uuid('product').optional(),
    recipe: mixRecipeInput.optional(),
    coverage: coverageInput,
    coats: numberField('Enter the number of coats.')
      .int({ error: 'Coats are whole numbers.' })
      .min(1, { error: 'A layer has at least one coat.' })
      .max(L.coatsMax, { error: `Use at most ${L.coatsMax} coats.` }),
    coatCoverages: z.array(coverageInput, { error: 'Give one coverage per coat.' }).optional(),
    coverageShare: numberField('Enter the share of the surface, like 0.3 for 30 %.')
      .gt(0, { error: 'The share of the surface must be more than 0 %.' })
      .max(1, { error: 'The share of the surface is at most 100 %.' })
      .optional(),
    dilution: dilutionInput.optional(),
    waste: numberField('Enter the waste as a share, like 0.1 for 10 %.')
      .min(0, { error: 'Waste cannot be negative.' })
      .max(L.wasteMax, { error: 'Waste above 100 % is refused: enter it as a share, like 0.1 for 10 %.' }),
    productionRate: z.strictObject({
      surfacePerHour: positive('Enter how much surface one worker finishes in an hour.', 'The production rate must be more than zero.'),
      lengthUnit,
    }),
    multipliers: z
      .strictObject({ ceiling: multiplier, height: multiplier, curvedWall: multiplier, curvedCeiling: multiplier, occupied: multiplier })
      .optional(),
    waitHoursAfter: numberField('Enter the wait in hours.')
      .min(0, { error: 'The wait cannot be negative.' })
      .max(L.waitHoursMax, { error: `Use at most 90 days (${L.waitHoursMax} hours).` }),
  })
  .superRefine((l, ctx) => {
    if (l.productId === undefined && l.recipe === undefined) {
      ctx.addIssue({ code: 'custom', path: ['productId'], message: 'Choose a product, or give a mix recipe.' });
    }
    if (l.productId !== undefined && l.recipe !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['productId'], message: 'Use either one product or a mix recipe, not both.' });
    }
    if (l.coatCoverages && l.coatCoverages.length !== l.coats) {
      ctx.addIssue({
        code: 'custom',
        path: ['coatCoverages'],
        message: `Give one coverage per coat: ${l.coats} coat${l.coats === 1 ? '' : 's'}, ${l.coatCoverages.length} given.`,
      });
    }
  });

const layerList = z
  .array(finishLayerInput, { error: 'A finish system needs at least one layer.' })
  .min(1, { error: 'A finish system needs at least one layer.' })
  .max(L.layersMax, { error: `Use at most ${L.layersMax} layers in one system.` })
  .superRefine((layers, ctx) => {
    const seen = new Set<string>();
    layers.forEach((l, i) => {
      if (seen.has(l.id)) ctx.addIssue({ code: 'custom', path: [i, 'id'], message: 'Two layers share this id.' });
      seen.add(l.id);
    });
  });

const finishSystemFields = {
  name: requiredText(L.nameMax, 'Name the finish system.'),
  description: text(L.descriptionMax),
  layers: layerList,
};
export const finishSystemInput = z.strictObject({ ...finishSystemFields, description: finishSystemFields.description.default('') });
/** No defaults: a partial update changes only what it names. */
export const finishSystemUpdate = z.strictObject(finishSystemFields).partial();

export const systemListQuery = z.strictObject({
  archived: z.enum(ARCHIVED_FILTERS, { error: 'Use exclude, include or only.' }).default('exclude'),
});

// A stored layer must be exactly what the estimate engine takes (library-types.ts names the
// engine's own FinishLayer); parsed bodies fit the plain request types the apps send.
type Assignable<A, B> = [A] extends [B] ? true : false;
export const FINISH_SCHEMAS_MATCH_TYPES: [
  Assignable<z.infer<typeof coverageInput>, CoverageInput>,
  Assignable<z.infer<typeof finishLayerInput>, FinishLayerInput>,
  Assignable<z.infer<typeof finishSystemInput>, FinishSystemInput>,
  Assignable<z.infer<typeof finishSystemUpdate>, Partial<FinishSystemInput>>,
] = [true, true, true, true];
