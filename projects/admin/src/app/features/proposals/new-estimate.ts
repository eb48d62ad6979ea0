import { ChangeDetectionStrategy, Component, DestroyRef, inject, input, OnInit, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { ESTIMATE_INPUT_LIMITS, type ClientSummary, type SiteView } from '@layerbook/contracts/types';
import { catchError, debounceTime, distinctUntilChanged, filter, map, of, switchMap } from 'rxjs';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { dateYearInRange, toIsoDate } from '../../shared/forms/iso-date';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { EstimateApi } from './estimate-api';
import { WORDS } from './estimate-form';

const SEARCH_PAUSE_MS = 250;

function chosenClient(control: AbstractControl<string | ClientSummary | null>): ValidationErrors | null {
  return typeof control.value === 'object' && control.value !== null ? null : { client: true };
}

/**
 * Starts an estimate: which client, which of their sites, a title and a start date. Opened from an
 * inquiry (`?inquiry=<id>`), it starts from that inquiry's client and site and is tied to it, so the
 * client's acceptance marks the inquiry won.
 */
@Component({
  selector: 'lb-new-estimate',
  imports: [
    FormAlert,
    MatAutocompleteModule,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
    TranslatePipe,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './new-estimate.html',
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(16rem, 1fr));
      gap: 1rem;
      align-items: start;
      max-width: 48rem;
    }
    .wide,
    lb-form-alert,
    .lb-form-actions,
    .lb-notice {
      grid-column: 1 / -1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewEstimate implements OnInit {
  private readonly api = inject(EstimateApi);
  private readonly router = inject(Router);

  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly matches = signal<readonly ClientSummary[]>([]);
  protected readonly sites = signal<readonly SiteView[] | null>(null);
  /** from the query (withComponentInputBinding): the inquiry this estimate answers */
  readonly inquiry = input<string | undefined>();
  /** the inquiry tied to the estimate while its client is the one chosen */
  protected readonly fromInquiry = signal<{ id: string; clientId: string; contactName: string } | null>(null);
  protected readonly errorText = errorText;
  protected readonly words = {
    client: { client: 'Choose a client from the list.' },
    site: { required: 'Choose the site where the work is.' },
    title: WORDS.title,
    startDate: WORDS.startDate,
  };

  protected readonly form = new FormGroup({
    client: new FormControl<string | ClientSummary | null>('', chosenClient),
    siteId: new FormControl('', { nonNullable: true, validators: Validators.required }),
    title: new FormControl('', { nonNullable: true, validators: [requiredText, Validators.maxLength(ESTIMATE_INPUT_LIMITS.titleMax)] }),
    // Most estimates are for work starting soon; the office changes it when the date is known.
    startDate: new FormControl<Date | null>(new Date(), [Validators.required, dateYearInRange]),
  });

  constructor() {
    this.form.controls.client.valueChanges
      .pipe(
        filter((v): v is string => typeof v === 'string'),
        map((q) => q.trim()),
        debounceTime(SEARCH_PAUSE_MS),
        distinctUntilChanged(),
        switchMap((q) =>
          q.length === 0
            ? of([])
            : this.api.findClients(q).pipe(
                map((page) => page.items),
                catchError(() => of([])),
              ),
        ),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe((items) => this.matches.set(items));
  }

  ngOnInit(): void {
    const id = this.inquiry();
    if (id) void this.startFromInquiry(id);
  }

  private async startFromInquiry(id: string): Promise<void> {
    try {
      const inquiry = await this.api.inquiry(id);
      if (!inquiry.clientId) return;
      const client = await this.api.client(inquiry.clientId);
      this.fromInquiry.set({ id: inquiry.id, clientId: client.id, contactName: inquiry.contactName });
      this.form.controls.client.setValue(client);
      this.sites.set(client.sites);
      const site = client.sites.find((s) => s.id === inquiry.siteId) ?? (client.sites.length === 1 ? client.sites[0] : undefined);
      if (site) this.form.controls.siteId.setValue(site.id);
      if (inquiry.finishIdea.trim()) this.form.controls.title.setValue(inquiry.finishIdea.trim().slice(0, ESTIMATE_INPUT_LIMITS.titleMax));
    } catch (error) {
      this.formMessage.set(toProblem(error).title);
    }
  }

  protected clientName(value: string | ClientSummary | null): string {
    return typeof value === 'object' && value !== null ? value.name : (value ?? '');
  }

  protected chosenClientId(): string {
    const value = this.form.controls.client.value;
    return typeof value === 'object' && value !== null ? value.id : '';
  }

  protected async chooseClient(event: MatAutocompleteSelectedEvent): Promise<void> {
    const client = event.option.value as ClientSummary;
    this.sites.set(null);
    this.form.controls.siteId.reset('');
    try {
      const detail = await this.api.client(client.id);
      this.sites.set(detail.sites);
      if (detail.sites.length === 1) this.form.controls.siteId.setValue(detail.sites[0].id);
    } catch (error) {
      this.formMessage.set(toProblem(error).title);
    }
  }

  protected siteName(site: SiteView): string {
    const place = [site.addressLine1, site.city].filter(Boolean).join(', ');
    return site.label ? `${site.label} — ${place}` : place;
  }

  protected async createEstimate(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    this.isBusy.set(true);
    try {
      const made = await this.api.create({
        siteId: v.siteId,
        // Tied to the inquiry only while its client is the one chosen.
        inquiryId: this.fromInquiry()?.clientId === this.chosenClientId() ? (this.fromInquiry()?.id ?? null) : null,
        title: v.title.trim(),
        startDate: toIsoDate(v.startDate) ?? '',
      });
      await this.router.navigate(['/estimates', made.id]);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
