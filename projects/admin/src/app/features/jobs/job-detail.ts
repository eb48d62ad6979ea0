import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { JobDetail as JobView } from '@layerbook/contracts/types';
import { problemMessage } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { JobBilling } from './billing/job-billing';
import { JobStatusActions } from './job-status-actions';
import { jobStatus } from './job-words';
import { TranslatePipe } from '@ngx-translate/core';

/** One accepted job: what was signed, for how much, and its billing (sections in ./billing). */
@Component({
  selector: 'lb-job-detail',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    FormAlert,
    JobBilling,
    JobStatusActions,
    MatIconModule,
    MatProgressBarModule,
    MoneyPipe,
    RouterLink,
  ],
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

  /** The job as the server answered a move (finished, reopened, cancelled). */
  protected statusChanged(job: JobView): void {
    this.loaded.set(job);
  }
}
