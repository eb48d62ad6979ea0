import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type { InvitationPreview } from '@layerbook/contracts';
import { HOME_URL } from '../../core/auth/guards';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { NAME_WORDS, NEW_PASSWORD_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { RevealPassword } from '../../shared/ui/reveal-password';
import { ROLE_WORDS } from '../../shared/ui/role-words';
import { AuthFrame } from './auth-frame';
import { isWellFormedToken } from './link-token';
import { StaffAuth } from './staff-auth';

@Component({
  selector: 'lb-accept-invitation',
  imports: [
    AuthFrame,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RevealPassword,
    RouterLink,
  ],
  templateUrl: './accept-invitation.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitation {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** The one-time code from the e-mailed invitation (query parameter). */
  readonly token = input<string>();

  protected readonly hasToken = computed(() => isWellFormedToken(this.token()));
  protected readonly preview = httpResource<InvitationPreview>(() => {
    const token = this.token();
    return isWellFormedToken(token) ? `/api/auth/invitations/${encodeURIComponent(token)}` : undefined;
  });
  protected readonly previewProblem = computed(() => {
    const error = this.preview.error();
    return error ? toProblem(error) : null;
  });
  protected readonly roleWords = ROLE_WORDS;

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [requiredText, Validators.maxLength(120)]],
    password: ['', [Validators.required, Validators.minLength(8), Validators.maxLength(128)]],
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { name: NAME_WORDS, password: NEW_PASSWORD_WORDS };

  protected async joinTeam(): Promise<void> {
    const token = this.token();
    this.formMessage.set(null);
    if (this.form.invalid || !isWellFormedToken(token)) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { name, password } = this.form.getRawValue();
      await this.auth.acceptInvitation({ token, name: name.trim(), password });
      await this.router.navigateByUrl(HOME_URL);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
