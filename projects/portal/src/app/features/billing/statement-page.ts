import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { PortalStatement } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { statementUrl } from './invoice-api';
import { isZeroAmount, STATEMENT_KIND_WORDS } from './invoice-words';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { Language } from '../../../../../shared/i18n/language';
import { formatAmount, formatCalendarDay } from '../../../../../shared/i18n/format';

/** One job's statement: every invoice, credit note and payment by date with the running balance, and the totals. */
@Component({
  selector: 'lb-statement-page',
  imports: [MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  template: `
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'billing.statement.loading' | translate" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">
        <mat-icon aria-hidden="true">error</mat-icon><span>{{ message | lbSay }}</span>
      </p>
      <p>
        <a routerLink="/invoices">{{ 'billing.invoice.back' | translate }}</a>
      </p>
    } @else if (statement(); as s) {
      <h1>{{ 'billing.statement.title' | translate: { job: s.jobTitle } }}</h1>
      <p class="lb-lead">{{ 'billing.statement.lead' | translate }}</p>
      <dl class="totals">
        <div>
          <dt>{{ 'billing.statement.contractSum' | translate }}</dt>
          <dd>{{ money(s.contractSum) }}</dd>
        </div>
        <div>
          <dt>{{ 'billing.statement.invoiced' | translate }}</dt>
          <dd>{{ money(s.invoiced) }}</dd>
        </div>
        @if (!isZero(s.credited)) {
          <div>
            <dt>{{ 'billing.invoice.credited' | translate }}</dt>
            <dd>{{ money(s.credited) }}</dd>
          </div>
        }
        <div>
          <dt>{{ 'billing.invoice.amountPaid' | translate }}</dt>
          <dd>{{ money(s.paid) }}</dd>
        </div>
        <div class="strong">
          <dt>{{ 'billing.statement.balanceDue' | translate }}</dt>
          <dd>{{ money(s.balanceDue) }}</dd>
        </div>
        <div>
          <dt>{{ 'billing.statement.unbilled' | translate }}</dt>
          <dd>{{ money(s.unbilled) }}</dd>
        </div>
      </dl>
      @if (s.lines.length === 0) {
        <p>{{ 'billing.statement.empty' | translate }}</p>
      } @else {
        <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'billing.statement.lines' | translate">
          <!-- Roles written out, as on the invoice list: on a phone each line is drawn as a card, and some
               browsers drop a table's meaning for screen readers once its parts are not displayed as table parts. -->
          <table class="lb-table" role="table">
            <thead role="rowgroup">
              <tr role="row">
                <th scope="col" role="columnheader">{{ 'billing.invoice.date' | translate }}</th>
                <th scope="col" role="columnheader">{{ 'billing.statement.what' | translate }}</th>
                <th scope="col" role="columnheader" class="num">{{ 'billing.statement.charged' | translate }}</th>
                <th scope="col" role="columnheader" class="num">{{ 'billing.statement.paidOrCredited' | translate }}</th>
                <th scope="col" role="columnheader" class="num">{{ 'billing.statement.balance' | translate }}</th>
              </tr>
            </thead>
            <tbody role="rowgroup">
              @for (l of s.lines; track $index) {
                <tr role="row">
                  <td role="cell" class="on">{{ day(l.on) }}</td>
                  <th scope="row" role="rowheader">
                    <span class="what">
                      <mat-icon aria-hidden="true">{{ kinds[l.kind].icon }}</mat-icon>
                      @if (kinds[l.kind].text; as kind) {
                        <span class="lb-visually-hidden">{{ 'billing.statement.kindLabel' | translate: { kind: kind | translate } }}</span>
                      }
                      {{ l.text }}
                    </span>
                  </th>
                  <td role="cell" class="num" [class.blank]="isZero(l.charge)" [attr.data-label]="'billing.statement.charged' | translate">
                    {{ isZero(l.charge) ? '' : money(l.charge) }}
                  </td>
                  <td
                    role="cell"
                    class="num"
                    [class.blank]="isZero(l.credit)"
                    [attr.data-label]="'billing.statement.paidOrCredited' | translate"
                  >
                    {{ isZero(l.credit) ? '' : money(l.credit) }}
                  </td>
                  <td role="cell" class="num balance" [attr.data-label]="'billing.statement.balance' | translate">
                    {{ money(l.balance) }}
                  </td>
                </tr>
              }
            </tbody>
          </table>
        </div>
      }
      <p>
        <a routerLink="/invoices">{{ 'billing.invoice.all' | translate }}</a>
      </p>
    }
  `,
  styles: `
    @use 'tables';

    :host {
      display: block;
      max-width: 56rem;
    }
    .totals {
      display: flex;
      flex-wrap: wrap;
      gap: 0.75rem 2rem;
      margin: 1rem 0 1.5rem;
    }
    .totals dt {
      font-size: 0.85rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .totals dd {
      margin: 0;
      font-variant-numeric: tabular-nums;
    }
    .strong dd {
      font-weight: 600;
    }
    .table-wrap {
      overflow-x: auto;
      @include tables.scroll-shadows(var(--mat-sys-surface));
    }
    .lb-table {
      width: 100%;
      border-collapse: collapse;
      margin: 0 0 1rem;
    }
    .lb-table th,
    .lb-table td {
      text-align: left;
      padding: 0.4rem 0.5rem;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
      vertical-align: top;
    }
    .lb-table thead th {
      font-weight: 600;
    }
    .lb-table tbody th {
      font-weight: 400;
    }
    .what {
      display: inline-flex;
      gap: 0.3rem;
      align-items: center;
    }
    .what mat-icon {
      flex: none;
    }
    .num {
      text-align: right !important;
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
    /*
     * A phone or a narrow tablet: each line a card, no sideways scrolling — its date, what it is, then
     * each figure on a line of its own with its column's name beside it, the running balance last.
     */
    @media (max-width: 767.98px) {
      @include tables.rows-as-cards;
      .lb-table tbody tr {
        position: relative;
        display: block;
        padding: 0.75rem 0;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
      }
      .lb-table td.on {
        font-size: 0.85rem;
        color: var(--mat-sys-on-surface-variant);
      }
      .lb-table tbody th {
        margin: 0.15rem 0 0.35rem;
        font-weight: 600;
        overflow-wrap: anywhere;
      }
      .lb-table td.num {
        display: flex;
        justify-content: space-between;
        gap: 1rem;
        padding: 0.1rem 0;
      }
      .lb-table td.num::before {
        content: attr(data-label);
        /* The column header already names the cell for a screen reader: the label is for the eye only. */
        content: attr(data-label) / '';
        color: var(--mat-sys-on-surface-variant);
        white-space: normal;
        text-align: left;
      }
      .lb-table td.balance {
        margin-top: 0.2rem;
        font-weight: 600;
      }
      /* Nothing charged or nothing paid: no line on the card, but the empty cell stays for screen
         readers, so every later cell keeps its own column's name. */
      .lb-table td.blank {
        position: absolute;
        width: 1px;
        height: 1px;
        overflow: hidden;
        clip-path: inset(50%);
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatementPage {
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);

  /** route parameter: the job */
  readonly id = input.required<string>();

  /** The server writes each line's words in the client's language: read again when it changes. */
  private readonly loaded = httpResource<PortalStatement>(() => {
    this.language.current();
    return statementUrl(this.id());
  });

  protected readonly statement = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = computed(() => !this.loaded.hasValue() && this.loaded.isLoading());
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing() ? 'billing.statement.missing' : problemMessage(error);
  });
  protected readonly kinds = STATEMENT_KIND_WORDS;
  protected readonly isZero = isZeroAmount;

  constructor() {
    effect(() => {
      const s = this.statement();
      this.language.current();
      if (s) this.title.setTitle(this.translate.instant('layout.titles.statementFor', { job: s.jobTitle }) as string);
    });
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  protected money(amount: string): string {
    const s = this.statement();
    return s ? formatAmount(amount, s.currency, this.language.locale()) : '';
  }

  protected day(isoDay: string): string {
    return formatCalendarDay(isoDay, this.language.locale(), 'long');
  }
}
