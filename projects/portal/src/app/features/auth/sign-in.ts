import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { HOME_URL } from '../../core/auth/guards';
import { Session } from '../../core/auth/session';
import { focusAfterRender } from '../../shared/ui/focus-after-render';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { EmailLinkForm } from '../../shared/ui/email-link-form';
import { LanguageSwitch } from '../../shared/ui/language-switch';
import { AuthFrame } from './auth-frame';
import { nextUrl } from './next-url';
import { PortalAuth } from './portal-auth';

@Component({
  selector: 'lb-sign-in',
  imports: [AuthFrame, EmailLinkForm, LanguageSwitch, MatButtonModule, MatIconModule, TranslatePipe],
  templateUrl: './sign-in.html',
  styles: `
    .sent:focus {
      outline: none;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(PortalAuth);
  private readonly focus = focusAfterRender();

  /** set when this browser's client was signed out because the firm turned their access off */
  protected readonly accessOff = inject(Session).accessOff;

  /** the page that sent the client here (`/portal/…`, from the guard): the e-mailed link opens it */
  readonly next = input<string>();

  /** The address the link went to; set once the request is accepted. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly sendLink = (email: string) => {
    const next = this.next();
    return this.auth.requestLink(next && nextUrl(next) !== HOME_URL ? { email, next } : { email });
  };

  /** The form that had focus is gone: the note saying where the link went takes it. */
  protected showSent(email: string): void {
    this.sentTo.set(email);
    this.focus('.sent');
  }

  protected startAgain(): void {
    this.sentTo.set(null);
    this.focus('input[type=email]');
  }
}
