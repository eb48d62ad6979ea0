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
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { FINISH_SYSTEM_LIMITS as L } from '@layerbook/contracts/types';
import { Language } from '../../../../../shared/i18n/language';
import { startWith, switchMap } from 'rxjs';
import { errorText } from '../../shared/forms/error-text';
import { type LayerGroup, addComponent } from './layer-form';
import {
  AREA_UNIT_CHOICES,
  DILUTION_CHOICES,
  METHOD_CHOICES,
  MULTIPLIER_CHOICES,
  UNIT_GROUPS,
  WAIT_PICKS,
  type Words,
  waitWords,
} from './library-words';

export interface ProductChoice {
  readonly id: string;
  readonly label: string;
}

const E = 'library.layerCard.errors.';

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
    TranslatePipe,
  ],
  templateUrl: './layer-card.html',
  styleUrl: './layer-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LayerCard {
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly language = inject(Language);
  private readonly translate = inject(TranslateService);

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
  protected readonly errorText = errorText;
  /** Keys of the library's words per validator; `limits` gives the numbers they name. */
  protected readonly words = {
    name: { required: `${E}nameRequired`, maxlength: 'library.common.atMostChars' },
    choose: { required: 'library.common.chooseFromList' },
    product: { required: `${E}productRequired` },
    amount: { required: `${E}amountRequired`, positive: `${E}amountPositive` },
    parts: { required: `${E}partsRequired`, positive: `${E}partsPositive` },
    coats: { required: `${E}coatsRequired`, min: `${E}coatsMin`, max: `${E}coatsMax`, pattern: `${E}coatsWhole` },
    share: { required: `${E}shareRequired`, positive: `${E}sharePositive`, max: `${E}shareMax` },
    dilution: { min: `${E}dilutionMin`, ofMixMax: `${E}ofMixMax`, ofConcentrateMax: `${E}ofConcentrateMax` },
    waste: { required: `${E}wasteRequired`, min: `${E}wasteMin`, max: `${E}wasteMax` },
    rate: { required: `${E}numberRequired`, positive: `${E}ratePositive` },
    multiplier: { min: `${E}multiplierMin`, max: `${E}multiplierMax` },
    wait: { required: `${E}waitRequired`, min: `${E}waitMin`, max: `${E}waitMax` },
  };
  /** One set of params for every error word: each names only its own (the name's length, coats, dilution, wait). */
  protected readonly limits = {
    max: L.layerNameMax,
    coatsMax: L.coatsMax,
    percent: L.dilutionOfConcentrateMax * 100,
    parts: L.dilutionOfConcentrateMax,
    waitMax: L.waitHoursMax,
  };

  /** Re-read on every change of the layer, so labels and the summary line follow what is typed. */
  private readonly value = toSignal(toObservable(this.layer).pipe(switchMap((g) => g.valueChanges.pipe(startWith(g.getRawValue())))));
  protected readonly heading = computed(() => {
    this.value();
    this.language.current(); // the heading follows a language switch
    const name = this.layer().controls.name.value.trim();
    const n = this.index() + 1;
    return this.translate.instant(name ? 'library.layerCard.headingNamed' : 'library.layerCard.heading', { n, name }) as string;
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
    return DILUTION_CHOICES.find((d) => d.value === convention)?.explainKey ?? '';
  });
  protected readonly waitNow = computed<Words | null>(() => {
    this.value();
    const hours = this.layer().controls.waitHoursAfter.value;
    return hours === null ? null : waitWords(hours, this.language.locale());
  });
  protected readonly anchor = computed(() => `layer-${this.layer().controls.id.value}`);

  protected coverageWord(kind: string): string {
    return kind === 'spreadRate' ? 'library.layerCard.spreadRateAmount' : 'library.layerCard.consumptionAmount';
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
