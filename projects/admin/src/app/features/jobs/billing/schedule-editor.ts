import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, effect, inject, input, output, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { DatePipe } from '@angular/common';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import {
  BILLING_METHODS,
  BILLING_METHOD_LABELS,
  BILLING_TRIGGER_KINDS,
  BILLING_TRIGGER_LABELS,
  type JobBillingView,
  type ScheduleLineView,
} from '@layerbook/contracts/types';
import { firstValueFrom, map, startWith } from 'rxjs';
import { errorText } from '../../../shared/forms/error-text';
import { tooLong } from '../../../shared/forms/field-words';
import { hydratedSignal } from '../../../shared/forms/hydrated';
import { DATE_YEAR_WORDS } from '../../../shared/forms/iso-date';
import { AMOUNT_WORDS } from '../../../shared/forms/money-input';
import { Submission } from '../../../shared/forms/submission';
import { CalendarDatePipe } from '../../../shared/ui/calendar-date-pipe';
import { ConfirmDialog, type ConfirmDialogData } from '../../../shared/ui/confirm-dialog';
import { FormAlert } from '../../../shared/ui/form-alert';
import { LINE_ROLE_LABELS, depositCapWords, lineStatus, serverSaid, sumDifferenceWords, type ScheduleLineRole } from './billing-words';
import { JobBillingApi } from './job-billing-api';
import {
  LINE_LABEL_MAX_LENGTH,
  fillScheduleForm,
  isLineLocked,
  layerChoices,
  readScheduleForm,
  scheduleForm,
  scheduleLineGroup,
} from './schedule-form';
import { TranslatePipe } from '@ngx-translate/core';

const START_MESSAGE =
  'From now on Layerbook watches each line’s trigger (the date, the layer finished on every surface, the walkthrough) and drafts its invoice when the trigger is met; a line already due, like a deposit on acceptance, is drafted right away. ' +
  'Drafts wait on the job and in Billing for someone to review them: nothing is sent to the client without a person. ' +
  'The firm’s terms and deposit rule are copied onto the job now.';

