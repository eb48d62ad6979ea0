import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, isWellFormedLinkToken } from '@layerbook/contracts/types';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { NEW_PASSWORD_ERRORS } from '../../shared/forms/field-words';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-reset-password',
  imports: [
    FieldErrorPipe,
    TranslatePipe,
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

  protected readonly hasToken = computed(() => isWellFormedLinkToken(this.token()));
  protected readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH), Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  /** Expired, used or unknown links cannot be fixed on this page; offer a new one instead. */
  protected readonly isLinkDead = signal(false);
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { password: NEW_PASSWORD_ERRORS };

  protected async saveNewPassword(): Promise<void> {
    const token = this.token();
    if (!isWellFormedLinkToken(token)) {
      this.form.markAllAsTouched();
      return;
    }
    await this.submission.send(this.form, async () => {
      let next: string;
      try {
        next = await this.auth.completePasswordReset({ token, password: this.form.getRawValue().password });
      } catch (error) {
        const status = toProblem(error).status;
        this.isLinkDead.set(status === 404 || status === 410);
        throw error;
      }
      await this.router.navigateByUrl(next);
    });
  }
}
