import { HttpClient, httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import {
  BILLING_LIMITS as L,
  DEPOSIT_AT_ACCEPTANCE,
  DEPOSIT_AT_ACCEPTANCE_LABELS,
  DEPOSIT_CAP_KINDS,
  DEPOSIT_CAP_KIND_LABELS,
  DEPOSIT_CAP_PRESETS,
  DEPOSIT_CREDIT_RULES,
  DEPOSIT_CREDIT_RULE_LABELS,
  NONE_AFTER_WORDS,
  PREFIX_CLASH_WORDS,
  type BillingSettings,
  type BillingSettingsView,
} from '@layerbook/contracts/types';
import { documentNumber } from '@layerbook/domain';
import { firstValueFrom, map, startWith } from 'rxjs';
import { Session } from '../../core/auth/session';
import { errorText } from '../../shared/forms/error-text';
import { tooLong } from '../../shared/forms/field-words';
import { fillWhenLoaded } from '../../shared/forms/fill-when-loaded';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { AMOUNT_WORDS } from '../../shared/forms/money-input';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { applyPreset, billingSettingsForm, fillBillingForm, presetOf, readBillingForm } from './billing-settings-form';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

const range = (min: number, max: number, unit: string) => ({
  required: `Enter a number of ${unit}.`,
  min: `At least ${min}.`,
  max: `At most ${max}.`,
  whole: `A whole number of ${unit}.`,
});

/**
 * How the firm bills: its deposit rule (a ready-made one or its own, with the name printed on
 * screen and invoices), what happens to the deposit when the client accepts, payment terms,
 * retainage, deposit credit, reminders, numbers and footer.
 * The owner edits; office reads.
 */
@Component({
  selector: 'lb-billing-settings',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    MatRadioModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './billing-settings.html',
  styleUrl: './billing-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BillingSettingsPage {
  private readonly http = inject(HttpClient);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly isHydrated = hydratedSignal();
  protected readonly billing = httpResource<BillingSettingsView>(() => '/api/firm/billing');
  protected readonly view = computed(() => (this.billing.hasValue() ? this.billing.value() : null));
  protected readonly isLoading = computed(() => !this.billing.hasValue() && this.billing.isLoading());
  private readonly loadFailure = loadMessage(this.billing);
  protected readonly submission = new Submission();
  protected readonly message = computed(() => this.submission.message() ?? this.loadFailure());
  protected readonly errorText = errorText;

  protected readonly presets = DEPOSIT_CAP_PRESETS;
  protected readonly capKinds = DEPOSIT_CAP_KINDS;
  protected readonly capKindLabels = DEPOSIT_CAP_KIND_LABELS;
  protected readonly creditRules = DEPOSIT_CREDIT_RULES;
  protected readonly creditLabels = DEPOSIT_CREDIT_RULE_LABELS;
  protected readonly acceptanceChoices = DEPOSIT_AT_ACCEPTANCE;
  protected readonly acceptanceLabels = DEPOSIT_AT_ACCEPTANCE_LABELS;
  protected readonly words = {
    amount: { required: 'Enter the amount.', ...AMOUNT_WORDS },
    percent: { required: 'Enter a percent.', min: 'Cannot be negative.', max: 'At most 100 %.' },
    termsDays: range(L.termsDays.min, L.termsDays.max, 'days'),
    reminderDays: range(L.reminderDays.min, L.reminderDays.max, 'days'),
    maxAfter: { ...range(L.maxAfter.min, L.maxAfter.max, 'reminders'), noneAfter: NONE_AFTER_WORDS },
    ruleName: { required: 'Name the rule as it should be printed.', ...tooLong(L.depositCapNameMaxLength) },
    prefix: {
      ...tooLong(L.prefixMaxLength),
      pattern: 'Use letters, digits, spaces and . / _ - only.',
      'prefix-receipts': PREFIX_CLASH_WORDS.receipts,
      'prefix-same': PREFIX_CLASH_WORDS.same,
    },
    footer: tooLong(L.footerMaxLength),
  };

  protected readonly form = billingSettingsForm();
  /** which ready-made deposit rule the form holds ('own': one the firm typed); not sent */
  protected readonly preset = new FormControl<number | 'own'>('own', { nonNullable: true });
  protected readonly value = toSignal(
    this.form.valueChanges.pipe(
      startWith(null),
      map(() => this.form.getRawValue()),
    ),
    { initialValue: this.form.getRawValue() },
  );
  protected readonly invoiceExample = computed(() => documentNumber(this.value().invoicePrefix, 1));
  protected readonly creditNoteExample = computed(() => documentNumber(this.value().creditNotePrefix, 1));

  constructor() {
    fillWhenLoaded(this.billing, (view) => {
      fillBillingForm(this.form, view.settings);
      this.syncPreset(view.settings);
      if (this.isOwner()) {
        this.form.enable();
        this.preset.enable();
      } else {
        this.form.disable();
        this.preset.disable();
      }
    });
    this.preset.valueChanges.pipe(takeUntilDestroyed()).subscribe((choice) => {
      if (choice !== 'own') applyPreset(this.form, choice);
    });
    // Typing over a ready-made rule makes it the firm's own.
    this.form.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.syncPreset(readBillingForm(this.form)));
  }

  protected async saveBilling(): Promise<void> {
    const saved = await this.submission.send(this.form, () =>
      firstValueFrom(this.http.put<BillingSettingsView>('/api/firm/billing', readBillingForm(this.form))),
    );
    if (saved) {
      this.billing.set(saved);
      this.snackBar.open(this.translate.instant('firms.snack.billingSaved') as string, this.translate.instant('ui.snack.close') as string, {
        duration: 4000,
      });
    }
  }

  private syncPreset(settings: Pick<BillingSettings, 'depositCap' | 'depositCapName'>): void {
    this.preset.setValue(presetOf(settings.depositCap, settings.depositCapName), { emitEvent: false });
  }
}
