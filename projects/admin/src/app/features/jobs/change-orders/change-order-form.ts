import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import {
  CHANGE_ORDER_LIMITS,
  type ChangeOrderView,
  type FinishSystemSummary,
  type ItemList,
  type JobDetail,
  type TakeoffView,
} from '@layerbook/contracts/types';
import { applyProblem } from '../../../core/errors/apply-problem';
import { toProblem } from '../../../core/errors/problem';
import { errorText } from '../../../shared/forms/error-text';
import { hydratedSignal } from '../../../shared/forms/hydrated';
import { loadMessage } from '../../../shared/forms/load-message';
import { FormAlert } from '../../../shared/ui/form-alert';
import { ChangeOrderApi } from './change-order-api';
import {
  CHANGE_ORDER_WORDS,
  applyPricingKind,
  changeOrderForm,
  fillChangeOrder,
  placeSurfaceProblems,
  readChangeOrder,
  surfaceGroups,
  type PricingKind,
} from './change-order-form-model';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * Adds a change order to a job, or changes a draft: a title, what changes, and its price — a lump
 * sum (negative to deduct) or priced by the engine from surfaces of the site and a finish system.
 */
@Component({
  selector: 'lb-change-order-form',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  template: `
    <form class="panel" [formGroup]="form" (ngSubmit)="save()" novalidate [attr.aria-labelledby]="headingId()">
      <h3 [id]="headingId()">
        {{
          draft() ? ('jobs.changeOrderForm.changeOrder' | translate) + draft()!.number : ('jobs.changeOrderForm.newChangeOrder' | translate)
        }}
      </h3>
      <lb-form-alert [message]="message() ?? loadFailure()" />
      <fieldset class="lb-gate form" [disabled]="!isHydrated() || isSaving()">
        <mat-form-field>
          <mat-label>{{ 'jobs.changeOrderForm.title' | translate }}</mat-label>
          <input matInput formControlName="title" required [maxlength]="titleMax" />
          <mat-hint>{{ 'jobs.changeOrderForm.whatTheClientWill' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.title, words.title) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'jobs.changeOrderForm.whatChanges' | translate }}</mat-label>
          <textarea matInput formControlName="description" rows="3"></textarea>
          <mat-error>{{ errorText(form.controls.description, words.description) }}</mat-error>
        </mat-form-field>
        <ng-container formGroupName="pricing">
          <p [id]="headingId() + '-kind'" class="group-label">{{ 'jobs.changeOrderForm.howToPriceIt' | translate }}</p>
          <mat-radio-group
            formControlName="kind"
            [attr.aria-labelledby]="headingId() + '-kind'"
            class="choices"
            (change)="choosePricing($event.value)"
          >
            <mat-radio-button value="lumpSum">{{ 'jobs.changeOrderForm.aLumpSum' | translate }}</mat-radio-button>
            <mat-radio-button value="engine">{{ 'jobs.changeOrderForm.priceItFromSurfaces' | translate }}</mat-radio-button>
          </mat-radio-group>
          @if (kind() === 'lumpSum') {
            <mat-form-field>
              <mat-label>{{ 'jobs.changeOrderForm.priceBeforeTax' | translate }}</mat-label>
              <input matInput formControlName="price" inputmode="decimal" autocomplete="off" required />
              <mat-hint>{{ 'jobs.changeOrderForm.negativeToDeductLike' | translate }}</mat-hint>
              <mat-error>{{ errorText(form.controls.pricing.controls.price, words.price) }}</mat-error>
            </mat-form-field>
          } @else {
            <mat-form-field>
              <mat-label>{{ 'jobs.changeOrderForm.surfaces' | translate }}</mat-label>
              <mat-select formControlName="surfaceIds" multiple required>
                @for (group of surfaces(); track group.room) {
                  <mat-optgroup [label]="group.room">
                    @for (s of group.surfaces; track s.id) {
                      <mat-option [value]="s.id">{{ group.room }} · {{ s.name }}</mat-option>
                    }
                  </mat-optgroup>
                }
              </mat-select>
              <mat-hint>{{ 'jobs.changeOrderForm.measuredSurfacesOfThe' | translate }}</mat-hint>
              <mat-error>{{ errorText(form.controls.pricing.controls.surfaceIds, words.surfaceIds) }}</mat-error>
            </mat-form-field>
            <mat-form-field>
              <mat-label>{{ 'jobs.changeOrderForm.finishSystem' | translate }}</mat-label>
              <mat-select formControlName="finishSystemId" required>
                @for (f of systems(); track f.id) {
                  <mat-option [value]="f.id">{{ f.name }}</mat-option>
                }
              </mat-select>
              <mat-hint>{{ 'jobs.changeOrderForm.pricedByTheSame' | translate }}</mat-hint>
              <mat-error>{{ errorText(form.controls.pricing.controls.finishSystemId, words.finishSystemId) }}</mat-error>
            </mat-form-field>
          }
        </ng-container>
        <div class="actions">
          <button mat-flat-button type="submit">
            <mat-icon aria-hidden="true">{{ draft() ? 'save' : 'note_add' }}</mat-icon>
            {{ draft() ? ('jobs.changeOrderForm.saveChanges' | translate) : ('jobs.changeOrderForm.addTheChangeOrder' | translate) }}
          </button>
          <button mat-button type="button" (click)="cancelled.emit()">{{ 'jobs.changeOrderForm.cancel' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styleUrl: '../billing/billing-section.scss',
  styles: `
    :host {
      margin-top: 0.75rem;
    }
    .form {
      display: grid;
      gap: 1rem;
      border: 0;
      padding: 0;
      margin: 0;
    }
    .group-label {
      font-weight: 600;
      margin: 0;
    }
    .choices {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangeOrderForm implements OnInit {
  private readonly api = inject(ChangeOrderApi);

  readonly jobId = input.required<string>();
  /** the draft to change; none adds a new one */
  readonly draft = input<ChangeOrderView | null>(null);
  readonly saved = output<ChangeOrderView>();
  readonly cancelled = output<void>();

  protected readonly form = changeOrderForm();
  protected readonly kind = signal<PricingKind>('lumpSum');
  protected readonly isHydrated = hydratedSignal();
  protected readonly isSaving = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly words = CHANGE_ORDER_WORDS;
  protected readonly errorText = errorText;
  protected readonly titleMax = CHANGE_ORDER_LIMITS.titleMaxLength;
  protected readonly headingId = computed(() => `change-order-form-${this.draft()?.id ?? 'new'}`);

  /** The site and the library, read once the office chooses to price from surfaces. */
  private readonly job = httpResource<JobDetail>(() =>
    this.kind() === 'engine' ? `/api/jobs/${encodeURIComponent(this.jobId())}` : undefined,
  );
  private readonly takeoff = httpResource<TakeoffView>(() =>
    this.job.hasValue() ? `/api/takeoff/sites/${encodeURIComponent(this.job.value().siteId)}` : undefined,
  );
  private readonly library = httpResource<ItemList<FinishSystemSummary>>(() =>
    this.kind() === 'engine' ? '/api/library/systems' : undefined,
  );
  protected readonly surfaces = computed(() => (this.takeoff.hasValue() ? surfaceGroups(this.takeoff.value()) : []));
  protected readonly systems = computed(() => (this.library.hasValue() ? this.library.value().items : []));
  private readonly jobFailure = loadMessage(this.job);
  private readonly takeoffFailure = loadMessage(this.takeoff);
  private readonly libraryFailure = loadMessage(this.library);
  protected readonly loadFailure = computed(() => this.jobFailure() ?? this.takeoffFailure() ?? this.libraryFailure());

  ngOnInit(): void {
    const draft = this.draft();
    if (draft) {
      fillChangeOrder(this.form, draft);
      this.kind.set(draft.pricing.kind);
    }
  }

  protected choosePricing(kind: PricingKind): void {
    this.kind.set(kind);
    applyPricingKind(this.form);
  }

  protected async save(): Promise<void> {
    this.message.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.message.set('Some fields need attention; the messages are beside them.');
      return;
    }
    const body = readChangeOrder(this.form);
    const draft = this.draft();
    this.isSaving.set(true);
    try {
      this.saved.emit(draft ? await this.api.update(draft.id, body) : await this.api.create(this.jobId(), body));
    } catch (error) {
      this.message.set(applyProblem(this.form, placeSurfaceProblems(toProblem(error))));
    } finally {
      this.isSaving.set(false);
    }
  }
}
