import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';
import type { InquiryActivity } from '@layerbook/contracts/types';
import { formatCalendarDate } from '../../shared/ui/calendar-date-pipe';
import { describeActivity } from './activity-words';
import { Assignees } from './assignees';

/** Who did what and when, newest first. */
@Component({
  selector: 'lb-activity-log',
  imports: [DatePipe, MatIconModule, TranslatePipe],
  template: `
    <ol class="log" [attr.aria-label]="'inquiries.activityLog.label' | translate">
      @for (entry of entries(); track entry.id) {
        <li>
          <mat-icon aria-hidden="true">{{ entry.line.icon }}</mat-icon>
          <div>
            <p class="title">{{ entry.line.title }}</p>
            @if (entry.line.body) {
              <p class="body">{{ entry.line.body }}</p>
            }
            <p class="meta">
              {{ entry.actorName ?? ('inquiries.activityLog.publicForm' | translate) }} ·
              <time [attr.datetime]="entry.createdAt">{{ entry.createdAt | date: 'medium' }}</time>
            </p>
          </div>
        </li>
      } @empty {
        <li class="empty">{{ 'inquiries.activityLog.empty' | translate }}</li>
      }
    </ol>
  `,
  styles: `
    .log {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 0.75rem;
    }
    li {
      display: flex;
      gap: 0.75rem;
      align-items: flex-start;
      padding-bottom: 0.75rem;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    mat-icon {
      flex: none;
      color: var(--lb-umber);
    }
    p {
      margin: 0;
    }
    .title {
      font-weight: 600;
    }
    .body {
      white-space: pre-wrap;
      overflow-wrap: anywhere;
    }
    .meta,
    .empty {
      font-size: 0.875rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ActivityLog {
  private readonly assignees = inject(Assignees);
  private readonly locale = inject(LOCALE_ID);

  readonly activities = input.required<readonly InquiryActivity[]>();

  protected readonly entries = computed(() => {
    // Read so the names fill in once the team list arrives.
    this.assignees.active();
    return this.activities().map((activity) => ({
      ...activity,
      line: describeActivity(
        activity,
        (userId) => this.assignees.nameOf(userId),
        (day) => formatCalendarDate(day, this.locale),
      ),
    }));
  });
}
