import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';
import { hoursText, planDays, type EstimateResultJson } from '@layerbook/domain';
import { clockText, dayAndClock, dayWords } from './estimate-words';

/** The dated plan: each working day's work, what is drying and until when, and the milestones. */
@Component({
  selector: 'lb-schedule-section',
  imports: [MatIconModule, TranslatePipe],
  template: `
    @let s = result().schedule;
    <h2 id="schedule-heading">{{ 'proposals.schedule.heading' | translate }}</h2>
    <p>
      {{ 'proposals.schedule.finishes' | translate }} <strong>{{ day(s.finishDate) }}</strong>
      {{ (s.workingDays === 1 ? 'proposals.schedule.afterDay' : 'proposals.schedule.afterDays') | translate: { n: s.workingDays } }}
    </p>

    <h3 id="milestones-heading">{{ 'proposals.schedule.milestones' | translate }}</h3>
    <ul aria-labelledby="milestones-heading">
      @for (m of s.milestones; track m.id) {
        <li>
          {{
            m.id === 'job'
              ? ('proposals.schedule.jobComplete' | translate)
              : ('proposals.schedule.layerDone' | translate: { layer: m.label })
          }}:
          {{ at(m.date, m.hour) }}
        </li>
      }
    </ul>

    <h3 id="days-heading">{{ 'proposals.schedule.dayByDay' | translate }}</h3>
    <ol class="days" aria-labelledby="days-heading">
      @for (d of days(); track d.date) {
        <li>
          <p class="day-title">
            <strong>{{ 'proposals.schedule.dayN' | translate: { n: d.workingDay } }} · {{ day(d.date) }}</strong>
            <span class="muted">
              — {{ 'proposals.schedule.crewHoursOf' | translate: { hours: hours(d.crewHours), capacity: hours(d.capacity) } }}</span
            >
          </p>
          <ul class="plain">
            @for (step of d.steps; track step.key) {
              <li>{{ clock(step.startHour) }}–{{ clock(step.endHour) }} {{ step.label }} ({{ hours(step.crewHours) }})</li>
            }
            @for (wait of d.waits; track wait.key) {
              <li class="wait">
                <mat-icon aria-hidden="true">hourglass_top</mat-icon>
                {{ 'proposals.schedule.dryingUntil' | translate: { layer: wait.label, until: at(wait.untilDate, wait.untilHour) } }}
              </li>
            }
          </ul>
        </li>
      }
    </ol>
  `,
  styleUrl: './result-section.scss',
  styles: `
    .days {
      padding-left: 0;
      list-style: none;
    }
    .days > li {
      padding: 0.5rem 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    .day-title {
      margin: 0 0 0.25rem;
    }
    .wait mat-icon {
      font-size: 1.1rem;
      width: 1.1rem;
      height: 1.1rem;
      vertical-align: -0.2rem;
    }
    .wait {
      font-style: italic;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScheduleSection {
  private readonly locale = inject(LOCALE_ID);

  readonly result = input.required<EstimateResultJson>();

  protected readonly days = computed(() => planDays(this.result().schedule));

  protected day(isoDate: string): string {
    return dayWords(isoDate, this.locale);
  }

  protected at(isoDate: string, hour: number): string {
    return dayAndClock(isoDate, hour, this.locale);
  }

  protected clock(hour: number): string {
    return clockText(hour, this.locale);
  }

  protected hours(value: number): string {
    return hoursText(value);
  }
}
