import { CdkDrag, CdkDragDrop, CdkDropList, CdkDropListGroup } from '@angular/cdk/drag-drop';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, ElementRef, Injector, afterNextRender, computed, inject, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { BoardColumn, InquiryStage, InquirySummary, ItemList } from '@layerbook/contracts/types';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { problemMessage } from '../../core/errors/problem';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { moveCard, replaceCard } from './board-moves';
import { InquiryCard } from './inquiry-card';
import { InquiryViews } from './inquiry-views';
import { StageMover } from './stage-mover';
import { STAGE_ICONS } from './stage-icons';

@Component({
  selector: 'lb-inquiry-board',
  imports: [
    CdkDrag,
    CdkDropList,
    CdkDropListGroup,
    FormAlert,
    InquiryCard,
    InquiryViews,
    MatIconModule,
    MatProgressBarModule,
    MatTooltipModule,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './inquiry-board.html',
  styleUrl: './inquiry-board.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryBoard {
  private readonly mover = inject(StageMover);
  private readonly translate = inject(TranslateService);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);
  private readonly firmCurrency = inject(FirmCurrency);

  protected readonly board = httpResource<ItemList<BoardColumn>>(() => '/api/inquiries/board');
  protected readonly columns = computed(() => (this.board.hasValue() ? this.board.value().items : []));
  private readonly moveMessage = signal<string | null>(null);
  private readonly boardMessage = loadMessage(this.board);
  protected readonly message = computed(() => this.boardMessage() ?? this.moveMessage());
  protected readonly currency = this.firmCurrency.code;
  protected readonly stageIcons = STAGE_ICONS;
  /** On touch screens a swipe should scroll the board; a press-and-hold picks a card up. */
  protected readonly dragDelay = { touch: 300, mouse: 0 };

  constructor() {
    void this.firmCurrency.load();
  }

  protected async dropCard(event: CdkDragDrop<InquiryStage, InquiryStage, InquirySummary>): Promise<void> {
    if (event.previousContainer !== event.container) {
      await this.moveCard(event.item.data, event.container.data);
    }
  }

  /** Shows the move at once, then keeps what the server says, or puts the card back. */
  protected async moveCard(card: InquirySummary, stage: InquiryStage): Promise<void> {
    this.moveMessage.set(null);
    const before = this.columns();
    this.board.set({ items: moveCard(before, card, stage) });
    try {
      const saved = await this.mover.move(card, stage);
      this.board.set({ items: saved ? replaceCard(this.columns(), saved) : before });
    } catch (error) {
      this.board.set({ items: before });
      this.moveMessage.set(
        String(this.translate.instant('inquiries.board.notMoved', { name: card.contactName, problem: problemMessage(error) })),
      );
    }
    this.focusMoveButton(card.id);
  }

  /** The card is drawn anew in its column, so focus follows it rather than falling to the page. */
  private focusMoveButton(id: string): void {
    afterNextRender(
      () => {
        const card = this.host.nativeElement.querySelector(`[data-inquiry-id="${CSS.escape(id)}"]`);
        card?.querySelector<HTMLElement>('button.move')?.focus();
      },
      { injector: this.injector },
    );
  }
}
