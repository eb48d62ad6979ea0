import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { JobDetail as JobView } from '@layerbook/contracts/types';
import { scheduleTotals } from '@layerbook/domain';
import { problemMessage } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { jobStatus, paymentLine, paymentStatus } from './job-words';

/** One accepted job: what was signed, for how much, and the payments to ask for. */
@Component({
  selector: 'lb-job-detail',
  imports: [CalendarDatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  templateUrl: './job-detail.html',
  styleUrl: './job-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobDetail {
  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<JobView>(() => `/api/jobs/${encodeURIComponent(this.id())}`);

  protected readonly job = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = this.loaded.isLoading;
  protected readonly message = computed(() => {
    const error = this.loaded.error();
    return error ? problemMessage(error) : null;
  });
  protected readonly jobStatus = jobStatus;
  protected readonly paymentStatus = paymentStatus;
  protected readonly paymentLine = paymentLine;

  /** The schedule added exactly (packages/domain); it should come to the contract sum. */
  protected readonly totals = computed(() => {
    const job = this.job();
    return job ? scheduleTotals(job.paymentSchedule, job.contractSum) : null;
  });
}
