import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, afterNextRender, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { PROBLEM_TYPES, isWellFormedLinkToken } from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { LanguageSwitch } from '../../shared/ui/language-switch';
import { AuthFrame } from './auth-frame';
import { nextUrl } from './next-url';
import { PortalAuth } from './portal-auth';

type LinkState = 'working' | 'incomplete' | 'expired' | 'unknown' | 'accessOff' | 'failed';

/**
 * Redeems an e-mailed sign-in link. Redeeming spends the link (a POST), so it happens only in
 * the browser: mail scanners and link previews that fetch the page must not use it up.
 * A second click on a link by the client still signed in with it passes (the server answers their
 * session); a link the server no longer knows (removed a day after it ran out) cannot say whose it
 * was, so a signed-in client goes on to `next` too, where the server checks the record is theirs.
 */
@Component({
  selector: 'lb-sign-in-link',
  imports: [AuthFrame, LanguageSwitch, MatIconModule, MatProgressBarModule, RouterLink, TranslatePipe, SayPipe],
  templateUrl: './sign-in-link.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInLink {
  private readonly auth = inject(PortalAuth);
  private readonly router = inject(Router);
  private readonly session = inject(Session);

  /** The one-time code from the e-mailed link (query parameter). */
  readonly token = input<string>();
  /** Where the e-mail wants the client to land (query parameter), e.g. `/portal/proposals/…`. */
  readonly next = input<string>();
  /** The language the e-mail was written in (query parameter), carried on to the sign-in page. */
  readonly lang = input<string>();

  protected readonly state = signal<LinkState>('working');
  protected readonly failure = signal('');

  constructor() {
    afterNextRender(() => void this.redeem());
  }

  private async redeem(): Promise<void> {
    const token = this.token();
    if (!isWellFormedLinkToken(token)) {
      this.state.set('incomplete');
      return;
    }
    try {
      await this.auth.redeem({ token });
      await this.router.navigateByUrl(nextUrl(this.next()), { replaceUrl: true });
    } catch (error) {
      const problem = toProblem(error);
      if (problem.status === 404 && (await this.session.load())) {
        await this.router.navigateByUrl(nextUrl(this.next()), { replaceUrl: true });
      } else if (problem.status === 410) {
        this.state.set(problem.type === PROBLEM_TYPES.portalAccessOff ? 'accessOff' : 'expired');
      } else if (problem.status === 404) {
        this.state.set('unknown');
      } else {
        this.failure.set(problem.detail ?? problem.title);
        this.state.set('failed');
      }
    }
  }
}
