import { ChangeDetectionStrategy, Component, inject, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { StaffRole, TeamInvitation } from '@layerbook/contracts';
import { STAFF_ROLES } from '../../core/auth/roles';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ROLE_WORDS } from '../../shared/ui/role-words';
import { TeamApi } from './team-api';

@Component({
  selector: 'lb-invite-form',
  imports: [
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InviteForm {
  private readonly api = inject(TeamApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly invited = output<TeamInvitation>();

  protected readonly roles = STAFF_ROLES;
  protected readonly roleWords = ROLE_WORDS;
  protected readonly form = this.fb.group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(254)]],
    role: this.fb.control<StaffRole>('crew', Validators.required),
  });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { email: EMAIL_WORDS, role: { required: 'Choose a role.' } };

  protected async sendInvitation(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { email, role } = this.form.getRawValue();
      const invitation = await this.api.invite({ email: email.trim(), role });
      this.form.reset({ email: '', role: 'crew' });
      this.invited.emit(invitation);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
