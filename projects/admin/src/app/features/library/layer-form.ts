import { AbstractControl, FormArray, FormControl, FormGroup, NonNullableFormBuilder, ValidationErrors, Validators } from '@angular/forms';
import {
  FINISH_SYSTEM_LIMITS as L,
  MULTIPLIER_NAMES,
  type CoverageKind,
  type DilutionConvention,
  type FinishLayerInput,
  type MultiplierName,
  type Problem,
  type RecipeBasis,
} from '@layerbook/contracts/types';
import type { ApplicationMethod, LengthUnit, QuantityUnit } from '@layerbook/domain';
import { requiredText } from '../../shared/forms/text-validators';

/*
 * A layer in the form mirrors the API's FinishLayer field by field, so a server error at
 * `layers.2.coverageShare` lands on the control at the same path. Two differences, both undone
 * by `toLayer`: shares are typed as percentages (30, not 0.3), and a coverage holds one `amount`
 * whatever its kind (the API calls it surfacePerUnit or unitPerSurface; see `formField`).
 */

export type CoverageGroup = FormGroup<{
  kind: FormControl<CoverageKind>;
  amount: FormControl<number | null>;
  unit: FormControl<QuantityUnit>;
  lengthUnit: FormControl<LengthUnit>;
}>;
export type ComponentGroup = FormGroup<{ productId: FormControl<string>; parts: FormControl<number | null> }>;
export type LayerGroup = ReturnType<typeof layerGroup>;

/** Above zero, as the API requires of rates, sizes and parts. */
export function positive(control: AbstractControl<number | null>): ValidationErrors | null {
  const v = control.value;
  return v === null || v === undefined || (typeof v === 'number' && v > 0) ? null : { positive: true };
}

/** Short ids keep layer identity across reorders; randomUUID is missing outside secure contexts. */
export function newLayerId(): string {
  const c = globalThis.crypto;
  return typeof c?.randomUUID === 'function' ? c.randomUUID() : `l${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}`;
}

/**
 * The dilution typed in percent, checked against its convention as the API checks it: water as a
 * share of the product may pass 100 % (a 1:1 wash is 100 %, 2:1 is 200 %) up to the contract's
 * limit; water as a share of the final mix stays under 100 %.
 */
export function dilutionShareLimit(control: AbstractControl): ValidationErrors | null {
  const share: unknown = control.value;
  if (typeof share !== 'number' || !Number.isFinite(share)) return null;
  const convention = control.parent?.get('convention')?.value as DilutionConvention | undefined;
  if (convention === 'ofMix') return share >= 100 ? { ofMixMax: true } : null;
  return share > L.dilutionOfConcentrateMax * 100 ? { ofConcentrateMax: true } : null;
}

const toPercent = (share: number) => Math.round(share * 100 * 1e6) / 1e6;
/** A blank number becomes NaN, which the API refuses by name; the form's own validators catch it first. */
const num = (v: number | null) => v ?? Number.NaN;

type Coverage = FinishLayerInput['coverage'];

export function coverageGroup(fb: NonNullableFormBuilder, c?: Coverage): CoverageGroup {
  return fb.group({
    kind: fb.control<CoverageKind>(c?.kind ?? 'spreadRate', Validators.required),
    amount: fb.control<number | null>(c ? (c.kind === 'spreadRate' ? c.surfacePerUnit : c.unitPerSurface) : null, [
      Validators.required,
      positive,
    ]),
    unit: fb.control<QuantityUnit>(c?.unit ?? 'gallon', Validators.required),
    lengthUnit: fb.control<LengthUnit>(c?.lengthUnit ?? 'ft', Validators.required),
  });
}

function componentGroup(fb: NonNullableFormBuilder, productId = '', parts: number | null = 1): ComponentGroup {
  return fb.group({
    productId: fb.control(productId, Validators.required),
    parts: fb.control<number | null>(parts, [Validators.required, positive]),
  });
}

