import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { SiteCreate, SiteView } from '@layerbook/contracts';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { YEAR_WORDS, toYear, yearText } from '../../shared/forms/year-input';
import { FormAlert } from '../../shared/ui/form-alert';
import { ClientApi } from './client-api';

const TOO_LONG = { maxlength: 'That is too long for this field.' };

/** A place where work happens; adds one to a client, or edits the one it is given. */
@Component({
  selector: 'lb-site-form',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
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
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly words = {
    street: { required: 'Enter the street address.', ...TOO_LONG },
    line: TOO_LONG,
    year: YEAR_WORDS,
    country: {
      required: 'Enter a two-letter country code, like US.',
      pattern: 'Use a two-letter country code, like US.',
    },
  };

  protected readonly form = inject(NonNullableFormBuilder).group({
    label: ['', Validators.maxLength(80)],
    addressLine1: ['', [requiredText, Validators.maxLength(200)]],
    addressLine2: ['', Validators.maxLength(200)],
    city: ['', Validators.maxLength(80)],
    region: ['', Validators.maxLength(80)],
    postalCode: ['', Validators.maxLength(20)],
    country: ['US', [Validators.required, Validators.pattern(/^\s*[A-Za-z]{2}\s*$/)]],
    yearBuilt: ['', yearText],
    accessNotes: ['', Validators.maxLength(2000)],
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
        country: site.country,
        yearBuilt: site.yearBuilt === null ? '' : String(site.yearBuilt),
        accessNotes: site.accessNotes,
      });
    }
  }

  protected async saveSite(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const current = this.site();
      const body = this.toBody();
      const saved = current ? await this.api.updateSite(current.id, body) : await this.api.addSite(this.clientId(), body);
      this.form.reset();
      this.saved.emit(saved);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
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
      country: v.country.trim().toUpperCase(),
      yearBuilt: toYear(v.yearBuilt),
      accessNotes: v.accessNotes.trim(),
    };
  }
}
