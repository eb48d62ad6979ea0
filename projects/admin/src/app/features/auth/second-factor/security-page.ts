import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { TranslatePipe } from '@ngx-translate/core';
import {
  PASSWORD_MAX_LENGTH,
  SECOND_FACTOR_CODE_MAX_LENGTH,
  type SecondFactorEnrolment,
  type SecondFactorStatus,
} from '@layerbook/contracts/types';
import { FieldErrorPipe } from '../../../../../../shared/forms/field-error-pipe';
import { LbDatePipe } from '../../../../../../shared/i18n/format';
import { loadMessage } from '../../../shared/forms/load-message';
import { Submission } from '../../../shared/forms/submission';
import { FormAlert } from '../../../shared/ui/form-alert';
import { RECOVERY_CODE_ERRORS } from './code-field';
import { EnrolPanel } from './enrol-panel';
import { RecoveryCodeList } from './recovery-code-list';
import { SECOND_FACTOR_URL, SecondFactorApi } from './second-factor-api';

/** Sign-in and security for the signed-in owner or office member: their second factor and recovery codes. */
@Component({
  selector: 'lb-security-page',
  imports: [
    EnrolPanel,
    FieldErrorPipe,
    FormAlert,
    LbDatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RecoveryCodeList,
    TranslatePipe,
  ],
  templateUrl: './security-page.html',
  styleUrl: './second-factor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SecurityPage {
  private readonly api = inject(SecondFactorApi);

  protected readonly status = httpResource<SecondFactorStatus>(() => SECOND_FACTOR_URL);
  protected readonly loadMessage = loadMessage(this.status);
  /** The set-up under way (started with the password), or none. */
  protected readonly enrolment = signal<SecondFactorEnrolment | null>(null);
  /** Setting up needs the password, as renewing codes and turning it off do: a session alone is not enough. */
  protected readonly setUpForm = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly setUpSubmission = new Submission();
  /** Recovery codes to show once (after setting up or renewing). */
  protected readonly codes = signal<readonly string[] | null>(null);
  /** New codes need the password: a session alone is not enough (the old codes stop working). */
  protected readonly renewForm = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly renewSubmission = new Submission();
  protected readonly usesPassword = signal(false);
  protected readonly offForm = inject(NonNullableFormBuilder).group({
    proof: ['', [Validators.required, Validators.maxLength(PASSWORD_MAX_LENGTH)]],
  });
  protected readonly offSubmission = new Submission();
  protected readonly words = {
    code: { ...RECOVERY_CODE_ERRORS, required: 'auth.security.proofCodeRequired' },
    password: { required: 'auth.signIn.passwordRequired', maxlength: { key: 'auth.fields.atMost', params: { max: PASSWORD_MAX_LENGTH } } },
  };
  protected readonly codeMax = SECOND_FACTOR_CODE_MAX_LENGTH;

  protected async setUp(): Promise<void> {
    const { password } = this.setUpForm.getRawValue();
    const answer = await this.setUpSubmission.send(this.setUpForm, () => this.api.start({ password }));
    if (answer) {
      this.setUpForm.reset();
      this.enrolment.set(answer);
    }
  }

  protected enrolled(codes: readonly string[]): void {
    this.enrolment.set(null);
    this.codes.set(codes);
    this.status.reload();
  }

  protected async renew(): Promise<void> {
    const { password } = this.renewForm.getRawValue();
    const answer = await this.renewSubmission.send(this.renewForm, () => this.api.renewRecoveryCodes({ password }));
    if (answer) {
      this.renewForm.reset();
      this.codes.set(answer.codes);
      this.status.reload();
    }
  }

  protected switchProof(): void {
    this.usesPassword.update((p) => !p);
    this.offForm.reset();
  }

  protected async turnOff(): Promise<void> {
    const proof = this.offForm.getRawValue().proof;
    const body = this.usesPassword() ? { password: proof } : { code: proof.trim() };
    // The server names `code` or `password`; both land on the one field here.
    const answer = await this.offSubmission.send(this.offForm, () => this.api.turnOff(body));
    if (answer) {
      this.offForm.reset();
      this.status.set(answer);
    }
  }
}
