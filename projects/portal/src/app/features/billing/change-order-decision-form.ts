import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { CHANGE_ORDER_LIMITS, SIGNED_NAME_MAX, SIGNED_NAME_MIN, type PortalChangeOrder } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ChangeOrderApi } from './change-order-api';
import { TranslatePipe } from '@ngx-translate/core';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';

/** Mirrors `changeOrderDecision` in @layerbook/contracts. */
const WORDS = {
  signedName: {
    required: 'proposals.acceptance.nameRequired',
    minlength: { key: 'proposals.acceptance.nameTooShort', params: { min: SIGNED_NAME_MIN } },
    maxlength: { key: 'proposals.acceptance.tooLong', params: { max: SIGNED_NAME_MAX } },
  },
  consent: { required: 'billing.decision.consentRequired' },
  comment: { maxlength: { key: 'proposals.acceptance.tooLong', params: { max: CHANGE_ORDER_LIMITS.commentMaxLength } } },
} as const satisfies Record<string, FieldErrorWords>;

/** Trimmed length, as the server counts it. */
const trimmedMin = (min: number) => (c: { value: string }) =>
  c.value.trim().length > 0 && c.value.trim().length < min ? { minlength: true } : null;

/** The client's answer: approve with a typed signature and a ticked box, or decline with an optional comment. */
@Component({
  selector: 'lb-change-order-decision',
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  template: `
    <form [formGroup]="approval" (ngSubmit)="approve()" novalidate aria-labelledby="approve-heading">
      <h2 id="approve-heading">{{ 'billing.decision.heading' | translate }}</h2>
      <fieldset class="lb-gate lb-form" [disabled]="!isHydrated() || isBusy()">
        <lb-form-alert [message]="approveMessage()" />
        <mat-form-field>
          <mat-label>{{ 'proposals.acceptance.fullName' | translate }}</mat-label>
          <input matInput formControlName="signedName" autocomplete="name" required [maxlength]="signedNameMax" />
          <mat-hint>{{ 'proposals.acceptance.signatureHint' | translate }}</mat-hint>
          <mat-error>{{ approval.controls.signedName | lbFieldError: words.signedName }}</mat-error>
        </mat-form-field>
        <div>
          <mat-checkbox formControlName="consent" [attr.aria-describedby]="showConsentError() ? 'co-consent-error' : null">
            {{ 'billing.decision.consent' | translate }}
          </mat-checkbox>
          @if (showConsentError()) {
            <p class="field-error" id="co-consent-error">{{ approval.controls.consent | lbFieldError: words.consent }}</p>
          }
        </div>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="isBusy()">{{ 'billing.decision.approve' | translate }}</button>
        </div>
      </fieldset>
    </form>

    <h2>{{ 'billing.decision.notForYou' | translate }}</h2>
    @if (!isDeclining()) {
      <div class="lb-form-actions">
        <button mat-button type="button" [disabled]="!isHydrated()" [attr.aria-expanded]="false" (click)="isDeclining.set(true)">
          {{ 'proposals.answers.decline' | translate }}
        </button>
      </div>
    } @else {
      <form
        [formGroup]="decline"
        (ngSubmit)="sendDecline()"
        novalidate
        class="panel"
        [attr.aria-label]="'billing.decision.declineLabel' | translate"
      >
        <fieldset class="lb-gate lb-form" [disabled]="isBusy()">
          <lb-form-alert [message]="declineMessage()" />
          <mat-form-field>
            <mat-label>{{ 'proposals.answers.declineComment' | translate }}</mat-label>
            <textarea matInput formControlName="comment" rows="3" [maxlength]="commentMax"></textarea>
            <mat-error>{{ decline.controls.comment | lbFieldError: words.comment }}</mat-error>
          </mat-form-field>
          <div class="lb-form-actions">
            <button mat-stroked-button type="submit">{{ 'billing.decision.decline' | translate }}</button>
            <button mat-button type="button" (click)="isDeclining.set(false)">{{ 'billing.decision.cancel' | translate }}</button>
          </div>
        </fieldset>
      </form>
    }
  `,
  styles: `
    h2 {
      font-family: var(--lb-serif);
      margin: 0 0 0.75rem;
    }
    form + h2 {
      margin-top: 1.5rem;
    }
    .panel {
      margin-top: 1rem;
      max-width: 40rem;
    }
    .field-error {
      color: var(--mat-sys-error);
      margin: 0.25rem 0 0;
      font-size: 0.9rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangeOrderDecisionForm {
  private readonly api = inject(ChangeOrderApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly changeOrder = input.required<PortalChangeOrder>();
  readonly decided = output<PortalChangeOrder>();

  protected readonly approval = this.fb.group({
    signedName: ['', [requiredText, trimmedMin(SIGNED_NAME_MIN), Validators.maxLength(SIGNED_NAME_MAX)]],
    consent: [false, Validators.requiredTrue],
  });
  protected readonly decline = this.fb.group({ comment: ['', Validators.maxLength(CHANGE_ORDER_LIMITS.commentMaxLength)] });
  protected readonly signedNameMax = SIGNED_NAME_MAX;
  protected readonly commentMax = CHANGE_ORDER_LIMITS.commentMaxLength;
  protected readonly isBusy = signal(false);
  protected readonly isDeclining = signal(false);
  protected readonly approveMessage = signal<string | null>(null);
  protected readonly declineMessage = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = WORDS;
  /** bumped on submit so the checkbox error (outside mat-form-field) re-checks under OnPush */
  private readonly submitted = signal(0);

  protected showConsentError(): boolean {
    this.submitted();
    const control = this.approval.controls.consent;
    return control.invalid && control.touched;
  }

  protected async approve(): Promise<void> {
    this.approveMessage.set(null);
    this.submitted.update((n) => n + 1);
    if (this.approval.invalid) {
      this.approval.markAllAsTouched();
      return;
    }
    const { signedName } = this.approval.getRawValue();
    await this.send(this.approval, this.approveMessage, () =>
      this.api.decide(this.changeOrder().id, { decision: 'approve', signedName: signedName.trim(), consent: true }),
    );
  }

  protected async sendDecline(): Promise<void> {
    this.declineMessage.set(null);
    if (this.decline.invalid) {
      this.decline.markAllAsTouched();
      return;
    }
    const comment = this.decline.getRawValue().comment.trim();
    await this.send(this.decline, this.declineMessage, () =>
      this.api.decide(this.changeOrder().id, { decision: 'decline', ...(comment ? { comment } : {}) }),
    );
  }

  private async send(
    form: typeof this.approval | typeof this.decline,
    message: typeof this.approveMessage,
    call: () => Promise<PortalChangeOrder>,
  ): Promise<void> {
    this.isBusy.set(true);
    try {
      this.decided.emit(await call());
    } catch (error) {
      message.set(applyProblem(form, toProblem(error)));
      this.submitted.update((n) => n + 1);
    } finally {
      this.isBusy.set(false);
    }
  }
}
