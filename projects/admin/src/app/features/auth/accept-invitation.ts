import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router } from '@angular/router';
import {
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  PERSON_NAME_MAX_LENGTH,
  isWellFormedLinkToken,
  type InvitationPreview,
} from '@layerbook/contracts/types';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { NAME_ERRORS, NEW_PASSWORD_ERRORS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-accept-invitation',
  imports: [
    FieldErrorPipe,
    TranslatePipe,
    AuthFrame,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RevealPassword,
  ],
  templateUrl: './accept-invitation.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitation {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** The one-time code from the e-mailed invitation (query parameter). */
  readonly token = input<string>();

  protected readonly hasToken = computed(() => isWellFormedLinkToken(this.token()));
  protected readonly preview = httpResource<InvitationPreview>(() => {
    const token = this.token();
    return isWellFormedLinkToken(token) ? `/api/auth/invitations/${encodeURIComponent(token)}` : undefined;
  });
  protected readonly previewProblem = computed(() => {
    const error = this.preview.error();
    return error ? toProblem(error) : null;
  });

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [requiredText, Validators.maxLength(PERSON_NAME_MAX_LENGTH)]],
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH), Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  private readonly hasAccount = computed(() => (this.preview.hasValue() ? this.preview.value().hasAccount : false));
  /** An existing account's name is not asked for: its control drops out of the form's checks. */
  private readonly nameWhenNew = effect(() => {
    const name = this.form.controls.name;
    if (this.hasAccount()) name.disable();
    else name.enable();
  });
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { name: NAME_ERRORS, password: NEW_PASSWORD_ERRORS };

  protected async joinTeam(): Promise<void> {
    const token = this.token();
    if (!isWellFormedLinkToken(token)) {
      this.form.markAllAsTouched();
      return;
    }
    const { name, password } = this.form.getRawValue();
    // Someone who already has an account joins with its password and keeps their name.
    const who = this.hasAccount() ? {} : { name: name.trim() };
    // Busy until the next page is open, so a second click cannot send it twice.
    await this.submission.send(this.form, async () => {
      await this.router.navigateByUrl(await this.auth.acceptInvitation({ token, ...who, password }));
    });
  }
}
