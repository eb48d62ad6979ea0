import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { EMAIL_MAX_LENGTH } from '@layerbook/contracts/types';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS } from '../../shared/forms/field-words';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { AuthFrame } from './auth-frame';
import { PortalAuth } from './portal-auth';

@Component({
  selector: 'lb-sign-in',
  imports: [AuthFrame, FormAlert, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, ReactiveFormsModule],
  templateUrl: './sign-in.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(PortalAuth);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [requiredText, Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
  });
  protected readonly submission = new Submission();
  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly isHydrated = hydratedSignal();
  protected readonly words = { email: EMAIL_WORDS };

  protected async sendLink(): Promise<void> {
    const email = this.form.getRawValue().email.trim();
    await this.submission.send(this.form, async () => {
      await this.auth.requestLink({ email });
      this.sentTo.set(email);
    });
  }

  protected startAgain(): void {
    this.sentTo.set(null);
  }
}