/** The payment schedule: the method, the lines with their triggers and amounts, the checks, Save and Start billing. */
@Component({
  selector: 'lb-schedule-editor',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    DatePipe,
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './schedule-editor.html',
  styleUrls: ['./billing-section.scss', './schedule-editor.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScheduleEditor {
  private readonly api = inject(JobBillingApi);
  private readonly dialog = inject(MatDialog);
  private readonly locale = inject(LOCALE_ID);

  readonly view = input.required<JobBillingView>();
  /** the server's new view when it sent one, else null: the page reloads */
  readonly changed = output<JobBillingView | null>();

  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly methods = BILLING_METHODS;
  protected readonly methodLabels = BILLING_METHOD_LABELS;
  protected readonly triggerKinds = BILLING_TRIGGER_KINDS;
  protected readonly triggerLabels = BILLING_TRIGGER_LABELS;
  protected readonly roles: readonly ScheduleLineRole[] = ['deposit', 'milestone', 'final'];
  protected readonly roleLabels = LINE_ROLE_LABELS;
  protected readonly lineStatus = lineStatus;
  protected readonly serverSaid = serverSaid;
  protected readonly words = {
    label: { required: 'Give the line a name, as the client will read it.', ...tooLong(LINE_LABEL_MAX_LENGTH) },
    amount: { required: 'Enter an amount.', ...AMOUNT_WORDS },
    date: { required: 'Choose the day.', matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
    layer: { required: 'Choose the layer this line waits for.' },
  };

  protected readonly form = scheduleForm();
  protected readonly value = toSignal(
    this.form.valueChanges.pipe(
      startWith(null),
      map(() => this.form.getRawValue()),
    ),
    { initialValue: this.form.getRawValue() },
  );

  protected readonly layers = computed(() => layerChoices(this.view().workItems, this.view().lines));
  private readonly linesById = computed(() => new Map(this.view().lines.map((l) => [l.id, l])));
  protected readonly isStarted = computed(() => this.view().billingStartedAt !== null);

  /** The lines add up to the contract sum (schedule method only: progress keeps just a deposit). */
  protected readonly sumCheck = computed(() => {
    const v = this.view();
    const value = this.value();
    if (value.method !== 'schedule') return null;
    return sumDifferenceWords(
      value.lines.map((l) => l.amount),
      v.contractSum,
      v.currency,
      this.locale,
    );
  });

  protected readonly depositCheck = computed(() => {
    const v = this.view();
    const deposits = this.value().lines.filter((l) => l.role === 'deposit');
    if (deposits.length === 0) return null;
    return depositCapWords(
      deposits.map((l) => l.amount),
      v.terms.depositCap,
      v.terms.depositCapName,
      v.currency,
      this.locale,
    );
  });

  protected readonly progressProblem = computed(() => {
    const value = this.value();
    if (value.method !== 'progress') return null;
    const others = value.lines.filter((l) => l.role !== 'deposit').length;
    const deposits = value.lines.length - others;
    if (others > 0) return 'Billing by progress keeps only the deposit in this schedule: remove the stage and final lines.';
    if (deposits > 1) return 'Billing by progress keeps one deposit line at most.';
    return null;
  });

  constructor() {
    // Refill from each new view unless the office is part-way through an edit.
    effect(() => {
      const view = this.view();
      untracked(() => {
        if (!this.form.dirty) fillScheduleForm(this.form, view);
      });
    });
  }

  protected lineView(id: string | null): ScheduleLineView | null {
    return id ? (this.linesById().get(id) ?? null) : null;
  }

  protected isLocked(id: string | null): boolean {
    const line = this.lineView(id);
    return line !== null && isLineLocked(line);
  }

  protected addLine(): void {
    const lines = this.form.controls.lines;
    const group = scheduleLineGroup();
    if (this.form.controls.method.value === 'progress') group.controls.role.setValue('deposit');
    const last = lines.length - 1;
    // A new stage goes before the final payment, which stays last.
    if (last >= 0 && lines.at(last).getRawValue().role === 'final') lines.insert(last, group);
    else lines.push(group);
    this.form.markAsDirty();
  }

  protected removeLine(index: number): void {
    this.form.controls.lines.removeAt(index);
    this.form.markAsDirty();
  }

  /** Progress billing keeps only the deposit: drop the other lines that are not billed yet. */
  protected keepOnlyDeposit(): void {
    const lines = this.form.controls.lines;
    for (let i = lines.length - 1; i >= 0; i--) {
      const line = lines.at(i);
      if (line.getRawValue().role !== 'deposit' && !this.isLocked(line.controls.id.value)) lines.removeAt(i);
    }
    this.form.markAsDirty();
  }

  protected undoChanges(): void {
    this.submission.say(null);
    fillScheduleForm(this.form, this.view());
  }

  protected async saveSchedule(): Promise<void> {
    const problem = this.checkProblem();
    if (problem) {
      this.form.markAllAsTouched();
      this.submission.say(problem);
      return;
    }
    const saved = await this.submission.send(this.form, () => this.api.saveSchedule(this.view().jobId, readScheduleForm(this.form)));
    if (saved) {
      this.form.markAsPristine();
      this.changed.emit(saved);
    }
  }

  protected async startBilling(): Promise<void> {
    if (this.form.dirty) {
      this.submission.say('Save the schedule (or undo the changes) before billing starts.');
      return;
    }
    const data: ConfirmDialogData = { title: 'Start billing this job?', message: START_MESSAGE, confirmLabel: 'Start billing' };
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data });
    if ((await firstValueFrom(ref.afterClosed())) !== true) return;
    const started = await this.submission.send(this.form, () => this.api.startBilling(this.view().jobId));
    if (started) this.changed.emit(started);
  }

  /** What stops a save before it is sent: the sum, the deposit cap, the progress method's one deposit. */
  private checkProblem(): string | null {
    const sum = this.sumCheck();
    if (sum && !sum.isExact) return sum.text;
    const deposit = this.depositCheck();
    if (deposit && !deposit.isWithin) return deposit.text;
    return this.progressProblem();
  }
}
