import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { INVOICE_KIND_LABELS, PAYMENT_METHOD_LABELS, type BillingToday } from '@layerbook/contracts/types';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { overdueWords, receivedWords } from './money-words';

/**
 * Today's money, for owners and the office (Today never shows it to the crew, and the API refuses
 * them): drafts ready to bill, invoices past due, payments received since yesterday, change orders
 * waiting for the client.
 */
@Component({
  selector: 'lb-today-money',
  imports: [CalendarDatePipe, DatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  templateUrl: './today-money.html',
  styleUrl: './today-money.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TodayMoney {
  /** the firm's today ("2026-12-02"), to count days overdue; null until Today knows it */
  readonly localDate = input<string | null>(null);

  protected readonly money = httpResource<BillingToday>(() => '/api/billing/today');
  protected readonly view = computed(() => (this.money.hasValue() ? this.money.value() : null));
  protected readonly message = loadMessage(this.money);
  protected readonly kindLabels = INVOICE_KIND_LABELS;
  protected readonly overdueWords = overdueWords;
  protected readonly receivedWords = receivedWords;
  protected readonly methodLabels = PAYMENT_METHOD_LABELS;
}
