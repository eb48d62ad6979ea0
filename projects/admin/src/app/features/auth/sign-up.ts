import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import {
  EMAIL_MAX_LENGTH,
  FIRM_NAME_MAX_LENGTH,
  FIRM_NAME_MIN_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  PERSON_NAME_MAX_LENGTH,
} from '@layerbook/contracts/types';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS, NAME_ERRORS, NEW_PASSWORD_ERRORS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-sign-up',
  imports: [
    FieldErrorPipe,
    TranslatePipe,
    AuthFrame,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
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

  /** The address the confirmation link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);

  protected readonly form = inject(NonNullableFormBuilder).group({
    firmName: ['', [requiredText, Validators.minLength(FIRM_NAME_MIN_LENGTH), Validators.maxLength(FIRM_NAME_MAX_LENGTH)]],
    name: ['', [requiredText, Validators.maxLength(PERSON_NAME_MAX_LENGTH)]],
    email: ['', [requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH), Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = {
    firmName: {
      required: 'auth.signUp.firmNameRequired',
      minlength: 'auth.signUp.firmNameRequired',
      maxlength: { key: 'auth.fields.atMost', params: { max: FIRM_NAME_MAX_LENGTH } },
    },
    name: NAME_ERRORS,
    email: EMAIL_ERRORS,
    password: NEW_PASSWORD_ERRORS,
  };

  protected async createFirm(): Promise<void> {
    const { firmName, name, email, password } = this.form.getRawValue();
    await this.submission.send(this.form, async () => {
      await this.auth.signUp({ firmName: firmName.trim(), name: name.trim(), email: email.trim(), password });
      this.sentTo.set(email.trim());
    });
  }
}
