import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';
import type { JobSheet } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { formatDay, formatHour, formatNumber, formatPlanTime } from './sheet-format';

/** The dated day plan: each working day's work in order, then what is left drying and until when (firm time). */
@Component({
  selector: 'lb-sheet-plan',
  imports: [MatIconModule, TranslatePipe],
  template: `
    @if (days().length > 0) {
      <p class="muted">{{ 'sheet.plan.zone' | translate: { zone: timeZone() } }}</p>
    }
    <ol class="days">
      @for (d of days(); track d.date) {
        <li class="day">
          <h3>
            <span>{{ 'sheet.plan.day' | translate: { n: d.workingDay } }}</span>
            <span class="date">{{ day(d.date) }}</span>
          </h3>
          <p class="muted">{{ 'sheet.plan.crewHours' | translate: { hours: number(d.crewHours) } }}</p>
          <ul class="steps">
            @for (s of d.steps; track s.key) {
              <li>
                <span class="time">{{ 'sheet.plan.hours' | translate: { from: hour(s.startHour), to: hour(s.endHour) } }}</span>
                <span>{{ s.label }}</span>
              </li>
            }
          </ul>
          @for (w of d.waits; track w.key) {
            <p class="wait">
              <mat-icon aria-hidden="true">hourglass_top</mat-icon>
              <span>{{ 'sheet.plan.wait' | translate: { what: w.label, when: until(w.untilDate, w.untilHour) } }}</span>
            </p>
          }
        </li>
      } @empty {
        <li class="muted">{{ 'sheet.plan.none' | translate }}</li>
      }
    </ol>
  `,
  styles: `
    .days {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 0.75rem;
    }
    .day {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      padding: 0.5rem 0.75rem;
      background: var(--mat-sys-surface-container-lowest);
    }
    h3 {
      display: flex;
      flex-wrap: wrap;
      justify-content: space-between;
      gap: 0.25rem 1rem;
      margin: 0.25rem 0;
    }
    .date {
      font-weight: normal;
    }
    .steps {
      list-style: none;
      margin: 0.25rem 0;
      padding: 0;
    }
    .steps li {
      display: grid;
      grid-template-columns: 7.5rem minmax(0, 1fr);
      gap: 0.5rem;
      padding: 0.25rem 0;
    }
    .time {
      font-variant-numeric: tabular-nums;
      color: var(--mat-sys-on-surface-variant);
    }
    .wait {
      display: flex;
      align-items: flex-start;
      gap: 0.4rem;
      margin: 0.35rem 0;
      padding: 0.35rem 0.5rem;
      border-radius: 8px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    .wait mat-icon {
      flex: none;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
      margin: 0.25rem 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetPlan {
  private readonly language = inject(Language);

  readonly days = input.required<JobSheet['dayPlan']>();
  readonly timeZone = input.required<string>();

  protected day(isoDate: string): string {
    return formatDay(isoDate, this.language.locale(), 'full');
  }

  protected hour(hour: number): string {
    return formatHour(hour, this.language.locale());
  }

  protected until(isoDate: string, hour: number): string {
    return formatPlanTime(isoDate, hour, this.language.locale());
  }

  protected number(value: number): string {
    return formatNumber(value, this.language.locale());
  }
}
