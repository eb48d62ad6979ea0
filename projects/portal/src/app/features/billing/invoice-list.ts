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

/**
 * "Your invoices": every invoice the firm has issued to this client — when, its total, what is still
 * due and by when — and a statement per job.
 */
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
        <!-- Roles written out: on a phone the rows are drawn as cards, and some browsers drop a table's
             meaning for screen readers once its parts are no longer displayed as table parts. -->
        <table class="lb-table" role="table">
          <thead role="rowgroup">
            <tr role="row">
              <th scope="col" role="columnheader">{{ 'billing.list.invoice' | translate }}</th>
              <th scope="col" role="columnheader">{{ 'billing.list.job' | translate }}</th>
              <th scope="col" role="columnheader">{{ 'billing.list.issued' | translate }}</th>
              <th scope="col" role="columnheader">{{ 'billing.list.due' | translate }}</th>
              <th scope="col" role="columnheader" class="num">{{ 'billing.list.total' | translate }}</th>
              <th scope="col" role="columnheader" class="num">{{ 'billing.list.amountDue' | translate }}</th>
              <th scope="col" role="columnheader">{{ 'billing.list.status' | translate }}</th>
            </tr>
          </thead>
          <tbody role="rowgroup">
            @for (inv of invoices(); track inv.id) {
              @let words = status(inv);
              <tr role="row">
                <th scope="row" role="rowheader">
                  <a [routerLink]="['/invoices', inv.id]">{{ inv.number }}</a>
                </th>
                <td role="cell">{{ inv.jobTitle }}</td>
                <td role="cell" [attr.data-label]="'billing.list.issued' | translate">{{ inv.issuedOn | lbDate: 'long' }}</td>
                <td role="cell" class="due" [attr.data-label]="'billing.list.due' | translate">
                  @if (inv.status === 'void') {
                    <!-- A cancelled invoice is due never: a dash for the eye, words for a screen reader. -->
                    <span aria-hidden="true">—</span>
                    <span class="lb-visually-hidden">{{ 'billing.list.noDueDate' | translate }}</span>
                  } @else {
                    {{ inv.dueOn | lbDate: 'long' }}
                  }
                </td>
                <td role="cell" class="num" [attr.data-label]="'billing.list.total' | translate">
                  {{ inv.total | lbMoney: inv.currency }}
                </td>
                <td role="cell" class="num" [attr.data-label]="'billing.list.amountDue' | translate">
                  {{ inv.amountDue | lbMoney: inv.currency }}
                </td>
                <td role="cell" class="state">
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
    @use 'tables';

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
      @include tables.scroll-shadows(var(--mat-sys-surface));
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
    /*
     * A phone or a narrow tablet (seven columns do not fit): each invoice a card — its number and status
     * on top, the job, its dates, its total and what is still due.
     */
    @media (max-width: 767.98px) {
      @include tables.rows-as-cards;
      .lb-table tbody tr {
        display: grid;
        grid-template-columns: 1fr auto;
        gap: 0.25rem 1rem;
        padding: 0.75rem 0;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
      }
      .lb-table tbody td {
        grid-column: 1 / -1;
      }
      .lb-table tbody td.state {
        grid-row: 1;
        grid-column: 2;
        justify-self: end;
      }
      .lb-table td[data-label]::before {
        content: attr(data-label) ': ';
        /* The column header already names the cell for a screen reader: the label is for the eye only. */
        content: attr(data-label) ': ' / '';
        color: var(--mat-sys-on-surface-variant);
      }
      .lb-table .num {
        text-align: left !important;
      }
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
