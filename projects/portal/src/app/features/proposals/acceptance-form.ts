import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { SIGNED_NAME_MAX, SIGNED_NAME_MIN, type PortalProposal, type PortalProposalAccepted } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ProposalApi } from './proposal-api';
import { TranslatePipe } from '@ngx-translate/core';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { LbMoneyPipe } from '../../../../../shared/i18n/format';

/** Mirrors `proposalAcceptance` in @layerbook/contracts. */
const WORDS = {
  variantId: { required: 'proposals.acceptance.chooseRequired' },
  signedName: {
    required: 'proposals.acceptance.nameRequired',
    minlength: { key: 'proposals.acceptance.nameTooShort', params: { min: SIGNED_NAME_MIN } },
    maxlength: { key: 'proposals.acceptance.tooLong', params: { max: SIGNED_NAME_MAX } },
  },
  consent: { required: 'proposals.acceptance.consentRequired' },
} as const satisfies Record<string, FieldErrorWords>;

/** Trimmed length, as the server counts it. */
const trimmedMin = (min: number) => (c: { value: string }) =>
  c.value.trim().length > 0 && c.value.trim().length < min ? { minlength: true } : null;

/** The typed signature: one option, the client's full name, and a ticked box. */
@Component({
  selector: 'lb-acceptance-form',
  imports: [
    FieldErrorPipe,
    FormAlert,
    LbMoneyPipe,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatRadioModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  template: `
    <form [formGroup]="form" (ngSubmit)="acceptProposal()" novalidate aria-labelledby="accept-heading">
      <h2 id="accept-heading">{{ 'proposals.acceptance.heading' | translate }}</h2>
      <fieldset class="lb-gate lb-form" [disabled]="!isHydrated() || isBusy()">
        <lb-form-alert [message]="formMessage()" />
        <div>
          <p id="choose-label" class="group-label">{{ 'proposals.acceptance.choose' | translate }}</p>
          <mat-radio-group
            formControlName="variantId"
            aria-labelledby="choose-label"
            class="choices"
            [attr.aria-describedby]="showError('variantId') ? 'variant-error' : null"
          >
            @for (option of options(); track option.id) {
              <mat-radio-button [value]="option.id">{{
                'proposals.acceptance.option' | translate: { label: option.label, total: option.total | lbMoney: currency() }
              }}</mat-radio-button>
            }
          </mat-radio-group>
          @if (showError('variantId')) {
            <p class="field-error" id="variant-error">{{ form.controls.variantId | lbFieldError: words.variantId }}</p>
          }
        </div>
        <mat-form-field>
          <mat-label>{{ 'proposals.acceptance.fullName' | translate }}</mat-label>
          <input matInput formControlName="signedName" autocomplete="name" required [maxlength]="signedNameMax" />
          <mat-hint>{{ 'proposals.acceptance.signatureHint' | translate }}</mat-hint>
          <mat-error>{{ form.controls.signedName | lbFieldError: words.signedName }}</mat-error>
        </mat-form-field>
        <div>
          <mat-checkbox formControlName="consent" [attr.aria-describedby]="showError('consent') ? 'consent-error' : null">
            {{ 'proposals.acceptance.consent' | translate }}
          </mat-checkbox>
          @if (showError('consent')) {
            <p class="field-error" id="consent-error">{{ form.controls.consent | lbFieldError: words.consent }}</p>
          }
        </div>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="isBusy()">{{ 'proposals.acceptance.submit' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    h2 {
      font-family: var(--lb-serif);
      margin: 0 0 0.75rem;
    }
    .group-label {
      font-weight: 600;
      margin: 0 0 0.25rem;
    }
    .choices {
      display: flex;
      flex-direction: column;
      align-items: flex-start;
    }
    .field-error {
      color: var(--mat-sys-error);
      margin: 0.25rem 0 0;
      font-size: 0.9rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptanceForm {
  private readonly api = inject(ProposalApi);

  readonly proposal = input.required<PortalProposal>();
  readonly decided = output<PortalProposalAccepted>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    variantId: ['', requiredText],
    signedName: ['', [requiredText, trimmedMin(SIGNED_NAME_MIN), Validators.maxLength(SIGNED_NAME_MAX)]],
    consent: [false, Validators.requiredTrue],
  });
  protected readonly signedNameMax = SIGNED_NAME_MAX;
  protected readonly options = computed(() => this.proposal().snapshot.options);
  protected readonly currency = computed(() => this.proposal().snapshot.currency);
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = WORDS;
  /** bumped on submit so the radio and checkbox errors (outside mat-form-field) re-check under OnPush */
  private readonly submitted = signal(0);

  protected showError(name: 'variantId' | 'consent'): boolean {
    this.submitted();
    const control = this.form.controls[name];
    return control.invalid && control.touched;
  }

  protected async acceptProposal(): Promise<void> {
    this.formMessage.set(null);
    this.submitted.update((n) => n + 1);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { variantId, signedName } = this.form.getRawValue();
      this.decided.emit(await this.api.accept(this.proposal().id, { variantId, signedName: signedName.trim(), consent: true }));
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
      this.submitted.update((n) => n + 1);
    } finally {
      this.isBusy.set(false);
    }
  }
}
