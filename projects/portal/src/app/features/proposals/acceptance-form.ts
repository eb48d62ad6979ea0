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
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { formatMoney } from '../../shared/format/money';
import { FormAlert } from '../../shared/ui/form-alert';
import { ProposalApi } from './proposal-api';

/** Mirrors `proposalAcceptance` in @layerbook/contracts. */
const WORDS = {
  variantId: { required: 'Choose an option.' },
  signedName: {
    required: 'Type your full name to sign.',
    minlength: `Type your full name to sign (at least ${SIGNED_NAME_MIN} characters).`,
    maxlength: `Use at most ${SIGNED_NAME_MAX} characters.`,
  },
  consent: { required: 'Tick the box to confirm you accept this proposal.' },
} as const;

/** Trimmed length, as the server counts it. */
const trimmedMin = (min: number) => (c: { value: string }) =>
  c.value.trim().length > 0 && c.value.trim().length < min ? { minlength: true } : null;

/** The typed signature: one option, the client's full name, and a ticked box. */
@Component({
  selector: 'lb-acceptance-form',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, MatRadioModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="acceptProposal()" novalidate aria-labelledby="accept-heading">
      <h2 id="accept-heading">Accept this proposal</h2>
      <fieldset class="lb-gate lb-form" [disabled]="!isHydrated() || isBusy()">
        <lb-form-alert [message]="formMessage()" />
        <div>
          <p id="choose-label" class="group-label">Choose an option</p>
          <mat-radio-group
            formControlName="variantId"
            aria-labelledby="choose-label"
            class="choices"
            [attr.aria-describedby]="showError('variantId') ? 'variant-error' : null"
          >
            @for (option of options(); track option.id) {
              <mat-radio-button [value]="option.id">{{ option.text }}</mat-radio-button>
            }
          </mat-radio-group>
          @if (showError('variantId')) {
            <p class="field-error" id="variant-error">{{ errorText(form.controls.variantId, words.variantId) }}</p>
          }
        </div>
        <mat-form-field>
          <mat-label>Your full name</mat-label>
          <input matInput formControlName="signedName" autocomplete="name" required [maxlength]="signedNameMax" />
          <mat-hint>Typing your name is your signature.</mat-hint>
          <mat-error>{{ errorText(form.controls.signedName, words.signedName) }}</mat-error>
        </mat-form-field>
        <div>
          <mat-checkbox formControlName="consent" [attr.aria-describedby]="showError('consent') ? 'consent-error' : null">
            I accept this proposal and its terms.
          </mat-checkbox>
          @if (showError('consent')) {
            <p class="field-error" id="consent-error">{{ errorText(form.controls.consent, words.consent) }}</p>
          }
        </div>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="isBusy()">Accept this proposal</button>
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
  protected readonly options = computed(() => {
    const s = this.proposal().snapshot;
    return s.options.map((o) => ({ id: o.id, text: `${o.label} — ${formatMoney(o.total, s.currency, s.locale)}` }));
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly errorText = errorText;
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
