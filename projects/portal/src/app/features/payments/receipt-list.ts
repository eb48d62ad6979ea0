import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { PortalReceipt } from '@layerbook/contracts/types';
import { formatDay, formatMoney } from '../../shared/format/money';
import { paymentReceiptUrl, refundReceiptUrl } from './payment-api';
import { receiptWhat } from './payment-words';

/** An invoice's receipts — one per payment and per refund — each with its PDF. */
@Component({
  selector: 'lb-receipt-list',
  imports: [MatIconModule],
  template: `
    <section aria-labelledby="receipts-heading">
      <h2 id="receipts-heading">Receipts</h2>
      <ul class="receipts">
        @for (r of receipts(); track r.id) {
          <li>
            <mat-icon aria-hidden="true">{{ r.kind === 'refund' ? 'undo' : 'payments' }}</mat-icon>
            <div>
              <p class="head">
                <strong>Receipt {{ r.number }}</strong> <span class="amount">{{ money(r) }}</span>
              </p>
              <p class="what">{{ what(r) }}, {{ day(r.on) }}</p>
              <a class="pdf" [href]="pdfUrl(r)" download>
                <mat-icon aria-hidden="true">download</mat-icon>
                Download receipt {{ r.number }} (PDF)
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
  /** the firm's locale ("en-US"), as the invoice prints */
  readonly locale = input.required<string>();

  protected readonly what = receiptWhat;

  protected day(isoDay: string): string {
    return formatDay(isoDay.slice(0, 10), this.locale());
  }

  protected money(r: PortalReceipt): string {
    return formatMoney(r.amount, r.currency, this.locale());
  }

  protected pdfUrl(r: PortalReceipt): string {
    return r.kind === 'refund' ? refundReceiptUrl(r.id) : paymentReceiptUrl(r.id);
  }
}
