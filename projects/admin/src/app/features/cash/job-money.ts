import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import type { CashJobs } from '@layerbook/contracts/types';
import { percentWords } from './cash-words';
import { TranslatePipe } from '@ngx-translate/core';

export const JOBS_URL = '/api/cash/jobs';

/**
 * Whether to show the margin columns: only when the API says it gave margins (the owner) and some
 * job carries them; the office never gets them, so it never sees empty margin columns either.
 */
export function hasMargins(jobs: CashJobs): boolean {
  return jobs.marginsShown && jobs.jobs.some((job) => job.margin !== undefined);
}

/** How estimates turn into work and what each job brought in: win rate, average job size, and money per job. */
@Component({
  selector: 'lb-job-money',
  imports: [TranslatePipe, FormAlert, MatProgressBarModule, MoneyPipe, RouterLink],
  templateUrl: './job-money.html',
  styleUrl: './cash-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobMoney {
  protected readonly percentWords = percentWords;
  protected readonly jobs = httpResource<CashJobs>(() => JOBS_URL);
  protected readonly view = computed(() => (this.jobs.hasValue() ? this.jobs.value() : null));
  protected readonly message = loadMessage(this.jobs);
  protected readonly showsMargins = computed(() => {
    const view = this.view();
    return view !== null && hasMargins(view);
  });
}
