import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, OnInit, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { InquiryDetail, InquiryStage } from '@layerbook/contracts';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { FollowUpDate } from '../../shared/ui/follow-up-date';
import { FormAlert } from '../../shared/ui/form-alert';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { INQUIRY_STAGES, SOURCE_LABELS, STAGE_ICONS, STAGE_LABELS, isReferral } from '../../shared/ui/stage-words';
import { ActivityForm } from './activity-form';
import { ActivityLog } from './activity-log';
import { budgetLabel } from './budget-words';
import { InquiryApi } from './inquiry-api';
import { InquiryForm } from './inquiry-form';
import { NextStepForm } from './next-step-form';
import { StageMover } from './stage-mover';

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
  ],
  templateUrl: './inquiry-detail.html',
  styleUrl: './inquiry-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryDetailPage implements OnInit {
  private readonly api = inject(InquiryApi);
  private readonly mover = inject(StageMover);
  private readonly snackBar = inject(MatSnackBar);
  private readonly firmCurrency = inject(FirmCurrency);

  /** From the route (withComponentInputBinding). */
  readonly id = input.required<string>();

  protected readonly inquiry = signal<InquiryDetail | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly isEditing = signal(false);
  protected readonly isBusy = signal(false);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly message = signal<string | null>(null);
  protected readonly currency = this.firmCurrency.code;
  protected readonly stages = INQUIRY_STAGES;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly stageIcons = STAGE_ICONS;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly budgetLabel = budgetLabel;
  protected readonly isReferral = isReferral;

  constructor() {
    void this.firmCurrency.load();
  }

  ngOnInit(): void {
    void this.load();
  }

  protected async changeStage(select: MatSelect, stage: InquiryStage): Promise<void> {
    const current = this.inquiry();
    if (!current || stage === current.stage) {
      return;
    }
    this.message.set(null);
    this.isBusy.set(true);
    try {
      const saved = await this.mover.move(current, stage);
      if (saved) {
        this.inquiry.set(saved);
      } else {
        select.writeValue(current.stage);
      }
    } catch (error) {
      select.writeValue(current.stage);
      const problem = toProblem(error);
      this.message.set(problem.detail ?? problem.title);
    } finally {
      this.isBusy.set(false);
    }
  }

  protected async fileAsClient(): Promise<void> {
    const current = this.inquiry();
    if (!current) {
      return;
    }
    this.message.set(null);
    this.isBusy.set(true);
    try {
      await this.api.convert(current.id, {});
      this.inquiry.set(await this.api.get(current.id));
      this.snackBar.open(`${current.contactName} is filed as a client.`, 'Close', { duration: 5000 });
    } catch (error) {
      const problem = toProblem(error);
      this.message.set(problem.errors?.map((e) => e.message).join(' ') || (problem.detail ?? problem.title));
    } finally {
      this.isBusy.set(false);
    }
  }

  protected showSaved(saved: InquiryDetail, what: string): void {
    this.inquiry.set(saved);
    this.isEditing.set(false);
    this.snackBar.open(what, 'Close', { duration: 4000 });
  }

  private async load(): Promise<void> {
    try {
      this.inquiry.set(await this.api.get(this.id()));
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
