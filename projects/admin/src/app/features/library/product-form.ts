import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { PRODUCT_LIMITS as L, type ContainerView, type ProductInput, type ProductKind, type ProductView } from '@layerbook/contracts/types';
import type { QuantityUnit } from '@layerbook/domain';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { amountText, toAmount } from '../../shared/forms/money-input';
import { Language } from '../../../../../shared/i18n/language';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { LibraryApi } from './library-api';
import { syncLimeFlag } from './lime-flag';
import { PRODUCT_KIND_CHOICES, UNIT_GROUPS, flammableNote } from './library-words';

const TOO_LONG = { maxlength: 'library.common.tooLong' };
const E = 'library.productForm.errors.';

/** Adds a product, or edits the one it is given: containers with prices, hazards from the SDS. */
@Component({
  selector: 'lb-product-form',
  imports: [
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  templateUrl: './product-form.html',
  styleUrl: './product-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductForm implements OnInit {
  private readonly api = inject(LibraryApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly language = inject(Language);
  private readonly translate = inject(TranslateService);

  readonly product = input<ProductView | null>(null);
  readonly saved = output<ProductView>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.product() === null);
  protected readonly kinds = PRODUCT_KIND_CHOICES;
  protected readonly maxContainers = L.containersMax;
  protected readonly unitGroups = UNIT_GROUPS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  /** Keys of the library's words per validator; the server's own message, when it has one, shows as sent. */
  protected readonly words = {
    name: { required: `${E}nameRequired`, ...TOO_LONG },
    kind: { required: `${E}kindRequired` },
    unit: { required: `${E}unitRequired` },
    label: { required: `${E}labelRequired`, ...TOO_LONG },
    size: { required: `${E}sizeRequired`, min: `${E}sizeMin` },
    price: { required: `${E}priceRequired`, amount: `${E}amount` },
    flashPoint: { min: `${E}flashPointRange`, max: `${E}flashPointRange` },
    boilingPoint: { min: `${E}boilingPointRange`, max: `${E}boilingPointRange` },
    url: { pattern: `${E}url`, ...TOO_LONG },
    line: TOO_LONG,
  };
  /** The params the error words name; each range message picks its own (the translate pipe ignores the rest). */
  protected readonly limits = {
    flashMin: -L.flashPointMinC,
    flashMax: L.flashPointMaxC,
    boilMin: -L.boilingPointMinC,
    boilMax: L.boilingPointMaxC,
  };

  protected readonly form = this.fb.group({
    name: ['', [requiredText, Validators.maxLength(L.nameMax)]],
    kind: this.fb.control<ProductKind>('paint', Validators.required),
    unit: this.fb.control<QuantityUnit>('gallon', Validators.required),
    containers: this.fb.array([this.containerGroup()]),
    hazards: this.fb.group({
      flashPointC: this.fb.control<number | null>(null, [Validators.min(L.flashPointMinC), Validators.max(L.flashPointMaxC)]),
      boilingPointC: this.fb.control<number | null>(null, [Validators.min(L.boilingPointMinC), Validators.max(L.boilingPointMaxC)]),
      isLime: [false],
      containsSilica: [false],
      containsDryingOil: [false],
    }),
    sdsUrl: ['', [Validators.maxLength(L.sdsUrlMax), Validators.pattern(/^\s*(https?:\/\/\S+)?\s*$/)]],
    notes: ['', Validators.maxLength(L.notesMax)],
  });

  private readonly flashPoint = toSignal(this.form.controls.hazards.controls.flashPointC.valueChanges, { initialValue: null });
  /** Shown live beside the flash point so the rule is visible, not hidden in the server. */
  private readonly boilingPoint = toSignal(this.form.controls.hazards.controls.boilingPointC.valueChanges, { initialValue: null });
  protected readonly flammableNote = computed(() => flammableNote(this.flashPoint(), this.boilingPoint(), this.language.locale()));
  private readonly kind = toSignal(this.form.controls.kind.valueChanges, { initialValue: this.form.controls.kind.value });
  protected readonly isLimeKind = computed(() => this.kind() === 'lime');

  constructor() {
    const { kind, hazards } = this.form.controls;
    kind.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => syncLimeFlag(kind, hazards.controls.isLime));
  }

  ngOnInit(): void {
    const p = this.product();
    if (!p) return;
    this.form.controls.containers.clear();
    for (const c of p.containers) this.form.controls.containers.push(this.containerGroup(c));
    this.form.reset({
      name: p.name,
      kind: p.kind,
      unit: p.unit,
      hazards: {
        flashPointC: p.hazards.flashPointC ?? null,
        boilingPointC: p.hazards.boilingPointC ?? null,
        isLime: !!p.hazards.isLime,
        containsSilica: !!p.hazards.containsSilica,
        containsDryingOil: !!p.hazards.containsDryingOil,
      },
      sdsUrl: p.sdsUrl,
      notes: p.notes,
    });
    // the hazards are reset after the kind: a lime product saved before the server set its flag shows it ticked
    syncLimeFlag(this.form.controls.kind, this.form.controls.hazards.controls.isLime);
  }

  protected addContainer(): void {
    this.form.controls.containers.push(this.containerGroup({ label: '', size: 1, unit: this.form.controls.unit.value, price: '' }));
  }

  protected removeContainer(index: number): void {
    this.form.controls.containers.removeAt(index);
  }

  protected async saveProduct(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.controls.containers.length === 0) {
      this.formMessage.set(this.translate.instant(`${E}containersRequired`) as string);
      return;
    }
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const body = this.toBody();
      const current = this.product();
      this.saved.emit(current ? await this.api.updateProduct(current.id, body) : await this.api.createProduct(body));
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }

  private containerGroup(c: Partial<ContainerView> = { label: '1 gal', size: 1, unit: 'gallon', price: '' }) {
    return this.fb.group({
      label: [c.label ?? '', [requiredText, Validators.maxLength(L.containerLabelMax)]],
      size: this.fb.control<number | null>(c.size ?? null, [Validators.required, Validators.min(Number.MIN_VALUE)]),
      unit: this.fb.control<QuantityUnit>(c.unit ?? 'gallon', Validators.required),
      price: [c.price ?? '', [requiredText, amountText]],
    });
  }

  private toBody(): ProductInput {
    const v = this.form.getRawValue();
    const hazards: ProductInput['hazards'] = {};
    if (v.hazards.flashPointC !== null) hazards.flashPointC = v.hazards.flashPointC;
    if (v.hazards.boilingPointC !== null) hazards.boilingPointC = v.hazards.boilingPointC;
    if (v.hazards.isLime) hazards.isLime = true;
    if (v.hazards.containsSilica) hazards.containsSilica = true;
    if (v.hazards.containsDryingOil) hazards.containsDryingOil = true;
    return {
      name: v.name.trim(),
      kind: v.kind,
      unit: v.unit,
      containers: v.containers.map((c) => ({ label: c.label.trim(), size: c.size ?? 0, unit: c.unit, price: toAmount(c.price) ?? '' })),
      hazards,
      sdsUrl: v.sdsUrl.trim(),
      notes: v.notes.trim(),
    };
  }
}
