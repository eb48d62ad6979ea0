import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input, output, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { Router } from '@angular/router';
import type { InvoiceDraftCreate, JobBillingView, ValueLineView } from '@layerbook/contracts/types';
import { map, of, startWith, switchMap } from 'rxjs';
import { errorText } from '../../../shared/forms/error-text';
import { tooLong } from '../../../shared/forms/field-words';
import { hydratedSignal } from '../../../shared/forms/hydrated';
import { DATE_YEAR_WORDS, dateYearInRange, toIsoDate } from '../../../shared/forms/iso-date';
import { AMOUNT_WORDS } from '../../../shared/forms/money-input';
import { Submission } from '../../../shared/forms/submission';
import { FormAlert } from '../../../shared/ui/form-alert';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { serverSaid, sumDifferenceWords } from './billing-words';
import { newClientKey } from '../../../shared/client-key';
import { JobBillingApi } from './job-billing-api';
import { LINE_LABEL_MAX_LENGTH } from './schedule-form';
import { type ValueLinesFormGroup, progressGroup, progressMarks, readValueLines, valueLineGroup, valueLinesForm } from './value-lines-form';
import { TranslatePipe } from '@ngx-translate/core';

/** Progress billing: the schedule of values, each line's reading from the site, and the drafts it bills. */
@Component({
  selector: 'lb-value-lines',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MoneyPipe,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './value-lines.html',
  styleUrls: ['./billing-section.scss', './value-lines.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ValueLines {
  private readonly api = inject(JobBillingApi);
  private readonly router = inject(Router);
  private readonly locale = inject(LOCALE_ID);

  readonly view = input.required<JobBillingView>();
  readonly changed = output<JobBillingView | null>();

  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly serverSaid = serverSaid;
  protected readonly words = {
    label: { required: 'Give the line a name.', ...tooLong(LINE_LABEL_MAX_LENGTH) },
    amount: { required: 'Enter an amount.', ...AMOUNT_WORDS },
    percent: {
      required: 'Enter how far the work is, 0 to 100.',
      min: 'At least 0 %.',
      max: 'At most 100 %.',
      decimals: 'Use at most two decimals.',
    },
    date: { required: 'Choose the day.', matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
  };

  /** the day readings are dated with, and the end of the period a progress draft bills */
  protected readonly dates = new FormGroup({ on: new FormControl<Date | null>(new Date(), [Validators.required, dateYearInRange]) });
  protected readonly lines = computed(() => [...this.view().valueLines].sort((a, b) => a.position - b.position));
  /** one reading form per line, made again from each new view */
  protected readonly readings = computed(() => new Map(this.lines().map((l) => [l.id, progressGroup(l)])));
  protected readonly sending = signal<string | null>(null);

  /** the lines being edited, or null while the table is shown */
  protected readonly editing = signal<ValueLinesFormGroup | null>(null);
  private readonly editedAmounts = toSignal(
    toObservable(this.editing).pipe(
      switchMap((form) =>
        form
          ? form.valueChanges.pipe(
              startWith(null),
              map(() => form.getRawValue().lines.map((l) => l.scheduledValue)),
            )
          : of(null),
      ),
    ),
    { initialValue: null },
  );
  protected readonly sumCheck = computed(() => {
    const amounts = this.editedAmounts();
    const v = this.view();
    return amounts ? sumDifferenceWords(amounts, v.contractSum, v.currency, this.locale) : null;
  });

  protected editLines(): void {
    this.submission.say(null);
    this.editing.set(valueLinesForm(this.lines()));
  }

  protected addLine(form: ValueLinesFormGroup): void {
    form.controls.lines.push(valueLineGroup());
  }

  protected removeLine(form: ValueLinesFormGroup, index: number): void {
    form.controls.lines.removeAt(index);
  }

  protected async saveLines(form: ValueLinesFormGroup): Promise<void> {
    const sum = this.sumCheck();
    if (sum && !sum.isExact) {
      this.submission.say(sum.text);
      return;
    }
    const saved = await this.submission.send(form, () => this.api.saveValueLines(this.view().jobId, readValueLines(form)));
    if (saved) {
      this.editing.set(null);
      this.changed.emit(saved);
    }
  }

  protected async recordReading(line: ValueLineView): Promise<void> {
    const reading = this.readings().get(line.id);
    if (!reading) return;
    if (this.dates.invalid || reading.invalid) {
      this.dates.markAllAsTouched();
      reading.markAllAsTouched();
      return;
    }
    const on = toIsoDate(this.dates.controls.on.value) ?? '';
    const marks = progressMarks(line, reading.getRawValue(), on, this.view().currency, newClientKey);
    if (marks.length === 0) {
      this.submission.say(`Nothing changed on “${line.label}”.`);
      return;
    }
    this.sending.set(line.id);
    try {
      const jobId = this.view().jobId;
      const sent = await this.submission.send(reading, async () => {
        for (const mark of marks) await this.api.markProgress(jobId, mark);
        return true;
      });
      if (sent) this.changed.emit(null);
    } finally {
      this.sending.set(null);
    }
  }

  protected async draft(kind: 'progress' | 'retainage'): Promise<void> {
    const periodEnd = toIsoDate(this.dates.controls.on.value) ?? '';
    const body: InvoiceDraftCreate = kind === 'progress' ? { kind, periodEnd } : { kind };
    this.sending.set(kind);
    try {
      const draft = await this.submission.send(this.dates, () => this.api.draftInvoice(this.view().jobId, body));
      if (draft) await this.router.navigate(['/billing/invoices', draft.id]);
    } finally {
      this.sending.set(null);
    }
  }
}
