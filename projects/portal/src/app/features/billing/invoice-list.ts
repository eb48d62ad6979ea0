import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { ItemList, PortalInvoiceSummary } from '@layerbook/contracts/types';
import { problemMessage } from '../../core/errors/problem';
import { INVOICES_URL } from './invoice-api';
import { invoiceStatusWords } from './invoice-words';
import { TranslatePipe } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { LbDatePipe, LbMoneyPipe } from '../../../../../shared/i18n/format';

/** "Your invoices": every invoice the firm has issued to this client, with what is due and by when, and a statement per job. */
@Component({
  selector: 'lb-invoice-list',
  imports: [LbDatePipe, LbMoneyPipe, MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  template: `
    <h1>{{ 'billing.list.title' | translate }}</h1>
    <p class="lb-lead">{{ 'billing.list.lead' | translate }}</p>
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'billing.list.loading' | translate" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">{{ message | lbSay }}</p>
    } @else if (invoices().length === 0) {
      <div class="empty">
        <mat-icon aria-hidden="true">receipt_long</mat-icon>
        <p>{{ 'billing.list.empty' | translate }}</p>
      </div>
    } @else {
      <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'billing.list.title' | translate">
        <table class="lb-table">
          <thead>
            <tr>
              <th scope="col">{{ 'billing.list.invoice' | translate }}</th>
              <th scope="col">{{ 'billing.list.job' | translate }}</th>
              <th scope="col">{{ 'billing.list.due' | translate }}</th>
              <th scope="col" class="num">{{ 'billing.list.amountDue' | translate }}</th>
              <th scope="col">{{ 'billing.list.status' | translate }}</th>
            </tr>
          </thead>
          <tbody>
            @for (inv of invoices(); track inv.id) {
              @let words = status(inv);
              <tr>
                <th scope="row">
                  <a [routerLink]="['/invoices', inv.id]">{{ inv.number }}</a>
                </th>
                <td>{{ inv.jobTitle }}</td>
                <td>{{ inv.status === 'void' ? '—' : (inv.dueOn | lbDate: 'long') }}</td>
                <td class="num">{{ inv.amountDue | lbMoney: inv.currency }}</td>
                <td>
                  <span class="status" [class.urgent]="words.isUrgent">
                    <mat-icon aria-hidden="true">{{ words.icon }}</mat-icon>
                    {{ words.text | translate }}
                  </span>
                </td>
              </tr>
            }
          </tbody>
        </table>
      </div>
      <h2>{{ 'billing.list.statements' | translate }}</h2>
      <ul class="jobs">
        @for (job of jobs(); track job.id) {
          <li>
            <a [routerLink]="['/jobs', job.id, 'statement']">{{ 'billing.list.statementFor' | translate: { job: job.title } }}</a>
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .empty {
      display: flex;
      gap: 1rem;
      align-items: flex-start;
      max-width: 40rem;
      padding: 1.25rem 1.5rem;
      border: 2px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .empty p {
      margin: 0;
    }
    .empty mat-icon {
      color: var(--lb-verdigris);
    }
    .table-wrap {
      overflow-x: auto;
      max-width: 56rem;
    }
    .lb-table {
      width: 100%;
      border-collapse: collapse;
    }
    .lb-table th,
    .lb-table td {
      text-align: left;
      padding: 0.5rem;
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
    .num {
      text-align: right !important;
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
    .status {
      display: inline-flex;
      gap: 0.3rem;
      align-items: center;
    }
    .status mat-icon {
      flex: none;
    }
    .urgent {
      font-weight: 600;
      color: var(--lb-ochre-dark, var(--mat-sys-error));
    }
    h2 {
      font-family: var(--lb-serif);
      margin: 2rem 0 0.5rem;
      font-size: 1.25rem;
    }
    .jobs {
      margin: 0;
      padding-left: 1.25rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoiceList {
  private readonly list = httpResource<ItemList<PortalInvoiceSummary>>(() => INVOICES_URL);

  protected readonly invoices = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  /** each job once, in the order its newest invoice appears */
  protected readonly jobs = computed(() => {
    const seen = new Map<string, string>();
    for (const inv of this.invoices()) if (!seen.has(inv.jobId)) seen.set(inv.jobId, inv.jobTitle);
    return [...seen].map(([id, title]) => ({ id, title }));
  });
  protected readonly isLoading = computed(() => !this.list.hasValue() && this.list.isLoading());
  protected readonly loadMessage = computed(() => {
    const error = this.list.error();
    return error ? problemMessage(error) : null;
  });
  protected readonly status = invoiceStatusWords;
}
