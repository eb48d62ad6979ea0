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
      <div class="table-wrap" tabindex="0" role="region" aria-label="Receipts for this invoice">
        <table class="lb-table">
          <thead>
            <tr>
              <th scope="col">Receipt</th>
              <th scope="col">Date</th>
              <th scope="col">What</th>
              <th scope="col" class="num">Amount</th>
              <th scope="col"><span class="lb-visually-hidden">Download</span></th>
            </tr>
          </thead>
          <tbody>
            @for (r of receipts(); track r.id) {
              <tr>
                <th scope="row">{{ r.number }}</th>
                <td>{{ day(r.on) }}</td>
                <td>
                  <span class="what">
                    <mat-icon aria-hidden="true">{{ r.kind === 'refund' ? 'undo' : 'payments' }}</mat-icon>
                    {{ what(r) }}
                  </span>
                </td>
                <td class="num">{{ money(r) }}</td>
                <td>
                  <a class="pdf" [href]="pdfUrl(r)" download>
                    <mat-icon aria-hidden="true">download</mat-icon>
                    Download receipt {{ r.number }} (PDF)
                  </a>
                </td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    </section>
  `,
  styles: `
    h2 {
      font-family: var(--lb-serif);
      font-size: 1.15rem;
      margin: 1.5rem 0 0.5rem;
    }
    .table-wrap {
      overflow-x: auto;
    }
    .lb-table {
      width: 100%;
      border-collapse: collapse;
    }
    .lb-table th,
    .lb-table td {
      text-align: left;
      padding: 0.4rem 0.5rem;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
      vertical-align: top;
    }
    .lb-table thead th {
      font-weight: 600;
    }
    .lb-table tbody th {
      font-weight: 400;
      white-space: nowrap;
    }
    .what,
    .pdf {
      display: inline-flex;
      gap: 0.3rem;
      align-items: center;
    }
    mat-icon {
      flex: none;
    }
    .num {
      text-align: right !important;
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
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
