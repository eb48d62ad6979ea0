import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { ErrorStateMatcher, ShowOnDirtyErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import {
  DIM_WORDS,
  DISTURBED_AREA_NOUN,
  isMoreThanSurface,
  SHAPE_GROUPS,
  TAKEOFF_LIMITS as L,
  shapeChoice,
  type DimField,
  type SurfaceInput,
  type SurfaceView,
  type TakeoffLengthUnit,
} from '@layerbook/contracts/types';
import { convertArea, measureText, plainNumber, workingText } from '@layerbook/domain';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { type LiveMeasure, measureLive } from './live-measure';
import { readNumber } from './number-text';
import { cornerArray, enableFor, loadShape, openingGroup, shapeGroup } from './shape-form-model';
import { bannerAfterEdit, readShape } from './shape-reading';
import { ShapeSketch } from './shape-sketch';
import { TakeoffApi } from './takeoff-api';

/** Adds a surface to a room or edits one: choose a shape, type its sizes, watch the area, save. */
@Component({
  selector: 'lb-surface-form',
  imports: [
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    ShapeSketch,
    TranslatePipe,
  ],
  // Messages appear while typing, not only after leaving the field: a phone user rarely tabs out.
  providers: [{ provide: ErrorStateMatcher, useClass: ShowOnDirtyErrorStateMatcher }],
  templateUrl: './surface-form.html',
  styleUrl: './surface-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SurfaceForm implements OnInit {
  private readonly api = inject(TakeoffApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly translate = inject(TranslateService);

  readonly roomId = input.required<string>();
  readonly roomName = input.required<string>();
  readonly unit = input.required<TakeoffLengthUnit>();
  /** the firm's smallest deducted opening, in `unit`²: the live figure is the one the server will show */
  readonly minDeductedOpeningArea = input(0);
  readonly surface = input<SurfaceView | null>(null);
  readonly saved = output<SurfaceView>();
  readonly cancelled = output<void>();

  protected readonly groups = SHAPE_GROUPS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly live = signal<LiveMeasure>({ state: 'missing' });
  protected readonly choice = signal(shapeChoice('walls'));
  protected readonly isNew = computed(() => this.surface() === null);
  protected readonly liveShape = computed(() => {
    const live = this.live();
    return live.state === 'measured' ? live.shape : null;
  });
  protected readonly quantityText = measureText;
  protected readonly workingText = workingText;
  protected readonly shortNumber = plainNumber;

  /**
   * The unit the length rules read. Angular runs validators as each control is made, before inputs
   * are set (reading the required `unit` then throws), so the rules start in feet and switch to the
   * firm's unit in ngOnInit, before any value is loaded or typed.
   */
  private rulesUnit: TakeoffLengthUnit = 'ft';

  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [requiredText, Validators.maxLength(L.surfaceNameMax)] }),
    shape: shapeGroup(() => this.rulesUnit),
    disturbedPaintedArea: new FormControl('', { nonNullable: true, validators: disturbedRule }),
    notes: new FormControl('', { nonNullable: true, validators: Validators.maxLength(L.notesMax) }),
  });
  protected readonly shape = this.form.controls.shape;
  /** Controls the engine's last refusal was pinned to, so the next reading can clear it. */
  private marked: AbstractControl[] = [];

  ngOnInit(): void {
    this.rulesUnit = this.unit();
    const surface = this.surface();
    if (surface) {
      loadShape(this.shape, surface, this.unit());
      this.form.controls.name.setValue(surface.name);
      this.form.controls.notes.setValue(surface.notes);
      this.form.controls.disturbedPaintedArea.setValue(disturbedFormValue(surface, this.unit()));
    } else {
      enableFor(this.shape);
    }
    this.choice.set(shapeChoice(this.shape.controls.kind.value));
    this.shape.controls.kind.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe((kind) => {
      enableFor(this.shape);
      const next = shapeChoice(kind);
      // A new surface's name nobody typed follows the shape ("Walls" → "Turret ceiling"); a saved name stays.
      if (this.isNew() && this.form.controls.name.pristine) this.form.controls.name.setValue(next.defaultName, { emitEvent: false });
      this.choice.set(next);
    });
    this.form.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => this.remeasure());
    if (this.isNew()) this.form.controls.name.setValue(this.choice().defaultName, { emitEvent: false });
    this.remeasure();
  }

  protected message(control: AbstractControl): string {
    const errors = control.errors ?? {};
    for (const key of ['server', 'geometry', 'rule']) {
      const text: unknown = errors[key];
      if (typeof text === 'string') return text;
    }
    if (errors['required']) return this.words('takeoff.surfaceForm.nameRequired');
    if (errors['maxlength']) return this.words('takeoff.surfaceForm.tooLong');
    return this.words('takeoff.surfaceForm.checkField');
  }

  protected suffix(field: DimField): string {
    if (field.rule === 'length' || field.rule === 'depth0') return this.unit();
    if (field.rule === 'area') return `${this.unit()}²`;
    if (field.rule === 'angle') return '°';
    return '';
  }

  /** Lengths in feet take a full keyboard, for the foot and inch marks ("6' 6\""); other numbers a number pad. */
  protected inputMode(field: DimField): string {
    if (field.rule === 'length' || field.rule === 'depth0') return this.lengthMode();
    return typeof field.rule === 'object' ? 'numeric' : 'decimal';
  }

  protected readonly lengthMode = computed(() => (this.unit() === 'ft' ? 'text' : 'decimal'));

  protected addOpening(): void {
    this.shape.controls.openings.push(openingGroup(() => this.unit()));
  }

  protected removeOpening(index: number): void {
    this.shape.controls.openings.removeAt(index);
  }

  protected addCorner(): void {
    this.shape.controls.corners.push(cornerArray(() => this.unit()));
  }

  protected removeCorner(index: number): void {
    this.shape.controls.corners.removeAt(index);
  }

  protected async saveSurface(): Promise<void> {
    this.formMessage.set(null);
    const reading = readShape(this.shape.getRawValue(), this.unit());
    if (this.form.invalid || 'missing' in reading) {
      this.form.markAllAsTouched();
      for (const control of Object.values(this.shape.controls)) control.markAsDirty();
      this.formMessage.set(this.live().state === 'refused' ? null : this.words('takeoff.surfaceForm.someSizesMissing'));
      return;
    }
    const v = this.form.getRawValue();
    const body: SurfaceInput = {
      name: v.name.trim(),
      shape: reading.shape,
      disturbedPaintedArea: readNumber(v.disturbedPaintedArea),
      notes: v.notes.trim(),
    };
    this.isBusy.set(true);
    try {
      const current = this.surface();
      this.saved.emit(current ? await this.api.updateSurface(current.id, body) : await this.api.addSurface(this.roomId(), body));
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }

  /** Measures what is typed so far and pins the engine's refusal, if any, to the field it names. */
  private remeasure(): void {
    for (const control of this.marked) control.updateValueAndValidity({ emitEvent: false });
    this.marked = [];
    const reading = readShape(this.shape.getRawValue(), this.unit());
    this.formMessage.update((banner) => bannerAfterEdit(banner, this.form.valid, reading));
    if ('missing' in reading) {
      this.live.set({ state: 'missing' });
      return;
    }
    const live = measureLive(reading.shape, { minDeductedOpeningArea: this.minDeductedOpeningArea() });
    this.live.set(live);
    if (live.state === 'refused') {
      this.mark(this.form.get(live.field), live.message);
    } else if (live.state === 'measured' && live.measure.measure === 'area') {
      const disturbed = readNumber(this.form.controls.disturbedPaintedArea.value);
      if (disturbed !== null && isMoreThanSurface(disturbed, live.measure.gross)) {
        this.mark(this.form.controls.disturbedPaintedArea, this.words('takeoff.surfaceForm.disturbedTooBig'));
      }
    }
  }

  private words(key: string): string {
    return String(this.translate.instant(key));
  }

  private mark(control: AbstractControl | null, message: string): void {
    if (!(control instanceof FormControl)) return;
    control.setErrors({ ...control.errors, geometry: message }, { emitEvent: false });
    control.markAsDirty();
    this.marked.push(control);
  }
}

/**
 * The saved disturbed area in the unit the form measures in now, as the shape is (shapeFormValue):
 * 5 ft² saved before the firm went metric is shown, and saved again, as 0.46 m², never as 5 m².
 * Hundredths, as the area is kept.
 */
function disturbedFormValue(surface: SurfaceView, unit: TakeoffLengthUnit): string {
  const saved = surface.disturbedPaintedArea;
  return saved === null ? '' : plainNumber(convertArea(saved, surface.lengthUnit, unit), 2);
}

/** The same range and words as the API (contracts: takeoff.ts). */
function disturbedRule(control: AbstractControl<string>) {
  const value = readNumber(control.value);
  const isFine = value === null || (!Number.isNaN(value) && value >= 0 && value <= L.disturbedAreaMax);
  return isFine ? null : { rule: DIM_WORDS.optionalNonNegative(DISTURBED_AREA_NOUN) };
}
