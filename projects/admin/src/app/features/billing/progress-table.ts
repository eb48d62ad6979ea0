import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, signal, untracked } from '@angular/core';
import {
  AbstractControl,
  FormControl,
  FormGroup,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  ValidationErrors,
  ValidatorFn,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleChange, MatButtonToggleModule } from '@angular/material/button-toggle';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { InvoiceDetail, ProgressTableLine } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { DATE_YEAR_WORDS, dateYearInRange, fromIsoDate, toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText } from '../../shared/forms/money-input';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { InvoiceApi } from './invoice-api';
import { retainageWords } from './invoice-words';
import { formFieldOf, previewLine, progressLinesUpdate, startingWork, type WorkMode } from './progress-input';
import { TranslatePipe } from '@ngx-translate/core';

type LineGroup = FormGroup<{
  valueLineId: FormControl<string>;
  mode: FormControl<WorkMode>;
  workToDate: FormControl<string>;
  storedMaterials: FormControl<string>;
}>;

/** The domain's verdict on the typed work (valueLineWork), as the field's error in words. */
function workToDateCheck(line: ProgressTableLine, currency: string): ValidatorFn {
  return (control: AbstractControl<string>): ValidationErrors | null => {
    const mode = (control.parent?.get('mode')?.value as WorkMode | undefined) ?? 'amount';
    const preview = previewLine(line, mode, control.value ?? '', currency);
    if (preview === null) return { required: true };
    return preview.isValid ? null : { work: preview.message };
  };
}

/**
 * A progress invoice's schedule of values. On a draft the office gives each line's work done to
 * date (as a percent of its value or an amount) and the materials stored on site; the server
 * computes retainage and what is due, and answers the whole invoice. Issued: read only.
 */
@Component({
  selector: 'lb-progress-table',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatButtonToggleModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInputModule,
    MoneyPipe,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './progress-table.html',
  styleUrl: './progress-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgressTable {
  private readonly api = inject(InvoiceApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly invoice = input.required<InvoiceDetail>();
  readonly saved = output<InvoiceDetail>();

  protected readonly table = computed(() => this.invoice().progress);
  protected readonly currency = computed(() => this.invoice().currency);
  protected readonly isEditable = computed(() => this.invoice().status === 'draft');
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly retainageWords = retainageWords;
  protected readonly words = {
    work: { required: 'Enter the work done to date.' },
    stored: AMOUNT_WORDS,
    periodEnd: {
      required: 'Enter the last day of work this invoice covers.',
      matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.',
      ...DATE_YEAR_WORDS,
    },
  };

  protected readonly form = this.fb.group({
    periodEnd: this.fb.control<Date | null>(null, [Validators.required, dateYearInRange]),
    progressLines: this.fb.array<LineGroup>([]),
  });

  /** The invoice, changing only when what this form shows does: saving the notes keeps progress typed here. */
  private readonly shown = computed(() => this.invoice(), {
    equal: (a, b) =>
      a.id === b.id && a.status === b.status && a.periodEnd === b.periodEnd && JSON.stringify(a.progress) === JSON.stringify(b.progress),
  });

  constructor() {
    effect(() => {
      const invoice = this.shown();
      untracked(() => this.show(invoice));
    });
  }

  protected lineGroup(index: number): LineGroup {
    return this.form.controls.progressLines.at(index);
  }

  /** The field's own words, or the domain's sentence on why the work cannot be billed so. */
  protected workError(control: AbstractControl): string {
    const work: unknown = control.errors?.['work'];
    return typeof work === 'string' && !control.errors?.['server'] ? work : errorText(control, this.words.work);
  }

  /** What the line would bill this period as typed; the saved figure until something readable is typed. */
  protected thisPeriod(line: ProgressTableLine, index: number): string | null {
    const { mode, workToDate } = this.lineGroup(index).getRawValue();
    const preview = previewLine(line, mode, workToDate, this.currency());
    if (preview === null) return null;
    return preview.isValid ? preview.thisPeriod : null;
  }

  /** The amount a typed percent comes to, to date (the domain rounds it to the currency). */
  protected amountToDate(line: ProgressTableLine, index: number): string | null {
    const { mode, workToDate } = this.lineGroup(index).getRawValue();
    const preview = previewLine(line, mode, workToDate, this.currency());
    return preview?.isValid ? preview.toDate : null;
  }

  protected switchMode(line: ProgressTableLine, index: number, change: MatButtonToggleChange): void {
    const group = this.lineGroup(index);
    const mode = change.value as WorkMode;
    const before = previewLine(line, group.controls.mode.value, group.controls.workToDate.value, this.currency());
    group.controls.mode.setValue(mode);
    // Percent to amount keeps what was typed, as its amount; otherwise the field starts from the saved figure.
    const start = mode === 'amount' && before?.isValid ? before.toDate : startingWork(line, mode, this.currency());
    group.controls.workToDate.setValue(start);
    group.controls.workToDate.markAsTouched();
  }

  protected async saveProgress(): Promise<void> {
    this.message.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    this.isBusy.set(true);
    try {
      const saved = await this.api.update(this.invoice().id, {
        periodEnd: toIsoDate(value.periodEnd) ?? undefined,
        progressLines: progressLinesUpdate(value.progressLines),
      });
      this.saved.emit(saved);
    } catch (error) {
      const problem = toProblem(error);
      const errors = problem.errors?.map((e) => ({ ...e, field: formFieldOf(e.field) }));
      this.message.set(applyProblem(this.form, { ...problem, errors }));
    } finally {
      this.isBusy.set(false);
    }
  }

  private show(invoice: InvoiceDetail): void {
    const table = invoice.progress;
    const lines = this.form.controls.progressLines;
    lines.clear({ emitEvent: false });
    if (!table) return;
    for (const line of table.lines) {
      lines.push(
        this.fb.group({
          valueLineId: this.fb.control(line.valueLineId),
          mode: this.fb.control<WorkMode>('amount'),
          workToDate: this.fb.control(startingWork(line, 'amount', invoice.currency), workToDateCheck(line, invoice.currency)),
          storedMaterials: this.fb.control(line.storedMaterials, amountText),
        }),
        { emitEvent: false },
      );
    }
    this.form.controls.periodEnd.setValue(fromIsoDate(invoice.periodEnd ?? table.periodEnd));
    this.form.markAsPristine();
    this.form.markAsUntouched();
    if (invoice.status !== 'draft') this.form.disable({ emitEvent: false });
    else this.form.enable({ emitEvent: false });
  }
}
