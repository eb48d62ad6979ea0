import { CdkDragHandle } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { toObservable } from '@angular/core/rxjs-interop';
import { FINISH_SYSTEM_LIMITS as L } from '@layerbook/contracts/types';
import { waitText } from '@layerbook/domain';
import { startWith, switchMap } from 'rxjs';
import { errorText } from '../../shared/forms/error-text';
import { type LayerGroup, addComponent } from './layer-form';
import { AREA_UNIT_CHOICES, DILUTION_CHOICES, METHOD_CHOICES, MULTIPLIER_CHOICES, UNIT_GROUPS, WAIT_PICKS } from './library-words';

export interface ProductChoice {
  readonly id: string;
  readonly label: string;
}

const NUMBER = { required: 'Enter a number.', positive: 'Enter a number above zero.' };

/** One layer of a finish system, its fields grouped the way a finisher thinks about them. */
@Component({
  selector: 'lb-layer-card',
  imports: [
    CdkDragHandle,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './layer-card.html',
  styleUrl: './layer-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LayerCard {
  private readonly fb = inject(NonNullableFormBuilder);

  readonly layer = input.required<LayerGroup>();
  readonly index = input.required<number>();
  readonly count = input.required<number>();
  readonly products = input.required<readonly ProductChoice[]>();
  readonly isReadOnly = input(false);
  readonly moveUp = output<void>();
  readonly moveDown = output<void>();
  readonly remove = output<void>();

  protected readonly methods = METHOD_CHOICES;
  protected readonly unitGroups = UNIT_GROUPS;
  protected readonly areaUnits = AREA_UNIT_CHOICES;
  protected readonly dilutions = DILUTION_CHOICES;
  protected readonly multipliers = MULTIPLIER_CHOICES;
  protected readonly waitPicks = WAIT_PICKS;
  protected readonly waitText = waitText;
  protected readonly errorText = errorText;
  protected readonly words = {
    name: { required: 'Name the layer, like "Scratch coat" or "Glaze".', maxlength: `Use at most ${L.layerNameMax} characters.` },
    choose: { required: 'Choose from the list.' },
    product: { required: 'Choose a product, or give a mix recipe.' },
    amount: { required: 'Enter how far the product goes.', positive: 'Coverage must be more than zero.' },
    parts: { required: 'Enter the parts.', positive: 'Parts must be more than zero.' },
    coats: {
      required: 'Enter the number of coats.',
      min: 'A layer has at least one coat.',
      max: `Use at most ${L.coatsMax} coats.`,
      pattern: 'Coats are whole numbers.',
    },
    share: {
      required: 'Enter the share of the surface.',
      positive: 'The share must be more than 0 %.',
      max: 'The share is at most 100 %.',
    },
    dilution: {
      min: 'The dilution cannot be negative.',
      ofMixMax: 'Water as a share of the final mix must be under 100 %.',
      ofConcentrateMax: `Water as a share of the product is at most ${L.dilutionOfConcentrateMax * 100} % (${L.dilutionOfConcentrateMax} parts water to 1).`,
    },
    waste: { required: 'Enter the waste (0 for none).', min: 'Waste cannot be negative.', max: 'Waste above 100 % is refused.' },
    rate: { ...NUMBER, positive: 'The production rate must be more than zero.' },
    multiplier: { min: 'A multiplier is at least 1 (no extra time).', max: 'A multiplier above 5 is surely a typo.' },
    wait: {
      required: 'Enter the wait in hours (0 for none).',
      min: 'The wait cannot be negative.',
      max: `Use at most 90 days (${L.waitHoursMax} hours).`,
    },
  };

  /** Re-read on every change of the layer, so labels and the summary line follow what is typed. */
  private readonly value = toSignal(toObservable(this.layer).pipe(switchMap((g) => g.valueChanges.pipe(startWith(g.getRawValue())))));
  protected readonly heading = computed(() => {
    this.value();
    const name = this.layer().controls.name.value.trim();
    return `Layer ${this.index() + 1}${name ? `: ${name}` : ''}`;
  });
  protected readonly isRecipe = computed(() => {
    this.value();
    return this.layer().controls.source.value === 'recipe';
  });
  protected readonly isPerCoat = computed(() => {
    this.value();
    return this.layer().controls.isPerCoat.value;
  });
  protected readonly dilutionExplain = computed(() => {
    this.value();
    const convention = this.layer().controls.dilution.controls.convention.value;
    return DILUTION_CHOICES.find((d) => d.value === convention)?.explain ?? '';
  });
  protected readonly waitNow = computed(() => {
    this.value();
    const hours = this.layer().controls.waitHoursAfter.value;
    return hours === null ? '' : waitText(hours);
  });
  protected readonly anchor = computed(() => `layer-${this.layer().controls.id.value}`);

  protected coverageWord(kind: string): string {
    return kind === 'spreadRate' ? 'Surface one unit covers' : 'Product per unit of surface';
  }

  protected pickWait(hours: number): void {
    const control = this.layer().controls.waitHoursAfter;
    control.setValue(hours);
    control.markAsDirty();
  }

  protected addComponent(): void {
    addComponent(this.fb, this.layer());
  }

  protected removeComponent(i: number): void {
    this.layer().controls.recipe.controls.components.removeAt(i);
  }
}
