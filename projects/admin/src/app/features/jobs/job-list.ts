import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { ItemList, JobSummary } from '@layerbook/contracts/types';
import { problemMessage } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { jobStatus } from './job-words';
import { TranslatePipe } from '@ngx-translate/core';

/** Accepted jobs: every proposal a client signed, newest first. */
@Component({
  selector: 'lb-job-list',
  imports: [TranslatePipe, CalendarDatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  template: `
    <section class="lb-page">
      <nav class="switch" [attr.aria-label]="'jobs.jobList.jobsAndProposals' | translate">
        <a routerLink="/estimates">{{ 'jobs.jobList.estimates' | translate }}</a>
        <a routerLink="/jobs" aria-current="page">{{ 'jobs.jobList.acceptedJobs' | translate }}</a>
      </nav>
      <h1>{{ 'jobs.jobList.acceptedJobs' | translate }}</h1>
      <p class="lb-lead">{{ 'jobs.jobList.workTheClientAccepted' | translate }}</p>
      <lb-form-alert [message]="message()" />
      @if (isLoading()) {
        <mat-progress-bar mode="indeterminate" [aria-label]="'jobs.jobList.loadingJobs' | translate" />
      }
      <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'jobs.jobList.acceptedJobs' | translate">
        <table [attr.aria-label]="'jobs.jobList.acceptedJobs' | translate">
          <thead>
            <tr>
              <th scope="col">{{ 'jobs.jobList.job' | translate }}</th>
              <th scope="col">{{ 'jobs.jobList.client' | translate }}</th>
              <th scope="col">{{ 'jobs.jobList.option' | translate }}</th>
              <th scope="col" class="num">{{ 'jobs.jobList.contractSum' | translate }}</th>
              <th scope="col">{{ 'jobs.jobList.status' | translate }}</th>
              <th scope="col">{{ 'jobs.jobList.starts' | translate }}</th>
            </tr>
          </thead>
          <tbody>
            @for (j of items(); track j.id) {
              @let look = statusLook(j.status);
              <tr>
                <th scope="row">
                  <a [routerLink]="['/jobs', j.id]">{{ j.title }}</a>
                </th>
                <td>{{ j.clientName }}</td>
                <td>{{ j.optionLabel }}</td>
                <td class="num">{{ j.contractSum | money: j.currency }}</td>
                <td>
                  <span class="status"
                    ><mat-icon aria-hidden="true">{{ look.icon }}</mat-icon
                    >{{ look.word }}</span
                  >
                </td>
                <td>
                  @if (j.startDate) {
                    {{ j.startDate | calendarDate }}
                  } @else {
                    <span class="muted">{{ 'jobs.jobList.notSet' | translate }}</span>
                  }
                </td>
              </tr>
            } @empty {
              @if (!isLoading()) {
                <tr>
                  <td colspan="6" class="none">{{ 'jobs.jobList.noAcceptedJobsYet' | translate }}</td>
                </tr>
              }
            }
          </tbody>
        </table>
      </div>
    </section>
  `,
  styles: `
    @use 'tables';

    .switch {
      display: flex;
      gap: 1rem;
      margin-bottom: 0.5rem;
    }
    .switch a[aria-current='page'] {
      font-weight: 600;
      text-decoration: none;
      color: inherit;
      border-bottom: 2px solid var(--lb-umber, currentColor);
    }
    h1 {
      margin: 0;
    }
    @include tables.data-table($min-width: 44rem, $align: middle);

    .status {
      display: inline-flex;
      align-items: center;
      gap: 0.3rem;
    }
    .status mat-icon {
      width: 18px;
      height: 18px;
      font-size: 18px;
    }
    .muted,
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
    .none {
      padding: 1.5rem 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobList {
  private readonly list = httpResource<ItemList<JobSummary>>(() => '/api/jobs');

  protected readonly items = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly message = computed(() => {
    const error = this.list.error();
    return error ? problemMessage(error) : null;
  });
  protected readonly statusLook = jobStatus;
}
