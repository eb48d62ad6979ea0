import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { HOME_URL } from '../../core/auth/guards';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS, NAME_WORDS, NEW_PASSWORD_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';

@Component({
  selector: 'lb-sign-up',
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
  templateUrl: './sign-up.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignUp {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  protected readonly form = inject(NonNullableFormBuilder).group({
    firmName: ['', [requiredText, Validators.minLength(2), Validators.maxLength(120)]],
    name: ['', [requiredText, Validators.maxLength(120)]],
    email: ['', [requiredText, Validators.email, Validators.maxLength(254)]],
    password: ['', [Validators.required, Validators.minLength(8), Validators.maxLength(128)]],
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = {
    firmName: {
      required: 'Enter the firm name.',
      minlength: 'Enter the firm name.',
      maxlength: 'Use at most 120 characters.',
    },
    name: NAME_WORDS,
    email: EMAIL_WORDS,
    password: NEW_PASSWORD_WORDS,
  };

  protected async createFirm(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { firmName, name, email, password } = this.form.getRawValue();
      await this.auth.signUp({ firmName: firmName.trim(), name: name.trim(), email: email.trim(), password });
      await this.router.navigateByUrl(HOME_URL);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
