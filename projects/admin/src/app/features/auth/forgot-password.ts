import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EmailLinkForm } from '../../shared/ui/email-link-form';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-forgot-password',
  imports: [TranslatePipe, AuthFrame, EmailLinkForm, MatIconModule, RouterLink],
  templateUrl: './forgot-password.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPassword {
  private readonly auth = inject(StaffAuth);

  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly sendResetLink = (email: string) => this.auth.requestPasswordReset({ email });
}
