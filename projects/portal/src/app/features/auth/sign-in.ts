import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { HOME_URL } from '../../core/auth/guards';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { EmailLinkForm } from '../../shared/ui/email-link-form';
import { AuthFrame } from './auth-frame';
import { nextUrl } from './next-url';
import { PortalAuth } from './portal-auth';

@Component({
  selector: 'lb-sign-in',
  imports: [AuthFrame, EmailLinkForm, MatButtonModule, MatIconModule, TranslatePipe],
  templateUrl: './sign-in.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(PortalAuth);

  /** the page that sent the client here (`/portal/…`, from the guard): the e-mailed link opens it */
  readonly next = input<string>();

  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly sendLink = (email: string) => {
    const next = this.next();
    return this.auth.requestLink(next && nextUrl(next) !== HOME_URL ? { email, next } : { email });
  };

  protected startAgain(): void {
    this.sentTo.set(null);
  }
}
