import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { Router, RouterLink } from '@angular/router';
import { isWellFormedLinkToken } from '@layerbook/contracts/types';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { AuthFrame } from './auth-frame';
import { StaffAuth } from './staff-auth';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The page the sign-up e-mail links to. It confirms on a click rather than on load, so a mail
 * program that opens links to preview them cannot spend the one-time link.
 */
@Component({
  selector: 'lb-confirm-sign-up',
  imports: [TranslatePipe, AuthFrame, FormAlert, MatButtonModule, ReactiveFormsModule, RouterLink],
  templateUrl: './confirm-sign-up.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmSignUp {
  private readonly auth = inject(StaffAuth);
  private readonly router = inject(Router);

  /** The one-time code from the e-mailed link (query parameter). */
  readonly token = input<string>();

  protected readonly hasToken = computed(() => isWellFormedLinkToken(this.token()));
  protected readonly form = inject(NonNullableFormBuilder).group({});
  protected readonly submission = new Submission();
  /** Used, expired or unknown links cannot be fixed here; offer a fresh start or sign-in instead. */
  protected readonly isLinkDead = signal(false);
  protected readonly isHydrated = hydratedSignal();

  protected async openFirm(): Promise<void> {
    const token = this.token();
    if (!isWellFormedLinkToken(token)) return;
    // Busy until Today is open, so a second click cannot send it twice.
    await this.submission.send(this.form, async () => {
      let next: string;
      try {
        next = await this.auth.confirmSignUp({ token });
      } catch (error) {
        const status = toProblem(error).status;
        this.isLinkDead.set(status === 400 || status === 404 || status === 410);
        throw error;
      }
      await this.router.navigateByUrl(next);
    });
  }
}
