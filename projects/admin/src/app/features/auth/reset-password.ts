import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
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
import { NEW_PASSWORD_WORDS } from '../../shared/forms/field-words';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { isWellFormedToken } from './link-token';
import { StaffAuth } from './staff-auth';

@Component({
  selector: 'lb-reset-password',
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
  templateUrl: './reset-password.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPassword {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** The one-time code from the e-mailed link (query parameter). */
  readonly token = input<string>();

  protected readonly hasToken = computed(() => isWellFormedToken(this.token()));
  protected readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.minLength(8), Validators.maxLength(128)]],
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  /** Expired, used or unknown links cannot be fixed on this page; offer a new one instead. */
  protected readonly isLinkDead = signal(false);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { password: NEW_PASSWORD_WORDS };

  protected async saveNewPassword(): Promise<void> {
    const token = this.token();
    this.formMessage.set(null);
    if (this.form.invalid || !isWellFormedToken(token)) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      await this.auth.completePasswordReset({ token, password: this.form.getRawValue().password });
      await this.router.navigateByUrl(HOME_URL);
    } catch (error) {
      const problem = toProblem(error);
      this.isLinkDead.set(problem.status === 404 || problem.status === 410);
      this.formMessage.set(applyProblem(this.form, problem));
    } finally {
      this.isBusy.set(false);
    }
  }
}
