import { ChangeDetectionStrategy, Component, afterNextRender, inject, input, linkedSignal, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { TranslatePipe } from '@ngx-translate/core';
import type { SecondFactorEnrolment } from '@layerbook/contracts/types';
import { FieldErrorPipe } from '../../../../../../shared/forms/field-error-pipe';
import { problemMessage } from '../../../core/errors/problem';
import { Submission } from '../../../shared/forms/submission';
import { FormAlert } from '../../../shared/ui/form-alert';
import { APP_CODE, CODE_ERRORS, appCodeDigits } from './code-field';
import { SecondFactorApi } from './second-factor-api';

/**
 * Setting up a second factor: the server makes a secret and answers it as a QR code (and in groups
 * for typing); the first right code from the app turns it on and answers the recovery codes. At
 * sign-in (the firm requires one) the panel starts the set-up itself; signed in, the security page
 * starts it with the password and hands the answer in as `begun`.
 */
@Component({
  selector: 'lb-enrol-panel',
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  templateUrl: './enrol-panel.html',
  styleUrl: './second-factor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EnrolPanel {
  private readonly api = inject(SecondFactorApi);

  /** The recovery codes, once the factor is on. */
  readonly enrolled = output<readonly string[]>();

  /** A set-up already started (with the password, on the security page); none: the panel starts one. */
  readonly begun = input<SecondFactorEnrolment | null>(null);

  protected readonly enrolment = linkedSignal<SecondFactorEnrolment | null>(() => this.begun());
  protected readonly startFailed = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({ code: ['', [Validators.required, Validators.pattern(APP_CODE)]] });
  protected readonly submission = new Submission();
  protected readonly words = { code: CODE_ERRORS };

  constructor() {
    // In the browser only: a server render must not make a secret nobody sees.
    afterNextRender(() => {
      if (!this.begun()) void this.start();
    });
  }

  protected async start(): Promise<void> {
    this.startFailed.set(null);
    try {
      this.enrolment.set(await this.api.start());
    } catch (error) {
      this.startFailed.set(problemMessage(error));
    }
  }

  protected async confirm(): Promise<void> {
    const answer = await this.submission.send(this.form, () => this.api.confirm({ code: appCodeDigits(this.form.getRawValue().code) }));
    if (answer) this.enrolled.emit(answer.codes);
  }
}
