import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { InquiryCreate, InquiryDetail, InquirySource } from '@layerbook/contracts';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText, toAmount } from '../../shared/forms/money-input';
import { requiredText } from '../../shared/forms/text-validators';
import { YEAR_WORDS, toYear, yearText } from '../../shared/forms/year-input';
import { FormAlert } from '../../shared/ui/form-alert';
import { INQUIRY_SOURCES, SOURCE_LABELS, isReferral } from '../../shared/ui/stage-words';
import { Assignees } from './assignees';
import { BUDGET_CHOICES } from './budget-words';
import { InquiryApi } from './inquiry-api';

const TOO_LONG = { maxlength: 'That is too long for this field.' };

/**
 * What the prospect told us. New inquiries also get a value, a person and a follow-up date here;
 * on an existing one those three live in the detail page's own small form.
 */
@Component({
  selector: 'lb-inquiry-form',
  imports: [
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './inquiry-form.html',
  styleUrl: './inquiry-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryForm implements OnInit {
  private readonly api = inject(InquiryApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly assignees = inject(Assignees);

  /** The inquiry being edited; none means a new one. */
  readonly inquiry = input<InquiryDetail | null>(null);
  readonly saved = output<InquiryDetail>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.inquiry() === null);
  protected readonly sources = INQUIRY_SOURCES;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly budgets = BUDGET_CHOICES;
  protected readonly people = this.assignees.active;
  protected readonly currency = inject(FirmCurrency).code;
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;

  protected readonly form = this.fb.group({
    contactName: ['', [requiredText, Validators.maxLength(120)]],
    email: ['', [Validators.email, Validators.maxLength(254)]],
    phone: ['', Validators.maxLength(40)],
    siteAddress: ['', Validators.maxLength(300)],
    yearBuilt: ['', yearText],
    rooms: ['', Validators.maxLength(2000)],
    finishIdea: ['', Validators.maxLength(2000)],
    timeline: ['', Validators.maxLength(200)],
    budgetRange: this.fb.control<InquiryCreate['budgetRange']>(''),
    source: this.fb.control<InquirySource | ''>('', Validators.required),
    referrerName: ['', Validators.maxLength(120)],
    estimatedValue: ['', amountText],
    assigneeUserId: this.fb.control<string | null>(null),
    nextFollowUp: this.fb.control<Date | null>(null),
  });

  private readonly source = toSignal(this.form.controls.source.valueChanges, { initialValue: '' as const });
  protected readonly isReferral = computed(() => {
    const source = this.source();
    return source !== '' && isReferral(source);
  });

  protected readonly words = {
    contactName: { required: 'Enter the contact name.', maxlength: 'Use at most 120 characters.' },
    email: EMAIL_WORDS,
    line: TOO_LONG,
    year: YEAR_WORDS,
    source: { required: 'Choose where the inquiry came from.' },
    amount: AMOUNT_WORDS,
    date: { matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.' },
  };

  constructor() {
    void this.assignees.load();
    void inject(FirmCurrency).load();
  }

  /** Edits start from what is saved. */
  ngOnInit(): void {
    const inquiry = this.inquiry();
    if (!inquiry) {
      return;
    }
    this.form.reset({
      contactName: inquiry.contactName,
      email: inquiry.email,
      phone: inquiry.phone,
      siteAddress: inquiry.siteAddress,
      yearBuilt: inquiry.yearBuilt === null ? '' : String(inquiry.yearBuilt),
      rooms: inquiry.rooms,
      finishIdea: inquiry.finishIdea,
      timeline: inquiry.timeline,
      budgetRange: inquiry.budgetRange as InquiryCreate['budgetRange'],
      source: inquiry.source,
      referrerName: inquiry.referrerName,
    });
    this.form.controls.source.updateValueAndValidity();
  }

  protected async saveInquiry(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const current = this.inquiry();
      const saved = current ? await this.api.update(current.id, this.details()) : await this.api.create(this.toCreate());
      this.saved.emit(saved);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }

  private details() {
    const v = this.form.getRawValue();
    const source = v.source === '' ? 'other' : v.source;
    return {
      contactName: v.contactName.trim(),
      email: v.email.trim(),
      phone: v.phone.trim(),
      siteAddress: v.siteAddress.trim(),
      yearBuilt: toYear(v.yearBuilt),
      rooms: v.rooms.trim(),
      finishIdea: v.finishIdea.trim(),
      timeline: v.timeline.trim(),
      budgetRange: v.budgetRange,
      source,
      referrerName: isReferral(source) ? v.referrerName.trim() : '',
    } satisfies Partial<InquiryCreate>;
  }

  private toCreate(): InquiryCreate {
    const v = this.form.getRawValue();
    return {
      ...this.details(),
      estimatedValue: toAmount(v.estimatedValue),
      assigneeUserId: v.assigneeUserId,
      nextFollowUp: toIsoDate(v.nextFollowUp),
    };
  }
}
