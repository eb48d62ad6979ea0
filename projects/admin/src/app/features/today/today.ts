import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { TodayView } from '@layerbook/contracts';
import { firstValueFrom } from 'rxjs';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { STAGE_LABELS } from '../../shared/ui/stage-words';

/** What needs the office today: follow-ups that are late or due, and where the pipeline stands. */
@Component({
  selector: 'lb-today',
  imports: [CalendarDatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  templateUrl: './today.html',
  styleUrl: './today.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {
  private readonly http = inject(HttpClient);
  private readonly firmCurrency = inject(FirmCurrency);
  private readonly session = inject(Session);

  /** Crew never see money figures, and the server refuses them this view anyway. */
  protected readonly seesInquiries = this.session.hasRole('office');
  protected readonly view = signal<TodayView | null>(null);
  protected readonly isLoading = signal(this.seesInquiries);
  protected readonly message = signal<string | null>(null);
  protected readonly stageLabels = STAGE_LABELS;

  constructor() {
    if (this.seesInquiries) {
      void this.load();
    }
  }

  private async load(): Promise<void> {
    try {
      const view = await firstValueFrom(this.http.get<TodayView>('/api/inquiries/today'));
      this.firmCurrency.remember(view.pipeline.currency);
      this.view.set(view);
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
