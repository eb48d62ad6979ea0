import { CdkDrag, CdkDragDrop, CdkDropList, CdkDropListGroup } from '@angular/cdk/drag-drop';
import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  Injector,
  afterNextRender,
  inject,
  signal,
} from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { BoardColumn, InquiryStage, InquirySummary } from '@layerbook/contracts';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { toProblem } from '../../core/errors/problem';
import { FormAlert } from '../../shared/ui/form-alert';
import { STAGE_ICONS } from '../../shared/ui/stage-words';
import { moveCard, replaceCard } from './board-moves';
import { InquiryApi } from './inquiry-api';
import { InquiryCard } from './inquiry-card';
import { InquiryViews } from './inquiry-views';
import { StageMover } from './stage-mover';

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
    RouterLink,
  ],
  templateUrl: './inquiry-board.html',
  styleUrl: './inquiry-board.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryBoard {
  private readonly api = inject(InquiryApi);
  private readonly mover = inject(StageMover);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);
  private readonly firmCurrency = inject(FirmCurrency);

  protected readonly columns = signal<readonly BoardColumn[]>([]);
  protected readonly isLoading = signal(true);
  protected readonly message = signal<string | null>(null);
  protected readonly currency = this.firmCurrency.code;
  protected readonly stageIcons = STAGE_ICONS;
  /** On touch screens a swipe should scroll the board; a press-and-hold picks a card up. */
  protected readonly dragDelay = { touch: 300, mouse: 0 };

  constructor() {
    void this.firmCurrency.load();
    void this.load();
  }

  protected async dropCard(event: CdkDragDrop<InquiryStage, InquiryStage, InquirySummary>): Promise<void> {
    if (event.previousContainer !== event.container) {
      await this.moveCard(event.item.data, event.container.data);
    }
  }

  /** Shows the move at once, then keeps what the server says, or puts the card back. */
  protected async moveCard(card: InquirySummary, stage: InquiryStage): Promise<void> {
    this.message.set(null);
    const before = this.columns();
    this.columns.set(moveCard(before, card, stage));
    try {
      const saved = await this.mover.move(card, stage);
      if (saved) {
        this.columns.update((columns) => replaceCard(columns, saved));
      } else {
        this.columns.set(before);
      }
    } catch (error) {
      this.columns.set(before);
      const problem = toProblem(error);
      this.message.set(`${card.contactName} was not moved. ${problem.detail ?? problem.title}`);
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

  private async load(): Promise<void> {
    try {
      this.columns.set(await this.api.board());
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
