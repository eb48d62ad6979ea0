import { ChangeDetectionStrategy, Component, OnInit, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import type { InquiryDetail, InquiryUpdate } from '@layerbook/contracts/types';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { DATE_YEAR_WORDS, dateYearInRange, fromIsoDate, toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText, toAmount } from '../../shared/forms/money-input';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { Assignees } from './assignees';
import { InquiryApi } from './inquiry-api';

/** What the inquiry may be worth, who has it, and when to call back. */
@Component({
  selector: 'lb-next-step-form',
  imports: [
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  providers: [provideNativeDateAdapter()],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveNextStep()" novalidate aria-labelledby="next-step-heading">
      <fieldset class="lb-gate" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <div class="fields">
          <mat-form-field>
            <mat-label>{{ 'inquiries.form.estimatedValue' | translate }}</mat-label>
            <input matInput formControlName="estimatedValue" inputmode="decimal" autocomplete="off" />
            @if (currency(); as code) {
              <span matTextSuffix>&nbsp;{{ code }}</span>
            }
            <mat-hint>{{ 'inquiries.nextStep.valueHint' | translate }}</mat-hint>
            <mat-error>{{ errorText(form.controls.estimatedValue, words.amount) }}</mat-error>
          </mat-form-field>
          <mat-form-field>
            <mat-label>{{ 'inquiries.form.assignedTo' | translate }}</mat-label>
            <mat-select formControlName="assigneeUserId">
              <mat-option [value]="null">{{ 'inquiries.form.nobodyYet' | translate }}</mat-option>
              @for (person of people(); track person.userId) {
                <mat-option [value]="person.userId">{{ person.name }}</mat-option>
              }
            </mat-select>
            <mat-error>{{ errorText(form.controls.assigneeUserId, {}) }}</mat-error>
          </mat-form-field>
          <mat-form-field>
            <mat-label>{{ 'inquiries.form.nextFollowUp' | translate }}</mat-label>
            <input matInput [matDatepicker]="picker" formControlName="nextFollowUp" autocomplete="off" />
            <mat-datepicker-toggle matIconSuffix [for]="picker" />
            <mat-datepicker #picker />
            <mat-hint>{{ 'inquiries.nextStep.followUpHint' | translate }}</mat-hint>
            <mat-error>{{ errorText(form.controls.nextFollowUp, words.date) }}</mat-error>
          </mat-form-field>
        </div>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="submission.isBusy()">{{ 'inquiries.nextStep.save' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(14rem, 1fr));
      gap: 1rem;
      align-items: start;
      margin-bottom: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NextStepForm implements OnInit {
  private readonly api = inject(InquiryApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly inquiry = input.required<InquiryDetail>();
  readonly saved = output<InquiryDetail>();

  protected readonly people = inject(Assignees).active;
  protected readonly currency = inject(FirmCurrency).code;
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly words = {
    amount: AMOUNT_WORDS,
    date: { matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
  };

  protected readonly form = this.fb.group({
    estimatedValue: ['', amountText],
    assigneeUserId: this.fb.control<string | null>(null),
    nextFollowUp: this.fb.control<Date | null>(null, dateYearInRange),
  });

  ngOnInit(): void {
    this.show(this.inquiry());
  }

  protected async saveNextStep(): Promise<void> {
    const saved = await this.submission.send(this.form, () => this.api.update(this.inquiry().id, this.toUpdate()));
    if (saved) {
      this.show(saved);
      this.saved.emit(saved);
    }
  }

  private show(inquiry: InquiryDetail): void {
    this.form.reset({
      estimatedValue: inquiry.estimatedValue ?? '',
      assigneeUserId: inquiry.assigneeUserId,
      nextFollowUp: fromIsoDate(inquiry.nextFollowUp),
    });
  }

  private toUpdate(): InquiryUpdate {
    const value = this.form.getRawValue();
    return {
      estimatedValue: toAmount(value.estimatedValue),
      assigneeUserId: value.assigneeUserId,
      nextFollowUp: toIsoDate(value.nextFollowUp),
    };
  }
}
