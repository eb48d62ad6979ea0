import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { SIGNED_NAME_MAX, SIGNED_NAME_MIN, type PortalProposal, type PortalProposalAccepted } from '@layerbook/contracts/types';
import { acceptedSum, minorUnitDigits } from '@layerbook/domain';
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

/** The typed signature: one option, the add-ons taken with it, the client's full name, and a ticked box. */
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
        @if (addOns().length) {
          <div>
            <p id="addons-label" class="group-label">{{ 'proposals.acceptance.addOns' | translate }}</p>
            <div role="group" aria-labelledby="addons-label" class="choices">
              @for (addOn of addOns(); track addOn.id) {
                <mat-checkbox [checked]="taken().includes(addOn.id)" (change)="take(addOn.id, $event.checked)">{{
                  'proposals.acceptance.option' | translate: { label: addOn.label, total: addOn.total | lbMoney: currency() }
                }}</mat-checkbox>
              }
            </div>
          </div>
        }
        @if (agreed(); as sum) {
          <div class="agreed" aria-live="polite">
            <p class="agreed-total">{{ 'proposals.acceptance.agreedTotal' | translate: { total: sum.total | lbMoney: currency() } }}</p>
            @if (sum.payments; as payments) {
              <p class="hint">{{ 'proposals.acceptance.addOnsSpread' | translate }}</p>
              <ul class="payments">
                @for (payment of payments; track payment.id) {
                  <li>
                    <span>{{ payment.label }}</span> <span class="num">{{ payment.amount | lbMoney: currency() }}</span>
                  </li>
                }
              </ul>
            }
          </div>
        }
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
    .agreed {
      margin: 0.25rem 0 1rem;
    }
    .agreed-total {
      font-weight: 600;
      margin: 0;
    }
    .hint {
      margin: 0.25rem 0;
      font-size: 0.9rem;
    }
    .payments {
      list-style: none;
      padding: 0;
      margin: 0;
      max-width: 28rem;
    }
    .payments li {
      display: flex;
      justify-content: space-between;
      gap: 1rem;
    }
    .num {
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
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
  protected readonly addOns = computed(() => this.proposal().snapshot.addOns);
  protected readonly currency = computed(() => this.proposal().snapshot.currency);
  /** the add-ons ticked, in the proposal's order */
  protected readonly taken = signal<readonly string[]>([]);
  private readonly variantId = toSignal(this.form.controls.variantId.valueChanges, { initialValue: '' });
  /**
   * What the client is about to sign, once an option is chosen: its total with the add-ons ticked,
   * and, when they add to it, the payments as the job will ask for them (acceptedSum, as the server
   * makes the job: the deposit as shown, the later payments carrying the add-ons).
   */
  protected readonly agreed = computed(() => {
    const s = this.proposal().snapshot;
    const option = s.options.find((o) => o.id === this.variantId());
    if (!option) return null;
    const sum = acceptedSum(option, s.addOns, this.taken(), s.currency);
    const digits = minorUnitDigits(s.currency);
    const grown = !sum.total.equals(option.total);
    return {
      total: sum.total.toFixed(digits),
      payments: grown
        ? option.payments.map((p, i) => ({ id: p.id, label: p.label, amount: sum.payments[i].amount.toFixed(digits) }))
        : null,
    };
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = WORDS;
  /** bumped on submit so the radio and checkbox errors (outside mat-form-field) re-check under OnPush */
  private readonly submitted = signal(0);

  protected take(id: string, isTaken: boolean): void {
    const order = this.addOns().map((a) => a.id);
    const next = new Set(this.taken());
    if (isTaken) next.add(id);
    else next.delete(id);
    this.taken.set(order.filter((a) => next.has(a)));
  }

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
      this.decided.emit(
        await this.api.accept(this.proposal().id, { variantId, addOnIds: this.taken(), signedName: signedName.trim(), consent: true }),
      );
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
      this.submitted.update((n) => n + 1);
    } finally {
      this.isBusy.set(false);
    }
  }
}
