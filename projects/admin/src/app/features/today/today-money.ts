import type { HttpResourceRef } from '@angular/common/http';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { type AttentionNote, type BillingToday } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { Language } from '../../../../../shared/i18n/language';
import { LbDatePipe } from '../../../../../shared/i18n/format';
import { toProblem } from '../../core/errors/problem';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe, formatCalendarDate } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { ATTENTION_WORDS, overdueWords, receivedWords } from './money-words';

/**
 * Today's money, for owners and the office (Today never shows it to the crew, and the API refuses
 * them): what the card processor left for a person to check (first, and only when there is any),
 * drafts ready to bill, invoices past due, payments received since yesterday, change orders waiting
 * for the client.
 */
@Component({
  selector: 'lb-today-money',
  imports: [
    CalendarDatePipe,
    FormAlert,
    LbDatePipe,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MoneyPipe,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './today-money.html',
  styleUrl: './today-money.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TodayMoney {
  /** the firm's today ("2026-12-02"), to count days overdue; null until Today knows it */
  readonly localDate = input<string | null>(null);

  /**
   * Today's money as Today loads it (`/api/billing/today`). Today asks for it while the page starts,
   * not this panel: the panel wakes later (hydrated on a tap), when the server's answer in the page is
   * no longer used — a request of its own then redrew the panel under the tap and the first tap on a
   * link did nothing.
   */
  readonly money = input.required<HttpResourceRef<BillingToday | undefined>>();
  protected readonly loading = computed(() => this.money().isLoading());
  protected readonly view = computed(() => {
    const money = this.money();
    return money.hasValue() ? money.value() : null;
  });
  protected readonly message = loadMessage({ error: () => this.money().error() });
  protected readonly overdueWords = overdueWords;
  protected readonly attentionWords = ATTENTION_WORDS;
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);
  private readonly http = inject(HttpClient);
  /** the note being marked dealt with, and what the server said when that failed */
  protected readonly clearing = signal<string | null>(null);
  protected readonly clearMessage = signal<string | null>(null);

  /** Marks a note dealt with, then reloads the panel (the note leaves it; the invoice's trail keeps both). */
  protected async clear(note: AttentionNote): Promise<void> {
    this.clearing.set(note.id);
    this.clearMessage.set(null);
    try {
      await firstValueFrom(this.http.post(`/api/billing/attention/${encodeURIComponent(note.id)}/clear`, {}));
      this.money().reload();
    } catch (error) {
      this.clearMessage.set(toProblem(error).title);
    } finally {
      this.clearing.set(null);
    }
  }

  /** "today", "yesterday" or the date, in the reader's language. */
  protected receivedWhen(receivedOn: string): string {
    const word = receivedWords(receivedOn, this.localDate());
    return word ? (this.translate.instant(`today.money.${word}`) as string) : formatCalendarDate(receivedOn, this.language.locale());
  }
}
