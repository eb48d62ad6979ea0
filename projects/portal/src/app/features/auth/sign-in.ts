import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { EmailLinkForm } from '../../shared/ui/email-link-form';
import { AuthFrame } from './auth-frame';
import { PortalAuth } from './portal-auth';

@Component({
  selector: 'lb-sign-in',
  imports: [AuthFrame, EmailLinkForm, MatButtonModule, MatIconModule, TranslatePipe],
  templateUrl: './sign-in.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(PortalAuth);

  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly sendLink = (email: string) => this.auth.requestLink({ email });

  protected startAgain(): void {
    this.sentTo.set(null);
  }
}
