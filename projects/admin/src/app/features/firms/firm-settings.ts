import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import {
  COMMON_CURRENCIES,
  FIRM_NAME_MAX_LENGTH,
  FIRM_NAME_MIN_LENGTH,
  FIRM_PROFILE_LIMITS as L,
  PHONE_MAX_LENGTH,
  UNIT_SYSTEMS,
  UNIT_SYSTEM_LABELS,
  type FirmSettings,
  type FirmSettingsUpdate,
  type Language,
  type UnitSystem,
} from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { FirmSecondFactor } from '../auth/second-factor/firm-second-factor';
import { COUNTRY_CHOICES } from '../../shared/forms/country-choices';
import { errorText } from '../../shared/forms/error-text';
import { tooLong } from '../../shared/forms/field-words';
import { fillWhenLoaded } from '../../shared/forms/fill-when-loaded';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { EstimatingSettingsForm } from './estimating-settings';
import { FirmApi } from './firm-api';
import { FirmLogo } from './firm-logo';
import { InquiryFormLink } from './inquiry-form-link';
import { StageLikelihoodsForm } from './stage-likelihoods';
import { timeZoneChoices } from './time-zones';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

@Component({
  selector: 'lb-firm-settings',
  imports: [
    TranslatePipe,
    EstimatingSettingsForm,
    FirmLogo,
    FirmSecondFactor,
    FormAlert,
    InquiryFormLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
    StageLikelihoodsForm,
  ],
  templateUrl: './firm-settings.html',
  styleUrl: './firm-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FirmSettingsPage {
  private readonly api = inject(FirmApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly session = inject(Session);

  protected readonly isOwner = this.session.isOwner;
  /** Crew are refused the stage likelihoods (they carry money weighting), so the section is not drawn. */
  protected readonly seesStageLikelihoods = this.session.hasRole('office');
  protected readonly currencies = COMMON_CURRENCIES;
  protected readonly unitSystems = UNIT_SYSTEMS;
  protected readonly unitLabels = UNIT_SYSTEM_LABELS;
  protected readonly countries = COUNTRY_CHOICES;
  protected readonly firm = httpResource<FirmSettings>(() => '/api/firm');
  protected readonly isLoading = computed(() => !this.firm.hasValue() && this.firm.isLoading());
  protected readonly loadMessage = loadMessage(this.firm);
  protected readonly timeZones = computed(() => timeZoneChoices(this.firm.hasValue() ? this.firm.value().timeZone : ''));
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();

  protected readonly form = this.fb.group({
    name: ['', [requiredText, Validators.minLength(FIRM_NAME_MIN_LENGTH), Validators.maxLength(FIRM_NAME_MAX_LENGTH)]],
    addressLine1: ['', Validators.maxLength(L.addressLine1)],
    addressLine2: ['', Validators.maxLength(L.addressLine2)],
    city: ['', Validators.maxLength(L.city)],
    region: ['', Validators.maxLength(L.region)],
    postalCode: ['', Validators.maxLength(L.postalCode)],
    country: ['', Validators.required],
    phone: ['', Validators.maxLength(PHONE_MAX_LENGTH)],
    taxId: ['', Validators.maxLength(L.taxId)],
    timeZone: ['', Validators.required],
    currency: ['', Validators.required],
    units: this.fb.control<UnitSystem>('imperial'),
    language: this.fb.control<Language>('en'),
  });

  protected readonly words = {
    name: { required: 'Enter the firm name.', minlength: 'Enter the firm name.', ...tooLong(FIRM_NAME_MAX_LENGTH) },
    phone: tooLong(PHONE_MAX_LENGTH),
    taxId: tooLong(L.taxId),
    addressLine1: tooLong(L.addressLine1),
    addressLine2: tooLong(L.addressLine2),
    city: tooLong(L.city),
    region: tooLong(L.region),
    postalCode: tooLong(L.postalCode),
    country: { required: 'Choose a country.' },
    timeZone: { required: 'Choose a time zone.' },
    currency: { required: 'Choose a currency.' },
  };

  constructor() {
    fillWhenLoaded(this.firm, (settings) => this.show(settings));
  }

  protected async saveSettings(): Promise<void> {
    const saved = await this.submission.send(this.form, () => this.api.saveProfile(this.toUpdate()));
    if (saved) {
      this.firm.set(saved);
      this.snackBar.open(
        this.translate.instant('firms.snack.settingsSaved') as string,
        this.translate.instant('ui.snack.close') as string,
        { duration: 4000 },
      );
    }
  }

  private show(settings: FirmSettings): void {
    const { name, addressLine1, addressLine2, city, region, postalCode, country, phone, taxId, timeZone, currency, units, language } =
      settings;
    this.form.reset({
      name,
      addressLine1,
      addressLine2,
      city,
      region,
      postalCode,
      country,
      phone,
      taxId,
      timeZone,
      currency,
      units,
      language,
    });
    // The language is kept as it is and sent back unchanged: the choice is hidden until Spanish works.
    // Only owners may change settings; the server refuses the rest with 403 anyway.
    if (this.isOwner()) {
      this.form.enable();
    } else {
      this.form.disable();
    }
  }

  private toUpdate(): FirmSettingsUpdate {
    return this.form.getRawValue();
  }
}
