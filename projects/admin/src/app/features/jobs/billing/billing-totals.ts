import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { JobBillingView } from '@layerbook/contracts/types';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { changeOrdersNet } from './billing-words';

/** The job's money at a glance: what the contract is now, what is billed, paid, left, and held back. */
@Component({
  selector: 'lb-billing-totals',
  imports: [MatIconModule, MoneyPipe],
  template: `
    @let v = view();
    <h2 id="billing-heading">
      Billing
      @if (v.readyToBill > 0) {
        <span class="badge"><mat-icon aria-hidden="true">notification_important</mat-icon>Ready to bill: {{ v.readyToBill }}</span>
      }
    </h2>
    <dl class="lb-facts" aria-labelledby="billing-heading">
      <dt>Contract sum to date</dt>
      <dd class="sum">{{ v.contractSum | money: v.currency }}</dd>
      <dt>Original contract</dt>
      <dd>{{ v.originalContractSum | money: v.currency }}</dd>
      <dt>Change orders approved</dt>
      <dd>{{ changeOrders() | money: v.currency }}</dd>
      <dt>Invoiced</dt>
      <dd>{{ v.totals.invoiced | money: v.currency }} <span class="muted">(less credit notes)</span></dd>
      <dt>Paid</dt>
      <dd>{{ v.totals.paid | money: v.currency }}</dd>
      <dt>Left to bill</dt>
      <dd class="sum">{{ v.totals.unbilled | money: v.currency }}</dd>
      <dt>Retainage held</dt>
      <dd>{{ v.totals.retainageHeld | money: v.currency }}</dd>
    </dl>
  `,
  styleUrl: './billing-section.scss',
  styles: `
    .sum {
      font-weight: 600;
      font-variant-numeric: tabular-nums;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BillingTotals {
  readonly view = input.required<JobBillingView>();

  protected readonly changeOrders = computed(() => {
    const v = this.view();
    return changeOrdersNet(v.contractSum, v.originalContractSum, v.currency);
  });
}
