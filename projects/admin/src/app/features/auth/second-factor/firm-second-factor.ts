import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatSlideToggleChange, MatSlideToggleModule } from '@angular/material/slide-toggle';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { SecondFactorStatus } from '@layerbook/contracts/types';
import { Session } from '../../../core/auth/session';
import { problemMessage } from '../../../core/errors/problem';
import { FormAlert } from '../../../shared/ui/form-alert';
import { SECOND_FACTOR_URL, SecondFactorApi } from './second-factor-api';

/** The owner's switch on the firm settings page: owner and office must sign in with a second factor. */
@Component({
  selector: 'lb-firm-second-factor',
  imports: [FormAlert, MatSlideToggleModule, RouterLink, TranslatePipe],
  template: `
    <section class="firm-second-factor" aria-labelledby="firm-second-factor-heading">
      <h2 id="firm-second-factor-heading">{{ 'auth.firmRule.heading' | translate }}</h2>
      @if (status.hasValue()) {
        <lb-form-alert [message]="message()" />
        <mat-slide-toggle
          [checked]="status.value().firmRequires"
          [disabled]="!canChange() || saving()"
          aria-describedby="firm-second-factor-help"
          (change)="choose($event)"
          >{{ 'auth.firmRule.toggle' | translate }}</mat-slide-toggle
        >
        <p id="firm-second-factor-help" class="lb-aside">
          {{ 'auth.firmRule.help' | translate }}
          @if (!isOwner()) {
            {{ 'auth.firmRule.ownerOnly' | translate }}
          } @else if (!status.value().enrolled && !status.value().firmRequires) {
            {{ 'auth.firmRule.ownFirst' | translate }} <a routerLink="/security">{{ 'auth.firmRule.setUpOwn' | translate }}</a>
          }
        </p>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FirmSecondFactor {
  private readonly api = inject(SecondFactorApi);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly status = httpResource<SecondFactorStatus>(() => SECOND_FACTOR_URL);
  protected readonly saving = signal(false);
  protected readonly message = signal<string | null>(null);
  /** Turning it on needs the owner's own second factor; turning it off is always open to the owner. */
  protected readonly canChange = computed(() => {
    const s = this.status.hasValue() ? this.status.value() : null;
    return this.isOwner() && !!s && (s.enrolled || s.firmRequires);
  });

  protected async choose(change: MatSlideToggleChange): Promise<void> {
    this.saving.set(true);
    this.message.set(null);
    try {
      this.status.set(await this.api.requireForFirm({ required: change.checked }));
    } catch (error) {
      change.source.checked = !change.checked;
      this.message.set(problemMessage(error));
    } finally {
      this.saving.set(false);
    }
  }
}
