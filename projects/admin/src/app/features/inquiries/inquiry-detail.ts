import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import {
  BUDGET_LABELS,
  INQUIRY_STAGES,
  SOURCE_LABELS,
  STAGE_LABELS,
  isReferralSource,
  type ClientMatch,
  type InquiryDetail,
  type InquiryStage,
  type ItemList,
} from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { loadMessage } from '../../shared/forms/load-message';
import { FollowUpDate } from '../../shared/ui/follow-up-date';
import { FormAlert } from '../../shared/ui/form-alert';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { ActivityForm } from './activity-form';
import { ActivityLog } from './activity-log';
import { InquiryApi, inquiryUrl } from './inquiry-api';
import { InquiryForm } from './inquiry-form';
import { NextStepForm } from './next-step-form';
import { StageMover } from './stage-mover';
import { STAGE_ICONS } from './stage-icons';
import { matchLabel, matchWords } from '../clients/client-match-words';

@Component({
  selector: 'lb-inquiry-detail',
  imports: [
    ActivityForm,
    ActivityLog,
    DatePipe,
    FollowUpDate,
    FormAlert,
    InquiryForm,
    LeadSafetyNote,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    MoneyPipe,
    NextStepForm,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './inquiry-detail.html',
  styleUrl: './inquiry-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryDetailPage {
  private readonly translate = inject(TranslateService);
  private readonly api = inject(InquiryApi);
  private readonly mover = inject(StageMover);
  private readonly snackBar = inject(MatSnackBar);
  private readonly firmCurrency = inject(FirmCurrency);

  /** From the route (withComponentInputBinding). */
  readonly id = input.required<string>();

  /** Each change answers with the whole inquiry, which replaces what the page shows. */
  protected readonly detail = httpResource<InquiryDetail>(() => inquiryUrl(this.id()));
  protected readonly inquiry = computed(() => (this.detail.hasValue() ? this.detail.value() : null));
  protected readonly loadMessage = loadMessage(this.detail);
  /** Until it is filed: clients that may already be this prospect (same e-mail, phone or name). */
  protected readonly clientMatches = httpResource<ItemList<ClientMatch>>(() => {
    const current = this.inquiry();
    return current && !current.clientId ? `${inquiryUrl(current.id)}/client-matches` : undefined;
  });
  protected readonly candidates = computed(() => (this.clientMatches.hasValue() ? this.clientMatches.value().items : []));
  protected readonly matchLabel = matchLabel;
  protected readonly matchWords = matchWords;
  protected readonly isEditing = signal(false);
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly currency = this.firmCurrency.code;
  protected readonly stages = INQUIRY_STAGES;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly stageIcons = STAGE_ICONS;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly budgetLabels = BUDGET_LABELS;
  protected readonly isReferral = isReferralSource;

  constructor() {
    void this.firmCurrency.load();
  }

  protected async changeStage(select: MatSelect, stage: InquiryStage): Promise<void> {
    const current = this.inquiry();
    if (!current || stage === current.stage) {
      return;
    }
    await this.act(async () => {
      const saved = await this.mover.move(current, stage).catch((error: unknown) => {
        select.writeValue(current.stage);
        throw error;
      });
      if (saved) {
        this.detail.set(saved);
      } else {
        select.writeValue(current.stage);
      }
    });
  }

  /** Files the prospect as a new client, or under an existing one (`match`) so no duplicate is made. */
  protected async fileAsClient(match?: ClientMatch): Promise<void> {
    const current = this.inquiry();
    if (!current) {
      return;
    }
    await this.act(async () => {
      // "New" says so: a bare convert would join a client with the same e-mail.
      const newClient = {
        kind: 'homeowner',
        isCompany: false,
        name: current.contactName,
        email: current.email,
        phone: current.phone,
        notes: '',
      } as const;
      await this.api.convert(current.id, match ? { clientId: match.id } : { client: newClient });
      this.detail.reload();
      const words: unknown = match
        ? this.translate.instant('inquiries.detail.filedUnder', { name: current.contactName, client: match.name })
        : this.translate.instant('inquiries.detail.filedAsNew', { name: current.contactName });
      this.snackBar.open(String(words), String(this.translate.instant('inquiries.close')), { duration: 5000 });
    });
  }

  /** `whatKey`: the snack bar's words. */
  protected showSaved(saved: InquiryDetail, whatKey: string): void {
    this.detail.set(saved);
    this.isEditing.set(false);
    this.snackBar.open(String(this.translate.instant(whatKey)), String(this.translate.instant('inquiries.close')), { duration: 4000 });
  }

  /** One change from the page's own buttons: busy while it runs, the server's words if it fails. */
  private async act(change: () => Promise<void>): Promise<void> {
    this.message.set(null);
    this.isBusy.set(true);
    try {
      await change();
    } catch (error) {
      // A refused change names its fields, but this page has none to put them beside.
      const fieldWords = toProblem(error)
        .errors?.map((e) => e.message)
        .join(' ');
      this.message.set(fieldWords || problemMessage(error));
    } finally {
      this.isBusy.set(false);
    }
  }
}
