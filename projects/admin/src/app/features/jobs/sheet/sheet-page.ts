import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, ElementRef, computed, effect, inject, input, linkedSignal, untracked } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { JobSheet } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { problemMessage } from '../../../core/errors/problem';
import { FormAlert } from '../../../shared/ui/form-alert';
import { jobDatesWords } from './sheet-format';
import { SheetChanges } from './sheet-changes';
import { SheetFinishes } from './sheet-finishes';
import { SHEET_MARKS } from './sheet-marks';
import { SheetPhotos } from './sheet-photos';
import { SheetPlan } from './sheet-plan';
import { SheetSafety } from './sheet-safety';
import { SheetWork } from './sheet-work';

const jobUrl = (id: string, rest: string) => `/api/jobs/${encodeURIComponent(id)}/${rest}`;

/**
 * One job's sheet for the crew, phone first: where and when, the cautions, each surface's layers
 * to mark done, the finishes with their mix cards, the day plan and progress photos. No money.
 */
@Component({
  selector: 'lb-sheet-page',
  imports: [
    FormAlert,
    MatIconModule,
    MatProgressBarModule,
    RouterLink,
    SheetChanges,
    SheetFinishes,
    SheetPhotos,
    SheetPlan,
    SheetSafety,
    SheetWork,
    TranslatePipe,
  ],
  template: `
    <section class="lb-page">
      <a class="back" routerLink="/sheets"><mat-icon aria-hidden="true">arrow_back</mat-icon>{{ 'sheet.page.back' | translate }}</a>
      <lb-form-alert [message]="message()" />
      @if (sheet.isLoading() && !sheet.hasValue()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'sheet.page.loading' | translate" />
      }
      @if (view(); as s) {
        <header>
          <h1>{{ s.title }}</h1>
          <p class="line"><mat-icon aria-hidden="true">place</mat-icon>{{ s.siteAddress }}</p>
          <p class="line">
            <mat-icon aria-hidden="true">event</mat-icon>
            @let when = dates(s);
            {{ when.key | translate: when.params }}
            <span class="chip">{{ 'sheet.status.' + s.status | translate }}</span>
          </p>
          @if (!marks.online()) {
            <p class="offline" role="status"><mat-icon aria-hidden="true">cloud_off</mat-icon>{{ 'sheet.page.offline' | translate }}</p>
          }
        </header>

        <nav class="jump" [attr.aria-label]="'sheet.page.sections' | translate">
          @for (j of jumps; track j.id) {
            <button type="button" (click)="jumpTo(j.id)">{{ j.words | translate }}</button>
          }
        </nav>

        <section aria-labelledby="sheet-safety">
          <h2 id="sheet-safety">{{ 'sheet.safety.heading' | translate }}</h2>
          <lb-sheet-safety [sheetCautions]="s.cautions" [products]="s.products" />
        </section>

        @if (s.changes.length > 0) {
          <section aria-labelledby="sheet-changes">
            <h2 id="sheet-changes">{{ 'sheet.changes.heading' | translate }}</h2>
            <lb-sheet-changes [changes]="s.changes" />
          </section>
        }

        <section aria-labelledby="sheet-work">
          <h2 id="sheet-work">{{ 'sheet.work.heading' | translate }}</h2>
          <p class="muted">{{ 'sheet.work.hint' | translate }}</p>
          <lb-sheet-work [sheet]="s" />
        </section>

        <section aria-labelledby="sheet-finishes">
          <h2 id="sheet-finishes">{{ 'sheet.finishes.heading' | translate }}</h2>
          <lb-sheet-finishes [finishes]="s.finishes" [products]="s.products" [firmUnits]="s.units" />
        </section>

        <section aria-labelledby="sheet-plan">
          <h2 id="sheet-plan">{{ 'sheet.plan.heading' | translate }}</h2>
          <lb-sheet-plan [days]="s.dayPlan" [timeZone]="s.timeZone" />
        </section>

        <section id="sheet-photos">
          <lb-sheet-photos [sheet]="s" />
        </section>
      }
    </section>
  `,
  styles: `
    .back {
      display: inline-flex;
      align-items: center;
      gap: 0.25rem;
      min-height: 44px;
    }
    header {
      margin-bottom: 0.5rem;
    }
    h1 {
      margin: 0.25rem 0;
    }
    h2 {
      margin: 1.5rem 0 0.5rem;
      scroll-margin-top: 4.5rem;
    }
    .line {
      display: flex;
      align-items: center;
      flex-wrap: wrap;
      gap: 0.4rem;
      margin: 0.25rem 0;
      color: var(--mat-sys-on-surface-variant);
    }
    .line mat-icon {
      width: 18px;
      height: 18px;
      font-size: 18px;
    }
    .chip {
      padding: 0.1rem 0.6rem;
      border-radius: 999px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
      font-size: 0.85rem;
    }
    .offline {
      display: flex;
      align-items: center;
      gap: 0.4rem;
      padding: 0.5rem 0.75rem;
      border-radius: 8px;
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    /* One row of section links that scrolls sideways on a phone and stays in reach. */
    .jump {
      position: sticky;
      top: 0;
      z-index: 1;
      display: flex;
      gap: 0.5rem;
      overflow-x: auto;
      padding: 0.5rem 0;
      background: var(--mat-sys-surface);
    }
    .jump button {
      flex: none;
      padding: 0.4rem 0.8rem;
      min-height: 32px;
      border-radius: 999px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-lowest);
      color: inherit;
      font: inherit;
      cursor: pointer;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetPage {
  private readonly language = inject(Language);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  protected readonly marks = inject(SHEET_MARKS);

  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  protected readonly sheet = httpResource<JobSheet>(() => jobUrl(this.id(), 'sheet'));
  /** the last sheet read: a failed re-read (no signal on site) keeps showing it with the error above */
  protected readonly view = linkedSignal<JobSheet | null, JobSheet | null>({
    source: () => (this.sheet.hasValue() ? this.sheet.value() : null),
    computation: (next, previous) => next ?? previous?.value ?? null,
  });
  protected readonly message = computed(() => {
    const error = this.sheet.error();
    return error ? problemMessage(error) : null;
  });

  constructor() {
    // Each mark the server counts (at once, or later from the phone's queue) reads the sheet again.
    let seen: unknown = null;
    effect(() => {
      const answer = this.marks.progress(this.id())();
      if (answer && answer !== seen) untracked(() => this.sheet.reload());
      seen = answer;
    });
  }

  protected readonly jumps = [
    { id: 'sheet-safety', words: 'sheet.safety.heading' },
    { id: 'sheet-work', words: 'sheet.work.heading' },
    { id: 'sheet-finishes', words: 'sheet.finishes.heading' },
    { id: 'sheet-plan', words: 'sheet.plan.heading' },
    { id: 'sheet-photos', words: 'sheet.photos.heading' },
  ] as const;

  protected jumpTo(id: string): void {
    this.host.nativeElement.querySelector(`#${id}`)?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }

  protected dates(job: { readonly startDate: string | null; readonly finishDate: string | null }) {
    return jobDatesWords(job, this.language.locale());
  }
}
