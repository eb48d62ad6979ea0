import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { DEPOSIT_CREDIT_RULE_LABELS, type JobBillingView } from '@layerbook/contracts/types';
import { termsText } from '@layerbook/domain';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { retainageWords } from './billing-words';

/** The terms the job is billed on: the deposit rule by name, payment terms, retainage, deposit credit. */
@Component({
  selector: 'lb-billing-terms',
  imports: [MatIconModule, MoneyPipe, RouterLink],
  template: `
    @let v = view();
    <h2 id="terms-heading">Billing terms</h2>
    @if (!v.billingStartedAt) {
      <p class="hint">
        <mat-icon aria-hidden="true">info</mat-icon>
        <span
          >Billing has not started: these are the firm's current terms (<a routerLink="/settings/billing">billing settings</a>). They are
          copied onto the job when billing starts and stay with it after.</span
        >
      </p>
    }
    <dl class="lb-facts" aria-labelledby="terms-heading">
      <dt>Deposit rule</dt>
      <dd>
        {{ v.terms.depositCapName }}
        @if (v.terms.depositCap !== null) {
          <span class="small">At most {{ v.terms.depositCap | money: v.currency }} on this job.</span>
        }
      </dd>
      <dt>Payment terms</dt>
      <dd>{{ paymentTerms() }}</dd>
      <dt>Retainage</dt>
      <dd>{{ retainage() }}</dd>
      @if (v.method === 'progress') {
        <dt>Deposit credit</dt>
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
