import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { SECOND_FACTOR_CODE_MAX_LENGTH } from '@layerbook/contracts/types';
import { safeNextUrl } from '../../../core/auth/guards';
import { FieldErrorPipe } from '../../../../../../shared/forms/field-error-pipe';
import { hydratedSignal } from '../../../shared/forms/hydrated';
import { Submission } from '../../../shared/forms/submission';
import { FormAlert } from '../../../shared/ui/form-alert';
import { AuthFrame } from '../auth-frame';
import { StaffAuth } from '../staff-auth';
import { APP_CODE, CODE_ERRORS, RECOVERY_CODE_ERRORS, appCodeDigits } from './code-field';

/** After the password: the code from the person's authenticator app, or one of their recovery codes. */
@Component({
  selector: 'lb-second-factor-code',
  imports: [
    AuthFrame,
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ReactiveFormsModule,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './code-step.html',
  styleUrl: './second-factor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SecondFactorCodeStep {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** Where the visitor was headed before signing in (query parameter). */
  readonly next = input<string>();

  /** A recovery code has letters, so the field stops asking for digits only. */
  protected readonly usesRecoveryCode = signal(false);
  protected readonly form = inject(NonNullableFormBuilder).group({
    code: ['', [Validators.required, Validators.pattern(APP_CODE)]],
  });
  protected readonly submission = new Submission();
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { app: CODE_ERRORS, recovery: RECOVERY_CODE_ERRORS };

  protected switchKind(): void {
    const recovery = !this.usesRecoveryCode();
    this.usesRecoveryCode.set(recovery);
    const code = this.form.controls.code;
    code.setValidators(
      recovery
        ? [Validators.required, Validators.maxLength(SECOND_FACTOR_CODE_MAX_LENGTH)]
        : [Validators.required, Validators.pattern(APP_CODE)],
    );
    code.setValue('');
    code.markAsUntouched();
  }

  protected async check(): Promise<void> {
    await this.submission.send(this.form, async () => {
      const typed = this.form.getRawValue().code;
      const code = this.usesRecoveryCode() ? typed.trim() : appCodeDigits(typed);
      const next = await this.auth.checkSecondFactor({ code }, safeNextUrl(this.next()));
      await this.router.navigateByUrl(next);
    });
  }
}
