import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { type BillingToday, STAGE_LABELS, type TodayView } from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { LIKELY_WORK_WORDS } from '../inquiries/stage-odds';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { SheetJobs } from '../jobs/sheet/sheet-jobs';
import { TodayMoney } from './today-money';
import { TranslatePipe } from '@ngx-translate/core';
import { Language } from '../../../../../shared/i18n/language';

/** What needs the office today: follow-ups that are late or due, where the pipeline stands, and the money to bill and collect. */
@Component({
  selector: 'lb-today',
  imports: [CalendarDatePipe, FormAlert, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink, SheetJobs, TodayMoney, TranslatePipe],
  templateUrl: './today.html',
  styleUrl: './today.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {
  protected readonly words = LIKELY_WORK_WORDS;
  /** Crew never see money figures (the pipeline, Today's money), and the server refuses them those views anyway. */
  protected readonly seesInquiries = inject(Session).hasRole('office');
  protected readonly summary = httpResource<TodayView>(() => (this.seesInquiries ? '/api/inquiries/today' : undefined));
  /** The money panel's (TodayMoney): asked for here, while the page starts, so the server's answer in the page serves it. */
  protected readonly money = httpResource<BillingToday>(() => (this.seesInquiries ? '/api/billing/today' : undefined));
  protected readonly view = computed(() => (this.summary.hasValue() ? this.summary.value() : null));
  protected readonly message = loadMessage(this.summary);
  protected readonly stageLabels = STAGE_LABELS;
  /** The panels' hydration is deferred (today.html): they are links and figures, woken by a tap or a language switch. */
  protected readonly isLanguageChanged = inject(Language).changedSinceNow();
}