/**
 * Defaults for a new layer: one full coat rolled at 350 ft² per gallon, 10 % waste, 250 ft² an
 * hour and a 4 h recoat wait (DOMAIN.md §3.6 ranges; common practice, no source).
 */
export function layerGroup(fb: NonNullableFormBuilder, layer?: FinishLayerInput) {
  const multiplier = (name: MultiplierName) =>
    fb.control<number | null>(layer?.multipliers?.[name] ?? null, [Validators.min(L.multiplierMin), Validators.max(L.multiplierMax)]);
  const recipe = layer?.recipe;
  const group = fb.group({
    id: fb.control(layer?.id ?? newLayerId()),
    name: fb.control(layer?.name ?? '', [requiredText, Validators.maxLength(L.layerNameMax)]),
    method: fb.control<ApplicationMethod>(layer?.method ?? 'roll', Validators.required),
    source: fb.control<'product' | 'recipe'>(recipe ? 'recipe' : 'product'),
    productId: fb.control(layer?.productId ?? '', Validators.required),
    recipe: fb.group({
      by: fb.control<RecipeBasis>(recipe?.by ?? 'volume', Validators.required),
      baseProductId: fb.control(recipe?.baseProductId ?? '', Validators.required),
      components: fb.array(
        recipe ? recipe.components.map((c) => componentGroup(fb, c.productId, c.parts)) : [componentGroup(fb), componentGroup(fb, '', 4)],
      ),
    }),
    coverage: coverageGroup(fb, layer?.coverage ?? { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' }),
    coats: fb.control<number | null>(layer?.coats ?? 1, [
      Validators.required,
      Validators.min(1),
      Validators.max(L.coatsMax),
      Validators.pattern(/^\d+$/),
    ]),
    isPerCoat: fb.control(!!layer?.coatCoverages),
    coatCoverages: fb.array((layer?.coatCoverages ?? []).map((c) => coverageGroup(fb, c))),
    coverageShare: fb.control<number | null>(toPercent(layer?.coverageShare ?? 1), [Validators.required, positive, Validators.max(100)]),
    dilution: fb.group({
      share: fb.control<number | null>(layer?.dilution ? toPercent(layer.dilution.share) : null, [Validators.min(0), dilutionShareLimit]),
      convention: fb.control<DilutionConvention>(layer?.dilution?.convention ?? 'ofConcentrate'),
    }),
    waste: fb.control<number | null>(toPercent(layer?.waste ?? 0.1), [
      Validators.required,
      Validators.min(0),
      Validators.max(L.wasteMax * 100),
    ]),
    productionRate: fb.group({
      surfacePerHour: fb.control<number | null>(layer?.productionRate.surfacePerHour ?? 250, [Validators.required, positive]),
      lengthUnit: fb.control<LengthUnit>(layer?.productionRate.lengthUnit ?? 'ft', Validators.required),
    }),
    multipliers: fb.group(
      Object.fromEntries(MULTIPLIER_NAMES.map((name) => [name, multiplier(name)])) as Record<MultiplierName, FormControl<number | null>>,
    ),
    waitHoursAfter: fb.control<number | null>(layer?.waitHoursAfter ?? 4, [
      Validators.required,
      Validators.min(0),
      Validators.max(L.waitHoursMax),
    ]),
  });

  // Only the chosen source (one product, or a mix) and, when asked for, per-coat coverages count
  // towards validity: disabled controls are skipped by validation.
  // A disabled layer (read-only viewer, archived system) stays wholly disabled.
  const syncSource = () => {
    if (group.disabled) return;
    const isRecipe = group.controls.source.value === 'recipe';
    toggle(group.controls.productId, !isRecipe);
    toggle(group.controls.recipe, isRecipe);
  };
  const syncCoats = () => {
    if (group.disabled) return;
    const list = group.controls.coatCoverages;
    if (!group.controls.isPerCoat.value) {
      toggle(list, false);
      return;
    }
    const coats = group.controls.coats.value;
    const wanted = coats !== null && Number.isInteger(coats) && coats >= 1 && coats <= L.coatsMax ? coats : list.length;
    while (list.length < wanted) list.push(coverageGroup(fb, fromCoverageValue(group.controls.coverage.getRawValue())));
    while (list.length > wanted) list.removeAt(list.length - 1);
    toggle(list, true);
  };
  const dilution = group.controls.dilution.controls;
  dilution.convention.valueChanges.subscribe(() => dilution.share.updateValueAndValidity());
  dilution.share.updateValueAndValidity({ emitEvent: false });
  group.controls.source.valueChanges.subscribe(syncSource);
  group.controls.isPerCoat.valueChanges.subscribe(syncCoats);
  group.controls.coats.valueChanges.subscribe(syncCoats);
  syncSource();
  syncCoats();
  return group;
}

/** Enables or disables without re-running the parent's change listeners in a loop. */
function toggle(control: AbstractControl, isOn: boolean): void {
  if (isOn && control.disabled) control.enable({ emitEvent: false });
  if (!isOn && control.enabled) control.disable({ emitEvent: false });
}

export function addComponent(fb: NonNullableFormBuilder, layer: LayerGroup): void {
  layer.controls.recipe.controls.components.push(componentGroup(fb));
}

type CoverageValue = ReturnType<CoverageGroup['getRawValue']>;

function fromCoverageValue(v: CoverageValue): Coverage {
  return v.kind === 'spreadRate'
    ? { kind: 'spreadRate', surfacePerUnit: num(v.amount), unit: v.unit, lengthUnit: v.lengthUnit }
    : { kind: 'consumption', unitPerSurface: num(v.amount), unit: v.unit, lengthUnit: v.lengthUnit };
}

/** The API's FinishLayer from the form: percentages back to shares, empty optional parts left out. */
export function toLayer(group: LayerGroup): FinishLayerInput {
  const v = group.getRawValue();
  const multipliers: NonNullable<FinishLayerInput['multipliers']> = {};
  for (const [name, value] of Object.entries(v.multipliers) as [MultiplierName, number | null][]) {
    if (value !== null) multipliers[name] = value;
  }
  const dilutionShare = v.dilution.share;
  return {
    id: v.id,
    name: v.name.trim(),
    method: v.method,
    ...(v.source === 'recipe'
      ? {
          recipe: {
            by: v.recipe.by,
            baseProductId: v.recipe.baseProductId,
            components: v.recipe.components.map((c) => ({ productId: c.productId, parts: num(c.parts) })),
          },
        }
      : { productId: v.productId }),
    coverage: fromCoverageValue(v.coverage),
    coats: num(v.coats),
    ...(v.isPerCoat ? { coatCoverages: v.coatCoverages.map(fromCoverageValue) } : {}),
    coverageShare: num(v.coverageShare) / 100,
    ...(dilutionShare !== null && dilutionShare > 0 ? { dilution: { share: dilutionShare / 100, convention: v.dilution.convention } } : {}),
    waste: num(v.waste) / 100,
    productionRate: { surfacePerHour: num(v.productionRate.surfacePerHour), lengthUnit: v.productionRate.lengthUnit },
    ...(Object.keys(multipliers).length ? { multipliers } : {}),
    waitHoursAfter: num(v.waitHoursAfter),
  };
}

/**
 * Server field → form control path. A coverage's number lives in `amount`; list-level problems
 * (coatCoverages, recipe.components) go beside the field a person would change.
 */
export function formField(field: string): string {
  return field
    .replace(/\.(surfacePerUnit|unitPerSurface)$/, '.amount')
    .replace(/^(layers\.\d+)\.coatCoverages$/, '$1.coats')
    .replace(/^(layers\.\d+\.recipe)\.components$/, '$1.baseProductId');
}

export function problemForForm(problem: Problem): Problem {
  return { ...problem, errors: problem.errors?.map((e) => ({ ...e, field: formField(e.field) })) };
}

export type LayerArray = FormArray<LayerGroup>;
