import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { PortalReceipt } from '@layerbook/contracts/types';
import { paymentReceiptUrl, refundReceiptUrl } from './payment-api';
import { receiptWhat } from './payment-words';
import { TranslatePipe } from '@ngx-translate/core';
import { LbDatePipe, LbMoneyPipe } from '../../../../../shared/i18n/format';

/** An invoice's receipts — one per payment and per refund — each with its PDF. */
@Component({
  selector: 'lb-receipt-list',
  imports: [LbDatePipe, LbMoneyPipe, MatIconModule, TranslatePipe],
  template: `
    <section aria-labelledby="receipts-heading">
      <h2 id="receipts-heading">{{ 'payments.receipts.heading' | translate }}</h2>
      <ul class="receipts">
        @for (r of receipts(); track r.id) {
          <li>
            <mat-icon aria-hidden="true">{{ r.kind === 'refund' ? 'undo' : 'payments' }}</mat-icon>
            <div>
              <p class="head">
                <strong>{{ 'payments.receipts.receipt' | translate: { number: r.number } }}</strong>
                <span class="amount">{{ r.amount | lbMoney: r.currency }}</span>
              </p>
              <p class="what">
                {{ 'payments.receipts.what' | translate: { what: what(r) | translate, day: r.on.slice(0, 10) | lbDate: 'long' } }}
              </p>
              <a class="pdf" [href]="pdfUrl(r)" download>
                <mat-icon aria-hidden="true">download</mat-icon>
                {{ 'payments.receipts.download' | translate: { number: r.number } }}
              </a>
            </div>
          </li>
        }
      </ul>
    </section>
  `,
  styles: `
    h2 {
      font-family: var(--lb-serif);
      font-size: 1.15rem;
      margin: 1.5rem 0 0.5rem;
    }
    .receipts {
      list-style: none;
      margin: 0;
      padding: 0;
      max-width: 36rem;
    }
    li {
      display: flex;
      gap: 0.75rem;
      align-items: flex-start;
      padding: 0.6rem 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    li mat-icon,
    .pdf mat-icon {
      flex: none;
    }
    li > div {
      flex: 1;
      min-width: 0;
    }
    p {
      margin: 0 0 0.2rem;
    }
    .head {
      display: flex;
      flex-wrap: wrap;
      justify-content: space-between;
      gap: 0 1rem;
    }
    .amount {
      font-variant-numeric: tabular-nums;
    }
    .what {
      color: var(--mat-sys-on-surface-variant);
    }
    .pdf {
      display: inline-flex;
      gap: 0.25rem;
      align-items: center;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceiptList {
  readonly receipts = input.required<readonly PortalReceipt[]>();

  protected readonly what = receiptWhat;

  protected pdfUrl(r: PortalReceipt): string {
    return r.kind === 'refund' ? refundReceiptUrl(r.id) : paymentReceiptUrl(r.id);
  }
}
