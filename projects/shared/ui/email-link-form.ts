import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { EMAIL_MAX_LENGTH } from '@layerbook/contracts/types';
import { FieldErrorPipe } from '../forms/field-error-pipe';
import { EMAIL_ERRORS } from '../forms/field-words';
import { hydratedSignal } from '../forms/hydrated';
import { Submission } from '../forms/submission';
import { requiredText } from '../forms/text-validators';
import { TranslatePipe } from '@ngx-translate/core';
import { FormAlert } from './form-alert';
import { provideFieldDefaults } from '../app/field-defaults';

/**
 * "E-mail me a link": one address field and a button, used where a person gets a one-time link
 * (a password reset in admin, a sign-in link in the portal). The page says what the link is for
 * and what happens once it is sent; this form only asks, shows the server's refusal beside the
 * field, and tells the page the address it went to.
 */
@Component({
  selector: 'lb-email-link-form',
  providers: [provideFieldDefaults()],
  imports: [FieldErrorPipe, FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <form [formGroup]="form" (ngSubmit)="requestLink()" novalidate>
      <fieldset class="lb-gate lb-form" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <mat-form-field>
          <mat-label>{{ 'common.emailLinkForm.email' | translate }}</mat-label>
          <input matInput type="email" formControlName="email" autocomplete="email" required />
          <mat-error>{{ form.controls.email | lbFieldError: emailErrors }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="submission.isBusy()">{{ buttonLabel() | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EmailLinkForm {
  /** a words key (or text shown as is) */
  readonly buttonLabel = input.required<string>();
  /** Asks the server for the link; a rejection is shown on the form. */
  readonly send = input.required<(email: string) => Promise<unknown>>();
  readonly sent = output<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  protected readonly emailErrors = EMAIL_ERRORS;
  protected readonly isHydrated = hydratedSignal();

  protected async requestLink(): Promise<void> {
    const email = this.form.getRawValue().email.trim();
    const isSent = await this.submission.send(this.form, async () => {
      await this.send()(email);
      return true;
    });
    if (isSent) this.sent.emit(email);
  }
}
