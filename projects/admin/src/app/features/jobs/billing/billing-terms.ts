import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { DEPOSIT_CREDIT_RULE_LABELS, type JobBillingView } from '@layerbook/contracts/types';
import { termsText } from '@layerbook/domain';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { retainageWords } from './billing-words';
import { TranslatePipe } from '@ngx-translate/core';

/** The terms the job is billed on: the deposit rule by name, payment terms, retainage, deposit credit. */
@Component({
  selector: 'lb-billing-terms',
  imports: [TranslatePipe, MatIconModule, MoneyPipe, RouterLink],
  template: `
    @let v = view();
    <h2 id="terms-heading">{{ 'jobs.billingTerms.billingTerms' | translate }}</h2>
    @if (!v.billingStartedAt) {
      <p class="hint">
        <mat-icon aria-hidden="true">info</mat-icon>
        <span
          >{{ 'jobs.billingTerms.billingHasNotStarted' | translate
          }}<a routerLink="/settings/billing">{{ 'jobs.billingTerms.billingSettings' | translate }}</a
          >{{ 'jobs.billingTerms.theyAreCopiedOnto' | translate }}</span
        >
      </p>
    }
    <dl class="lb-facts" aria-labelledby="terms-heading">
      <dt>{{ 'jobs.billingTerms.depositRule' | translate }}</dt>
      <dd>
        {{ v.terms.depositCapName }}
        @if (v.terms.depositCap !== null) {
          <span class="small">{{
            'jobs.billingTerms.atMostOnThis' | translate: { depositCap: (v.terms.depositCap | money: v.currency) }
          }}</span>
        }
      </dd>
      <dt>{{ 'jobs.billingTerms.paymentTerms' | translate }}</dt>
      <dd>{{ paymentTerms() }}</dd>
      <dt>{{ 'jobs.billingTerms.retainage' | translate }}</dt>
      <dd>{{ retainage() }}</dd>
      @if (v.method === 'progress') {
        <dt>{{ 'jobs.billingTerms.depositCredit' | translate }}</dt>
        <dd>{{ creditLabels[v.terms.depositCredit] }}</dd>
      }
    </dl>
  `,
  styleUrl: './billing-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BillingTerms {
  readonly view = input.required<JobBillingView>();

  protected readonly creditLabels = DEPOSIT_CREDIT_RULE_LABELS;
  protected readonly paymentTerms = computed(() => termsText(this.view().terms.terms));
  protected readonly retainage = computed(() => retainageWords(this.view().terms.retainage));
}
