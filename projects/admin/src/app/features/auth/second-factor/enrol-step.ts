import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { safeNextUrl } from '../../../core/auth/guards';
import { AuthFrame } from '../auth-frame';
import { EnrolPanel } from './enrol-panel';
import { RecoveryCodeList } from './recovery-code-list';

/** Right after the password, when the firm requires a second factor this person has not set up yet. */
@Component({
  selector: 'lb-second-factor-enrol-step',
  imports: [AuthFrame, EnrolPanel, RecoveryCodeList, RouterLink, TranslatePipe],
  template: `
    <lb-auth-frame [heading]="'auth.enrol.heading' | translate">
      @if (codes(); as codes) {
        <lb-recovery-code-list [codes]="codes" (done)="goOn()" />
      } @else {
        <p>{{ 'auth.enrol.firmRequires' | translate }}</p>
        <lb-enrol-panel (enrolled)="codes.set($event)" />
        <p class="lb-aside">
          <a routerLink="/sign-in">{{ 'auth.secondFactor.startAgain' | translate }}</a>
        </p>
      }
    </lb-auth-frame>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SecondFactorEnrolStep {
  private readonly router = inject(Router);

  /** Where the visitor was headed before signing in (query parameter). */
  readonly next = input<string>();

  protected readonly codes = signal<readonly string[] | null>(null);

  protected async goOn(): Promise<void> {
    await this.router.navigateByUrl(safeNextUrl(this.next()));
  }
}
