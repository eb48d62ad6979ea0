import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import {
  ISO_WEEKDAYS,
  OVERHEAD_PROFIT_METHODS,
  OVERHEAD_PROFIT_METHOD_LABELS,
  ROUNDING_KINDS,
  ROUNDING_KIND_LABELS,
  TAX_MODES,
  TAX_MODE_LABELS,
  WEEKDAY_LABELS,
  type EstimatingSettingsView,
} from '@layerbook/contracts/types';
import { map, startWith } from 'rxjs';
import { Session } from '../../core/auth/session';
import { errorText } from '../../shared/forms/error-text';
import { fillWhenLoaded } from '../../shared/forms/fill-when-loaded';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { estimatingForm, fillForm, methodInWords, readForm } from './estimating-form';
import { FirmApi } from './firm-api';
import { readHoliday, withHoliday, withoutHoliday } from './holidays';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

/**
 * The numbers every estimate is built from: labour rate, overhead and profit, minimum charge, tax,
 * rounding, the working calendar and the labour multipliers. The owner sets them; office reads.
 */
@Component({
  selector: 'lb-estimating-settings',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './estimating-settings.html',
  styleUrl: './estimating-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EstimatingSettingsForm {
  private readonly api = inject(FirmApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly isHydrated = hydratedSignal();
  protected readonly estimating = httpResource<EstimatingSettingsView>(() => '/api/firm/estimating');
  protected readonly view = computed(() => (this.estimating.hasValue() ? this.estimating.value() : null));
  private readonly loadFailure = loadMessage(this.estimating);
  protected readonly submission = new Submission();
  protected readonly message = computed(() => this.submission.message() ?? this.loadFailure());
  protected readonly errorText = errorText;
  protected readonly weekdays = ISO_WEEKDAYS;
  protected readonly weekdayLabels = WEEKDAY_LABELS;
  protected readonly methods = OVERHEAD_PROFIT_METHODS;
  protected readonly methodLabels = OVERHEAD_PROFIT_METHOD_LABELS;
  protected readonly taxModes = TAX_MODES;
  protected readonly taxModeLabels = TAX_MODE_LABELS;
  protected readonly roundingKinds = ROUNDING_KINDS;
  protected readonly roundingKindLabels = ROUNDING_KIND_LABELS;
  protected readonly words = {
    required: 'Enter a value.',
    min: 'At least {min}.',
    max: 'At most {max}.',
    pattern: 'Enter an amount like 55.00.',
  };
  protected readonly form = estimatingForm();
  /** the day being added to the days off; not part of the settings until added */
  protected readonly newHoliday = new FormControl('', { nonNullable: true });
  private readonly holidayList = this.form.controls.calendar.controls.holidays;
  protected readonly holidays = toSignal(this.holidayList.valueChanges, { initialValue: this.holidayList.value });

  private readonly overheadProfit = toSignal(
    this.form.controls.overheadProfit.valueChanges.pipe(
      startWith(null),
      map(() => this.form.controls.overheadProfit.getRawValue()),
    ),
  );
  protected readonly methodWords = computed(() => {
    const op = this.overheadProfit();
    return op ? methodInWords(op.method, op.overheadPercent ?? 0, op.profitPercent ?? 0) : '';
  });
  protected readonly roundingKind = toSignal(this.form.controls.rounding.controls.kind.valueChanges, {
    initialValue: 'minorUnit' as const,
  });

  constructor() {
    fillWhenLoaded(this.estimating, (view) => {
      fillForm(this.form, view.settings);
      if (this.isOwner()) this.form.enable();
      else this.form.disable();
      if (this.isOwner()) this.newHoliday.enable();
      else this.newHoliday.disable();
    });
  }

  protected addHoliday(): void {
    const reading = readHoliday(this.newHoliday.value, this.holidayList.value);
    if ('error' in reading) {
      this.newHoliday.setErrors({ holiday: reading.error });
      this.newHoliday.markAsTouched();
      return;
    }
    this.holidayList.setValue(withHoliday(this.holidayList.value, reading.date));
    this.holidayList.markAsDirty();
    this.newHoliday.reset('');
  }

  protected removeHoliday(date: string): void {
    this.holidayList.setValue(withoutHoliday(this.holidayList.value, date));
    this.holidayList.markAsDirty();
  }

  protected async saveEstimating(): Promise<void> {
    const saved = await this.submission.send(this.form, () => this.api.saveEstimating(readForm(this.form)));
    if (saved) {
      this.estimating.set(saved);
      this.snackBar.open(
        this.translate.instant('firms.snack.estimatingSaved') as string,
        this.translate.instant('ui.snack.close') as string,
        { duration: 4000 },
      );
    }
  }
}
