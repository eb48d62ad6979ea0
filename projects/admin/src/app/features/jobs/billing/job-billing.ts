import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input, viewChild } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { JobBillingView } from '@layerbook/contracts/types';
import { loadMessage } from '../../../shared/forms/load-message';
import { FormAlert } from '../../../shared/ui/form-alert';
import { ChangeOrders } from '../change-orders/change-orders';
import { BillingTerms } from './billing-terms';
import { BillingTotals } from './billing-totals';
import { JobHistory } from './job-history';
import { JobInvoices } from './job-invoices';
import { ScheduleEditor } from './schedule-editor';
import { ValueLines } from './value-lines';
import { WorkDone } from './work-done';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The job page's billing: totals, terms, the payment schedule, the work done, the schedule of
 * values (progress billing), change orders, invoices and history. One read (GET /api/jobs/:id/billing)
 * feeds every section; a section that writes hands back the server's new view or asks for a reload.
 */
@Component({
  selector: 'lb-job-billing',
  imports: [
    TranslatePipe,
    BillingTerms,
    BillingTotals,
    ChangeOrders,
    FormAlert,
    JobHistory,
    JobInvoices,
    MatProgressBarModule,
    ScheduleEditor,
    ValueLines,
    WorkDone,
  ],
  template: `
    @if (billing.isLoading() && !billing.hasValue()) {
      <mat-progress-bar mode="indeterminate" [aria-label]="'jobs.jobBilling.loadingTheJobS' | translate" />
    }
    <lb-form-alert [message]="failure()" />
    @if (view(); as v) {
      <lb-billing-totals [view]="v" />
      <lb-billing-terms [view]="v" />
      <lb-schedule-editor [view]="v" (changed)="refresh($event)" />
      <!-- Below the payment schedule, a screen or more down: built in the browser once it is idle
           (the server's render of a demo job took ~52 ms with them, ~43 without). -->
      @defer (on idle) {
        <lb-work-done [view]="v" (changed)="refresh(null)" />
        @if (v.method === 'progress') {
          <lb-value-lines [view]="v" (changed)="refresh($event)" />
        }
        <lb-change-orders class="section" [jobId]="jobId()" (changed)="refresh(null)" />
        <lb-job-invoices [invoices]="v.invoices" />
      } @placeholder {
        <div class="deferred-sections" aria-hidden="true"></div>
      }
    }
    @defer (on idle) {
      <lb-job-history [jobId]="jobId()" />
    }
  `,
  styles: `
    :host {
      display: block;
    }
    .section {
      display: block;
      margin-top: 1.75rem;
    }
    /* Room kept for the sections built after the page loads (@defer), so the page's end moves less. */
    .deferred-sections {
      min-height: 30rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobBilling {
  readonly jobId = input.required<string>();

  protected readonly billing = httpResource<JobBillingView>(() => `/api/jobs/${encodeURIComponent(this.jobId())}/billing`);
  protected readonly view = computed(() => (this.billing.hasValue() ? this.billing.value() : null));
  protected readonly failure = loadMessage(this.billing);
  private readonly history = viewChild(JobHistory);

  /** A section wrote something: take the server's new view when it sent one, else read again. */
  protected refresh(view: JobBillingView | null): void {
    if (view) this.billing.set(view);
    else this.billing.reload();
    this.history()?.reload();
  }
}
