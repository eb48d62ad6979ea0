import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import { CLIENT_LIMITS as L, DEFAULT_COUNTRY, type SiteCreate, type SiteView } from '@layerbook/contracts/types';
import { COUNTRY_CHOICES } from '../../shared/forms/country-choices';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { tooLongError } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { YEAR_WORDS, toYear, yearText } from '../../shared/forms/year-input';
import { FormAlert } from '../../shared/ui/form-alert';
import { Session } from '../../core/auth/session';
import { ClientApi } from './client-api';

/** A place where work happens; adds one to a client, or edits the one it is given. */
@Component({
  selector: 'lb-site-form',
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  templateUrl: './site-form.html',
  styleUrl: './site-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SiteForm implements OnInit {
  private readonly api = inject(ClientApi);

  readonly clientId = input.required<string>();
  readonly site = input<SiteView | null>(null);
  readonly saved = output<SiteView>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.site() === null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly words = {
    label: tooLongError(L.siteLabel),
    street: { required: 'clients.siteForm.errors.streetRequired', ...tooLongError(L.addressLine1) },
    addressLine2: tooLongError(L.addressLine2),
    city: tooLongError(L.city),
    region: tooLongError(L.region),
    postalCode: tooLongError(L.postalCode),
    accessNotes: tooLongError(L.accessNotes),
    year: YEAR_WORDS,
    country: { required: 'clients.siteForm.errors.countryRequired' },
  } satisfies Record<string, FieldErrorWords>;
  /** The firm's list (ISO 3166-1), by name; the API takes only these codes. */
  protected readonly countries = COUNTRY_CHOICES;
  /** A new site is most likely where the firm works (the session carries the firm's country). */
  private readonly firmCountry = inject(Session).user()?.country ?? DEFAULT_COUNTRY;

  protected readonly form = inject(NonNullableFormBuilder).group({
    label: ['', Validators.maxLength(L.siteLabel)],
    addressLine1: ['', [requiredText, Validators.maxLength(L.addressLine1)]],
    addressLine2: ['', Validators.maxLength(L.addressLine2)],
    city: ['', Validators.maxLength(L.city)],
    region: ['', Validators.maxLength(L.region)],
    postalCode: ['', Validators.maxLength(L.postalCode)],
    country: [this.firmCountry, Validators.required],
    yearBuilt: ['', yearText],
    accessNotes: ['', Validators.maxLength(L.accessNotes)],
  });

  ngOnInit(): void {
    const site = this.site();
    if (site) {
      this.form.reset({
        label: site.label,
        addressLine1: site.addressLine1,
        addressLine2: site.addressLine2,
        city: site.city,
        region: site.region,
        postalCode: site.postalCode,
        // A code from before the list was enforced is not offered: the office chooses again.
        country: COUNTRY_CHOICES.some((c) => c.code === site.country) ? site.country : '',
        yearBuilt: site.yearBuilt === null ? '' : String(site.yearBuilt),
        accessNotes: site.accessNotes,
      });
    }
  }

  protected async saveSite(): Promise<void> {
    const current = this.site();
    const saved = await this.submission.send(this.form, () =>
      current ? this.api.updateSite(current.id, this.toBody()) : this.api.addSite(this.clientId(), this.toBody()),
    );
    if (saved) {
      this.form.reset();
      this.saved.emit(saved);
    }
  }

  private toBody(): SiteCreate {
    const v = this.form.getRawValue();
    return {
      label: v.label.trim(),
      addressLine1: v.addressLine1.trim(),
      addressLine2: v.addressLine2.trim(),
      city: v.city.trim(),
      region: v.region.trim(),
      postalCode: v.postalCode.trim(),
      country: v.country,
      yearBuilt: toYear(v.yearBuilt),
      accessNotes: v.accessNotes.trim(),
    };
  }
}
