import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { ItemList, JobSheetSummary } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { problemMessage } from '../../../core/errors/problem';
import { FormAlert } from '../../../shared/ui/form-alert';
import { jobDatesWords } from './sheet-format';

/**
 * The crew's jobs (scheduled and in progress, by start date) as cards, each opening its sheet: on the
 * sheets page and on a crew member's Today. Phone first.
 */
@Component({
  selector: 'lb-sheet-jobs',
  imports: [FormAlert, MatIconModule, MatProgressBarModule, RouterLink, TranslatePipe],
  template: `
    <lb-form-alert [message]="message()" />
    @if (list.isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'sheet.list.loading' | translate" />
    }
    <ul class="jobs">
      @for (job of items(); track job.id) {
        <li>
          <a class="job" [routerLink]="['/sheets', job.id]">
            <span class="title">{{ job.title }}</span>
            <span class="line"><mat-icon aria-hidden="true">place</mat-icon>{{ job.siteAddress }}</span>
            <span class="line">
              <mat-icon aria-hidden="true">event</mat-icon>
              @let when = dates(job);
              {{ when.key | translate: when.params }}
            </span>
            <span class="line status">
              <span class="chip">{{ 'sheet.status.' + job.status | translate }}</span>
              <span>{{ 'sheet.list.layers' | translate: { done: job.layersDone, total: job.layersTotal } }}</span>
            </span>
            <progress
              [value]="job.layersDone"
              [max]="job.layersTotal || 1"
              [attr.aria-label]="'sheet.list.layersLabel' | translate"
            ></progress>
          </a>
        </li>
      } @empty {
        @if (!list.isLoading() && !message()) {
          <li class="none">{{ 'sheet.list.empty' | translate }}</li>
        }
      }
    </ul>
  `,
  styles: `
    .jobs {
      list-style: none;
      margin: 1rem 0;
      padding: 0;
      display: grid;
      gap: 0.75rem;
      grid-template-columns: repeat(auto-fill, minmax(min(100%, 20rem), 1fr));
    }
    .job {
      display: grid;
      gap: 0.35rem;
      padding: 0.9rem 1rem;
      min-height: 48px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
      color: inherit;
      text-decoration: none;
    }
    .job:hover,
    .job:focus-visible {
      border-color: var(--mat-sys-primary);
    }
    .title {
      font-weight: 600;
      font-size: 1.1rem;
    }
    .line {
      display: flex;
      align-items: center;
      gap: 0.4rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .line mat-icon {
      width: 18px;
      height: 18px;
      font-size: 18px;
      flex: none;
    }
    .status {
      justify-content: space-between;
      flex-wrap: wrap;
    }
    .chip {
      padding: 0.1rem 0.6rem;
      border-radius: 999px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
      font-size: 0.85rem;
    }
    progress {
      width: 100%;
      height: 0.5rem;
      accent-color: var(--mat-sys-primary);
    }
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetJobs {
  private readonly language = inject(Language);

  protected readonly list = httpResource<ItemList<JobSheetSummary>>(() => '/api/jobs/sheets');
  protected readonly items = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly message = computed(() => {
    const error = this.list.error();
    return error ? problemMessage(error) : null;
  });

  protected dates(job: { readonly startDate: string | null; readonly finishDate: string | null }) {
    return jobDatesWords(job, this.language.locale());
  }
}
