import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { DatePipe } from '@angular/common';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { JobHistory as JobHistoryView } from '@layerbook/contracts/types';
import { loadMessage } from '../../../shared/forms/load-message';
import { CalendarDatePipe } from '../../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../../shared/ui/form-alert';
import { TranslatePipe } from '@ngx-translate/core';

/** What happened on the job, newest first: marks from the work, schedule changes, invoices, change orders. */
@Component({
  selector: 'lb-job-history',
  imports: [TranslatePipe, CalendarDatePipe, DatePipe, FormAlert, MatProgressBarModule],
  template: `
    <h2 id="history-heading">{{ 'jobs.jobHistory.history' | translate }}</h2>
    @if (history.isLoading() && !history.hasValue()) {
      <mat-progress-bar mode="indeterminate" [aria-label]="'jobs.jobHistory.loadingTheJobS' | translate" />
    }
    <lb-form-alert [message]="failure()" />
    <ol class="history" aria-labelledby="history-heading">
      @for (entry of items(); track $index) {
        <li>
          <span class="when">{{ entry.on | calendarDate }}</span>
          <span>
            {{ entry.text }}
            <span class="small"
              >{{ 'jobs.jobHistory.recorded' | translate: { who: entry.who } }}
              <time [attr.datetime]="entry.at">{{ entry.at | date: 'medium' }}</time></span
            >
          </span>
        </li>
      } @empty {
        @if (history.hasValue()) {
          <li class="muted">{{ 'jobs.jobHistory.nothingRecordedYet' | translate }}</li>
        }
      }
    </ol>
  `,
  styleUrl: './billing-section.scss',
  styles: `
    .history {
      margin: 0;
      padding: 0;
      list-style: none;
    }
    .history li {
      display: grid;
      grid-template-columns: minmax(6.5rem, auto) 1fr;
      gap: 0.25rem 1rem;
      padding: 0.5rem 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    .when {
      font-variant-numeric: tabular-nums;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobHistory {
  readonly jobId = input.required<string>();

  protected readonly history = httpResource<JobHistoryView>(() => `/api/jobs/${encodeURIComponent(this.jobId())}/history`);
  protected readonly items = computed(() => (this.history.hasValue() ? this.history.value().items : []));
  protected readonly failure = loadMessage(this.history);

  /** After a mark or a save the page asks for the history again. */
  reload(): void {
    this.history.reload();
  }
}
