import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, afterNextRender, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { isWellFormedLinkToken } from '@layerbook/contracts/types';
import { toProblem } from '../../core/errors/problem';
import { AuthFrame } from './auth-frame';
import { nextUrl } from './next-url';
import { PortalAuth } from './portal-auth';

type LinkState = 'working' | 'incomplete' | 'expired' | 'unknown' | 'failed';

/**
 * Redeems an e-mailed sign-in link. Redeeming spends the link (a POST), so it happens only in
 * the browser: mail scanners and link previews that fetch the page must not use it up.
 */
@Component({
  selector: 'lb-sign-in-link',
  imports: [AuthFrame, MatIconModule, MatProgressBarModule, RouterLink, TranslatePipe, SayPipe],
  templateUrl: './sign-in-link.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInLink {
  private readonly auth = inject(PortalAuth);
  private readonly router = inject(Router);

  /** The one-time code from the e-mailed link (query parameter). */
  readonly token = input<string>();
  /** Where the e-mail wants the client to land (query parameter), e.g. `/portal/proposals/…`. */
  readonly next = input<string>();

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
      if (problem.status === 410) {
        this.state.set('expired');
      } else if (problem.status === 404) {
        this.state.set('unknown');
      } else {
        this.failure.set(problem.detail ?? problem.title);
        this.state.set('failed');
      }
    }
  }
}
