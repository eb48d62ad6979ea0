import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH } from '@layerbook/contracts/types';
import { safeNextUrl } from '../../core/auth/guards';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-sign-in',
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
  templateUrl: './sign-in.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** Where the visitor was headed before being sent here (query parameter). */
  readonly next = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    password: ['', [Validators.required, Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = {
    email: EMAIL_ERRORS,
    password: { required: 'auth.signIn.passwordRequired', maxlength: { key: 'auth.fields.atMost', params: { max: PASSWORD_MAX_LENGTH } } },
  };

  protected async signIn(): Promise<void> {
    const { email, password } = this.form.getRawValue();
    // Busy until the next page is open, so a second click cannot send it twice.
    await this.submission.send(this.form, async () => {
      await this.router.navigateByUrl(await this.auth.signIn({ email: email.trim(), password }, safeNextUrl(this.next())));
    });
  }
}
