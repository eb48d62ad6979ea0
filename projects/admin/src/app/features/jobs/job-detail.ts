import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { toProblem } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { sameAmount, sumDecimals } from './decimal-sum';
import { JobApi, type JobView } from './job-api';
import { jobStatus, paymentStatus, paymentWhen, percentText } from './job-words';

/** One accepted job: what was signed, for how much, and the payments to ask for. */
@Component({
  selector: 'lb-job-detail',
  imports: [CalendarDatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  templateUrl: './job-detail.html',
  styleUrl: './job-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobDetail implements OnInit {
  private readonly api = inject(JobApi);

  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  protected readonly job = signal<JobView | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly message = signal<string | null>(null);
  protected readonly jobStatus = jobStatus;
  protected readonly paymentStatus = paymentStatus;
  protected readonly paymentWhen = paymentWhen;
  protected readonly percentText = percentText;

  protected readonly siteLines = computed(() => {
    const site = this.job()?.siteAddress;
    if (!site) return [];
    return typeof site === 'string' ? site.split(/\r?\n|,\s*/).filter((l) => l.trim() !== '') : site;
  });

  /** The schedule's own total, added exactly; it should equal the contract sum. */
  protected readonly scheduleTotal = computed(() => {
    const job = this.job();
    return job ? sumDecimals(job.paymentSchedule.map((p) => p.amount)) : null;
  });

  protected readonly isTotalEqual = computed(() => {
    const job = this.job();
    const total = this.scheduleTotal();
    return !job || total === null || sameAmount(total, job.contractSum);
  });

  /** The percentages added exactly; null when a line has none (a fixed amount or the rest). */
  protected readonly percentTotal = computed(() => {
    const percents = (this.job()?.paymentSchedule ?? []).map((p) => percentText(p.percent));
    if (percents.length === 0 || percents.some((p) => p === null)) return null;
    const total = sumDecimals(percents as string[]);
    return total === null ? null : percentText(total);
  });

  ngOnInit(): void {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      this.job.set(await this.api.get(this.id()));
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
