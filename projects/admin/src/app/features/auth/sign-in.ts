import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { safeNextUrl } from '../../core/auth/guards';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';

@Component({
  selector: 'lb-sign-in',
  imports: [
    AuthFrame,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ReactiveFormsModule,
    RevealPassword,
    RouterLink,
  ],
  templateUrl: './sign-in.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** Where the visitor was headed before being sent here (query parameter). */
  readonly next = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(254)]],
    password: ['', [Validators.required, Validators.maxLength(128)]],
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = {
    email: EMAIL_WORDS,
    password: { required: 'Enter your password.', maxlength: 'Use at most 128 characters.' },
  };

  protected async signIn(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { email, password } = this.form.getRawValue();
      await this.auth.signIn({ email: email.trim(), password });
      await this.router.navigateByUrl(safeNextUrl(this.next()));
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
