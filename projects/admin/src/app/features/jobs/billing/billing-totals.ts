import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { JobBillingView } from '@layerbook/contracts/types';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { changeOrdersNet } from './billing-words';
import { TranslatePipe } from '@ngx-translate/core';

/** The job's money at a glance: what the contract is now, what is billed, paid, left, and held back. */
@Component({
  selector: 'lb-billing-totals',
  imports: [TranslatePipe, MatIconModule, MoneyPipe],
  template: `
    @let v = view();
    <h2 id="billing-heading">
      {{ 'jobs.billingTotals.billing' | translate }}
      @if (v.readyToBill > 0) {
        <span class="badge"
          ><mat-icon aria-hidden="true">notification_important</mat-icon
          >{{ 'jobs.billingTotals.readyToBill' | translate: { readyToBill: v.readyToBill } }}</span
        >
      }
    </h2>
    <dl class="lb-facts" aria-labelledby="billing-heading">
      <dt>{{ 'jobs.billingTotals.contractSumToDate' | translate }}</dt>
      <dd class="sum">{{ v.contractSum | money: v.currency }}</dd>
      <dt>{{ 'jobs.billingTotals.originalContract' | translate }}</dt>
      <dd>{{ v.originalContractSum | money: v.currency }}</dd>
      <dt>{{ 'jobs.billingTotals.changeOrdersApproved' | translate }}</dt>
      <dd>{{ changeOrders() | money: v.currency }}</dd>
      <dt>{{ 'jobs.billingTotals.invoiced' | translate }}</dt>
      <dd>
        {{ v.totals.invoiced | money: v.currency }} <span class="muted">{{ 'jobs.billingTotals.lessCreditNotes' | translate }}</span>
      </dd>
      <dt>{{ 'jobs.billingTotals.paid' | translate }}</dt>
      <dd>{{ v.totals.paid | money: v.currency }}</dd>
      <dt>{{ 'jobs.billingTotals.leftToBill' | translate }}</dt>
      <dd class="sum">{{ v.totals.unbilled | money: v.currency }}</dd>
      <dt>{{ 'jobs.billingTotals.retainageHeld' | translate }}</dt>
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
