import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';

@Component({
  selector: 'lb-forgot-password',
  imports: [
    AuthFrame,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './forgot-password.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPassword {
  private readonly auth = inject(StaffAuth);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(254)]],
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { email: EMAIL_WORDS };

  protected async sendResetLink(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const email = this.form.getRawValue().email.trim();
      await this.auth.requestPasswordReset({ email });
      this.sentTo.set(email);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
