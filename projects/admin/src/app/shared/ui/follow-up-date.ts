import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { CalendarDatePipe } from './calendar-date-pipe';
import { TranslatePipe } from '@ngx-translate/core';

/** The next follow-up date, with an icon and the word "Overdue" when it has passed. */
@Component({
  selector: 'lb-follow-up-date',
  imports: [TranslatePipe, CalendarDatePipe, MatIconModule],
  host: { class: 'lb-follow-up', '[class.is-overdue]': 'isOverdue()' },
  template: `
    @if (date(); as day) {
      @if (isOverdue()) {
        <mat-icon aria-hidden="true">alarm</mat-icon>
        <span
          ><strong>{{ 'ui.followUp.overdue' | translate }}</strong> · {{ day | calendarDate }}</span
        >
      } @else {
        <mat-icon aria-hidden="true">event</mat-icon>
        <span>{{ day | calendarDate }}</span>
      }
    } @else {
      <span class="none">{{ 'ui.followUp.none' | translate }}</span>
    }
  `,
  styles: `
    :host {
      display: inline-flex;
      align-items: center;
      gap: 0.3rem;
    }
    mat-icon {
      font-size: 18px;
      width: 18px;
      height: 18px;
      flex: none;
    }
    :host(.is-overdue) {
      color: #7a2418;
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FollowUpDate {
  readonly date = input<string | null>(null);
  readonly isOverdue = input(false);
}
