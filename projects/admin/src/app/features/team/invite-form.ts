import { ChangeDetectionStrategy, Component, inject, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { EMAIL_MAX_LENGTH, INVITATION_DAYS, STAFF_ROLES, type StaffRole, type TeamInvitation } from '@layerbook/contracts/types';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { TeamApi } from './team-api';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-invite-form',
  imports: [
    FieldErrorPipe,
    TranslatePipe,
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
  protected readonly invitationDays = INVITATION_DAYS;
  protected readonly form = this.fb.group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    role: this.fb.control<StaffRole>('crew', Validators.required),
  });
  protected readonly submission = new Submission();
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { email: EMAIL_ERRORS, role: { required: 'team.inviteForm.roleRequired' } };

  protected async sendInvitation(): Promise<void> {
    const { email, role } = this.form.getRawValue();
    const invitation = await this.submission.send(this.form, () => this.api.invite({ email: email.trim(), role }));
    if (invitation) {
      this.form.reset({ email: '', role: 'crew' });
      this.invited.emit(invitation);
    }
  }
}
