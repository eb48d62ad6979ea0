import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule, MatMenuTrigger } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { INQUIRY_STAGES, STAGE_LABELS, type InquiryStage, type InquirySummary } from '@layerbook/contracts/types';
import { FollowUpDate } from '../../shared/ui/follow-up-date';
import { MoneyPipe } from '../../shared/ui/money-pipe';

/** One inquiry on the board, with a menu that moves it without dragging (keyboard, switch access). */
@Component({
  selector: 'lb-inquiry-card',
  imports: [FollowUpDate, MatButtonModule, MatIconModule, MatMenuModule, MoneyPipe, RouterLink, TranslatePipe],
  host: { '[attr.data-inquiry-id]': 'inquiry().id' },
  template: `
    @let item = inquiry();
    <div class="top">
      <a class="name" [routerLink]="['/inquiries', item.id]">{{ item.contactName }}</a>
      <button
        mat-icon-button
        type="button"
        class="move"
        [attr.aria-label]="'inquiries.card.move' | translate: { name: item.contactName }"
        [matMenuTriggerFor]="moveMenu"
        [matMenuTriggerRestoreFocus]="false"
        (menuClosed)="returnFocus(trigger)"
        #trigger="matMenuTrigger"
      >
        <mat-icon aria-hidden="true">more_vert</mat-icon>
      </button>
      <mat-menu #moveMenu="matMenu" xPosition="before">
        @for (stage of otherStages(); track stage) {
          <button mat-menu-item type="button" (click)="chooseStage(stage)">
            {{ 'inquiries.card.moveTo' | translate: { stage: stageLabels[stage] } }}
          </button>
        }
      </mat-menu>
    </div>
    @if (item.siteAddress) {
      <p class="line">
        <mat-icon aria-hidden="true">home_pin</mat-icon><span>{{ item.siteAddress }}</span>
      </p>
    }
    <p class="line">
      <mat-icon aria-hidden="true">payments</mat-icon>
      @if (item.estimatedValue) {
        <span>{{ item.estimatedValue | money: currency() }}</span>
      } @else {
        <span class="muted">{{ 'inquiries.card.noEstimate' | translate }}</span>
      }
    </p>
    <lb-follow-up-date class="line" [date]="item.nextFollowUp" [isOverdue]="item.isFollowUpOverdue" />
    <p class="line">
      <mat-icon aria-hidden="true">person</mat-icon>
      <span [class.muted]="!item.assigneeName">{{ item.assigneeName ?? ('inquiries.card.notAssigned' | translate) }}</span>
    </p>
  `,
  styleUrl: './inquiry-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryCard {
  readonly inquiry = input.required<InquirySummary>();
  readonly currency = input<string | null>(null);
  readonly moveTo = output<InquiryStage>();

  protected readonly stageLabels = STAGE_LABELS;
  /** After a move the board focuses the card in its new column; otherwise focus goes back here. */
  private hasChosen = false;
  protected readonly otherStages = computed(() => INQUIRY_STAGES.filter((stage) => stage !== this.inquiry().stage));

  protected chooseStage(stage: InquiryStage): void {
    this.hasChosen = true;
    this.moveTo.emit(stage);
  }

  protected returnFocus(trigger: MatMenuTrigger): void {
    if (!this.hasChosen) {
      trigger.focus();
    }
    this.hasChosen = false;
  }
}
