import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import {
  BUDGET_LABELS,
  BUDGET_RANGES,
  EMAIL_MAX_LENGTH,
  INQUIRY_LIMITS as L,
  INQUIRY_SOURCES,
  PHONE_MAX_LENGTH,
  SOURCE_LABELS,
  isReferralSource,
  type BudgetRange,
  type InquiryCreate,
  type InquiryDetail,
  type InquirySource,
} from '@layerbook/contracts/types';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { errorText } from '../../shared/forms/error-text';
import { EMAIL_WORDS, tooLong } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { DATE_YEAR_WORDS, dateYearInRange, toIsoDate } from '../../shared/forms/iso-date';
import { AMOUNT_WORDS, amountText, toAmount } from '../../shared/forms/money-input';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { YEAR_WORDS, toYear, yearText } from '../../shared/forms/year-input';
import { FormAlert } from '../../shared/ui/form-alert';
import { Assignees } from './assignees';
import { InquiryApi } from './inquiry-api';

/** What the prospect told us, as PATCH /api/inquiries/:id takes it. */
type InquiryDetails = Omit<InquiryCreate, 'estimatedValue' | 'assigneeUserId' | 'nextFollowUp'>;

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
    TranslatePipe,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './inquiry-form.html',
  styleUrl: './inquiry-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryForm implements OnInit {
  private readonly api = inject(InquiryApi);
  private readonly fb = inject(NonNullableFormBuilder);

  /** The inquiry being edited; none means a new one. */
  readonly inquiry = input<InquiryDetail | null>(null);
  readonly saved = output<InquiryDetail>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.inquiry() === null);
  protected readonly sources = INQUIRY_SOURCES;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly budgets = BUDGET_RANGES;
  protected readonly budgetLabels = BUDGET_LABELS;
  protected readonly people = inject(Assignees).active;
  protected readonly currency = inject(FirmCurrency).code;
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;

  protected readonly form = this.fb.group({
    contactName: ['', [requiredText, Validators.maxLength(L.contactName)]],
    email: ['', [Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    phone: ['', Validators.maxLength(PHONE_MAX_LENGTH)],
    siteAddress: ['', Validators.maxLength(L.siteAddress)],
    yearBuilt: ['', yearText],
    rooms: ['', Validators.maxLength(L.rooms)],
    finishIdea: ['', Validators.maxLength(L.finishIdea)],
    timeline: ['', Validators.maxLength(L.timeline)],
    budgetRange: this.fb.control<BudgetRange>(''),
    source: this.fb.control<InquirySource | ''>('', Validators.required),
    referrerName: ['', Validators.maxLength(L.referrerName)],
    estimatedValue: ['', amountText],
    assigneeUserId: this.fb.control<string | null>(null),
    nextFollowUp: this.fb.control<Date | null>(null, dateYearInRange),
  });

  private readonly source = toSignal(this.form.controls.source.valueChanges, { initialValue: '' as const });
  protected readonly isReferral = computed(() => isReferralSource(this.source()));

  protected readonly words = {
    contactName: { required: 'Enter the contact name.', ...tooLong(L.contactName) },
    email: EMAIL_WORDS,
    phone: tooLong(PHONE_MAX_LENGTH),
    siteAddress: tooLong(L.siteAddress),
    rooms: tooLong(L.rooms),
    finishIdea: tooLong(L.finishIdea),
    timeline: tooLong(L.timeline),
    referrerName: tooLong(L.referrerName),
    year: YEAR_WORDS,
    source: { required: 'Choose where the inquiry came from.' },
    amount: AMOUNT_WORDS,
    date: { matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
  };

  constructor() {
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
      budgetRange: inquiry.budgetRange,
      source: inquiry.source,
      referrerName: inquiry.referrerName,
    });
    this.form.controls.source.updateValueAndValidity();
  }

  protected async saveInquiry(): Promise<void> {
    const current = this.inquiry();
    const saved = await this.submission.send(this.form, () =>
      current ? this.api.update(current.id, this.details()) : this.api.create(this.toCreate()),
    );
    if (saved) {
      this.saved.emit(saved);
    }
  }

  private details(): InquiryDetails {
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
      referrerName: isReferralSource(source) ? v.referrerName.trim() : '',
    };
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
