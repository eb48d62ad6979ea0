import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { CashChart } from './cash-chart';
import { barOptions, FORECAST_PARTS, forecastAmounts, forecastChart } from './cash-charts';
import { Language } from '../../../../../shared/i18n/language';
import type { CashForecast as CashForecastView } from '@layerbook/contracts/types';
import { TranslatePipe } from '@ngx-translate/core';

export const FORECAST_URL = '/api/cash/forecast';

/** Cash expected week by week for the next 13 weeks, its three sources kept apart. */
@Component({
  selector: 'lb-cash-forecast',
  imports: [TranslatePipe, CalendarDatePipe, CashChart, FormAlert, MatProgressBarModule, MoneyPipe],
  template: `
    <section class="cash-section" aria-labelledby="expected-heading">
      <h2 id="expected-heading">{{ 'cash.cashForecast.cashExpectedNext13' | translate }}</h2>
      <lb-form-alert [message]="message()" />
      @if (forecast.isLoading()) {
        <mat-progress-bar mode="indeterminate" [aria-label]="'cash.cashForecast.loadingCashExpected' | translate" />
      }
      @if (view(); as f) {
        @if (chart(); as c) {
          <lb-cash-chart [data]="c.data" [options]="c.options" [summary]="'cash.cashForecast.stackedBarChartOf' | translate">
            <table class="figures-table">
              <caption>
                {{
                  'cash.cashForecast.expectedByWeek' | translate
                }}
              </caption>
              <thead>
                <tr>
                  <th scope="col">{{ 'cash.cashForecast.weekOf' | translate }}</th>
                  @for (part of parts; track part.key) {
                    <th scope="col" class="num">{{ part.short }}</th>
                  }
                  <th scope="col" class="num">{{ 'cash.cashForecast.total' | translate }}</th>
                </tr>
              </thead>
              <tbody>
                @for (week of f.weeks; track week.weekStart) {
                  <tr>
                    <th scope="row">{{ week.weekStart | calendarDate }}</th>
                    @for (part of parts; track part.key) {
                      <td class="num">{{ week[part.key] | money: f.currency }}</td>
                    }
                    <td class="num">{{ week.total | money: f.currency }}</td>
                  </tr>
                }
              </tbody>
              <tfoot>
                <tr>
                  <th scope="row">{{ 'cash.cashForecast.laterThan13Weeks' | translate }}</th>
                  @for (part of parts; track part.key) {
                    <td class="num">{{ f.beyondHorizon[part.key] | money: f.currency }}</td>
                  }
                  <td class="num">{{ f.beyondHorizon.total | money: f.currency }}</td>
                </tr>
              </tfoot>
            </table>
          </lb-cash-chart>
        }
        <dl class="parts">
          @for (part of parts; track part.key) {
            <div>
              <dt><span class="swatch" [class]="'swatch ' + part.pattern" aria-hidden="true"></span>{{ part.short }}</dt>
              <dd>{{ part.explain }}</dd>
            </div>
          }
        </dl>
        @for (note of f.notes; track $index) {
          <p class="note">{{ note }}</p>
        }
        @if (f.odds.length > 0) {
          <div class="odds-box" tabindex="0" role="region" [attr.aria-label]="'cash.cashForecast.oddsUsedForOpen' | translate">
            <table class="odds">
              <caption>
                {{
                  'cash.cashForecast.oddsUsedForOpen' | translate
                }}
              </caption>
              <thead>
                <tr>
                  <th scope="col">{{ 'cash.cashForecast.stage' | translate }}</th>
                  <th scope="col" class="num">{{ 'cash.cashForecast.open' | translate }}</th>
                  <th scope="col" class="num">{{ 'cash.cashForecast.odds' | translate }}</th>
                  <th scope="col">{{ 'cash.cashForecast.from' | translate }}</th>
                </tr>
              </thead>
              <tbody>
                @for (stage of f.odds; track stage.stage) {
                  <tr>
                    <th scope="row">{{ stage.label }}</th>
                    <td class="num">{{ stage.openCount }}</td>
                    <td class="num">{{ 'cash.cashForecast.in100' | translate: { percent: stage.percent } }}</td>
                    <td>
                      {{
                        stage.source === 'firm'
                          ? ('cash.cashForecast.yourOwnOddsFor' | translate)
                          : ('cash.cashForecast.aUsualFigureYour' | translate)
                      }}
                    </td>
                  </tr>
                }
              </tbody>
            </table>
          </div>
        }
      }
    </section>
  `,
  styleUrls: ['./cash-section.scss', './cash-forecast.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CashForecast {
  /** the reader's locale, as the `money` pipe of the table beside each chart uses it */
  private readonly language = inject(Language);
  protected readonly parts = FORECAST_PARTS;
  protected readonly forecast = httpResource<CashForecastView>(() => FORECAST_URL);
  protected readonly view = computed(() => (this.forecast.hasValue() ? this.forecast.value() : null));
  protected readonly message = loadMessage(this.forecast);
  protected readonly chart = computed(() => {
    const view = this.view();
    return view
      ? {
          data: forecastChart(view),
          options: barOptions(view.currency, this.language.locale(), forecastAmounts(view), { stacked: true, legend: true }),
        }
      : null;
  });
}
