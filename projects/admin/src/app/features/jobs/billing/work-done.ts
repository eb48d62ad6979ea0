import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import type { JobBillingView, ProgressMark, WorkItemView } from '@layerbook/contracts/types';
import { errorText } from '../../../shared/forms/error-text';
import { hydratedSignal } from '../../../shared/forms/hydrated';
import { DATE_YEAR_WORDS, dateYearInRange, toIsoDate } from '../../../shared/forms/iso-date';
import { Submission } from '../../../shared/forms/submission';
import { CalendarDatePipe } from '../../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../../shared/ui/form-alert';
import { newClientKey } from '../../../shared/client-key';
import { JobBillingApi } from './job-billing-api';
import { groupWork } from './work-groups';
import { TranslatePipe } from '@ngx-translate/core';

/** Work done: each layer on each surface marked done on a day (or reopened), and the walkthrough. */
@Component({
  selector: 'lb-work-done',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './work-done.html',
  styleUrls: ['./billing-section.scss', './work-done.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkDone {
  private readonly api = inject(JobBillingApi);

  readonly view = input.required<JobBillingView>();
  readonly changed = output<void>();

  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly dateWords = {
    required: 'Choose the day the work was done.',
    matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.',
    ...DATE_YEAR_WORDS,
  };
  /** the day every mark below is dated with; today unless the office says otherwise */
  protected readonly form = new FormGroup({
    on: new FormControl<Date | null>(new Date(), [Validators.required, dateYearInRange]),
  });
  protected readonly rooms = computed(() => groupWork(this.view().workItems));
  /** the work item (or "walkthrough") being sent, so its button waits */
  protected readonly sending = signal<string | null>(null);
  /** the work item whose mark the server refused: its words go beside it (a layer whose payment is invoiced says which invoice to void) */
  protected readonly refusedItem = signal<string | null>(null);

  protected markLayer(item: WorkItemView, isDone: boolean): Promise<void> {
    return this.send(item.id, (on) => ({
      kind: isDone ? 'layerDone' : 'layerReopened',
      workItemId: item.id,
      on,
      clientKey: newClientKey(),
    }));
  }

  protected recordWalkthrough(): Promise<void> {
    return this.send('walkthrough', (on) => ({ kind: 'walkthrough', on, clientKey: newClientKey() }));
  }

  private async send(what: string, mark: (on: string) => ProgressMark): Promise<void> {
    this.sending.set(what);
    this.refusedItem.set(null);
    try {
      const on = toIsoDate(this.form.controls.on.value) ?? '';
      const sent = await this.submission.send(this.form, () => this.api.markProgress(this.view().jobId, mark(on)));
      if (sent !== undefined) this.changed.emit();
      else if (what !== 'walkthrough' && this.submission.message() !== null) this.refusedItem.set(what);
    } finally {
      this.sending.set(null);
    }
  }
}
