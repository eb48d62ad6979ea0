import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { InvoiceSummary } from '@layerbook/contracts/types';
import { CalendarDatePipe } from '../../../shared/ui/calendar-date-pipe';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { invoiceWords } from './billing-words';
import { TranslatePipe } from '@ngx-translate/core';

/** The job's invoices, drafts included, each linking to its page in Billing. */
@Component({
  selector: 'lb-job-invoices',
  imports: [TranslatePipe, CalendarDatePipe, MatIconModule, MoneyPipe, RouterLink],
  template: `
    <h2 id="job-invoices-heading">{{ 'jobs.jobInvoices.invoices' | translate }}</h2>
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="job-invoices-heading">
      <table aria-labelledby="job-invoices-heading">
        <thead>
          <tr>
            <th scope="col">{{ 'jobs.jobInvoices.invoice' | translate }}</th>
            <th scope="col">{{ 'jobs.jobInvoices.kind' | translate }}</th>
            <th scope="col">{{ 'jobs.jobInvoices.status' | translate }}</th>
            <th scope="col">{{ 'jobs.jobInvoices.due' | translate }}</th>
            <th scope="col" class="num">{{ 'jobs.jobInvoices.total' | translate }}</th>
            <th scope="col" class="num">{{ 'jobs.jobInvoices.amountDue' | translate }}</th>
          </tr>
        </thead>
        <tbody>
          @for (invoice of invoices(); track invoice.id) {
            @let w = words(invoice);
            <tr>
              <th scope="row">
                <a [routerLink]="['/billing/invoices', invoice.id]">{{ w.number }}</a>
                @if (invoice.origin === 'queue' && invoice.status === 'draft') {
                  <span class="small">{{ 'jobs.jobInvoices.draftedWhenItsTrigger' | translate }}</span>
                }
              </th>
              <td>{{ w.kind }}</td>
              <td>
                <span class="status">
                  @if (invoice.isOverdue) {
                    <mat-icon aria-hidden="true">warning</mat-icon>
                  }
                  {{ w.status }}</span
                >
              </td>
              <td>
                @if (invoice.dueOn) {
                  {{ invoice.dueOn | calendarDate }}
                } @else {
                  <span class="muted">—</span>
                }
              </td>
              <td class="num">{{ invoice.total | money: invoice.currency }}</td>
              <td class="num">{{ invoice.amountDue | money: invoice.currency }}</td>
            </tr>
          } @empty {
            <tr>
              <td colspan="6" class="muted">
                {{ 'jobs.jobInvoices.noInvoicesYetThey' | translate }}
              </td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './billing-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobInvoices {
  readonly invoices = input.required<readonly InvoiceSummary[]>();

  protected readonly words = invoiceWords;
}
