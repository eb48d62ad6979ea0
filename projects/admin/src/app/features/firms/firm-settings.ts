import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { FirmSettings, FirmSettingsUpdate } from '@layerbook/contracts';
import { Session } from '../../core/auth/session';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { FirmApi } from './firm-api';
import { EstimatingSettingsForm } from './estimating-settings';
import { StageLikelihoodsForm } from './stage-likelihoods';
import { CURRENCY_CHOICES, LANGUAGE_CHOICES, UNIT_CHOICES, type Language, type UnitSystem } from './firm-choices';
import { timeZoneChoices } from './time-zones';


const TOO_LONG = { maxlength: 'That is too long for this field.' };

@Component({
  selector: 'lb-firm-settings',
  imports: [
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
    EstimatingSettingsForm,
    StageLikelihoodsForm,
  ],
  templateUrl: './firm-settings.html',
  styleUrl: './firm-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FirmSettingsPage {
  private readonly api = inject(FirmApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly fb = inject(NonNullableFormBuilder);

  private readonly session = inject(Session);
  protected readonly isOwner = this.session.isOwner;
  /** Crew are refused the stage likelihoods (they carry money weighting), so the section is not drawn. */
  protected readonly seesStageLikelihoods = this.session.hasRole('office');
  protected readonly currencies = CURRENCY_CHOICES;
  protected readonly unitChoices = UNIT_CHOICES;
  protected readonly languageChoices = LANGUAGE_CHOICES;
  protected readonly timeZones = signal<readonly string[]>(timeZoneChoices(''));
  protected readonly isLoading = signal(true);
  protected readonly isBusy = signal(false);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();

  protected readonly form = this.fb.group({
    name: ['', [requiredText, Validators.minLength(2), Validators.maxLength(120)]],
    addressLine1: ['', Validators.maxLength(120)],
    addressLine2: ['', Validators.maxLength(120)],
    city: ['', Validators.maxLength(80)],
    region: ['', Validators.maxLength(80)],
    postalCode: ['', Validators.maxLength(20)],
    country: ['', [Validators.required, Validators.pattern(/^\s*[A-Za-z]{2}\s*$/)]],
    phone: ['', Validators.maxLength(40)],
    timeZone: ['', Validators.required],
    currency: ['', Validators.required],
    units: this.fb.control<UnitSystem>('imperial'),
    language: this.fb.control<Language>('en'),
  });

  protected readonly words = {
    name: { required: 'Enter the firm name.', minlength: 'Enter the firm name.', maxlength: 'Use at most 120 characters.' },
    line: TOO_LONG,
    country: {
      required: 'Enter a two-letter country code, like US.',
      pattern: 'Use a two-letter country code, like US.',
    },
    timeZone: { required: 'Choose a time zone.' },
    currency: { required: 'Choose a currency.' },
  };

  constructor() {
    void this.load();
  }

  protected async saveSettings(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const saved = await this.api.save(this.toUpdate());
      this.show(saved);
      this.snackBar.open('Settings saved.', 'Close', { duration: 4000 });
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(): Promise<void> {
    try {
      this.show(await this.api.load());
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }

  private show(settings: FirmSettings): void {
    this.timeZones.set(timeZoneChoices(settings.timeZone));
    this.form.reset({
      name: settings.name,
      addressLine1: settings.addressLine1,
      addressLine2: settings.addressLine2,
      city: settings.city,
      region: settings.region,
      postalCode: settings.postalCode,
      country: settings.country,
      phone: settings.phone,
      timeZone: settings.timeZone,
      currency: settings.currency,
      units: settings.units,
      language: settings.language,
    });
    // Only owners may change settings; the server refuses the rest with 403 anyway.
    if (this.isOwner()) {
      this.form.enable();
    } else {
      this.form.disable();
    }
  }

  private toUpdate(): FirmSettingsUpdate {
    const value = this.form.getRawValue();
    return { ...value, country: value.country.trim().toUpperCase() };
  }
}
