import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { PortalChangeOrder } from '@layerbook/contracts/types';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { focusAfterRender } from '../../shared/ui/focus-after-render';
import { changeOrderUrl } from './change-order-api';
import { ChangeOrderDecisionForm } from './change-order-decision-form';
import { contractChangeWords } from './change-order-words';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { Language } from '../../../../../shared/i18n/language';
import { LbDatePipe, LbNumberPipe, formatAmount } from '../../../../../shared/i18n/format';

/** One change order the firm sent: what changes, what it costs, the contract sum before and after; approve or decline. */
@Component({
  selector: 'lb-change-order-page',
  imports: [ChangeOrderDecisionForm, LbDatePipe, LbNumberPipe, MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  template: `
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'billing.changeOrder.loading' | translate" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">
        <mat-icon aria-hidden="true">error</mat-icon><span>{{ message | lbSay }}</span>
      </p>
      <p>
        <a routerLink="/projects">{{ 'proposals.page.back' | translate }}</a>
      </p>
    } @else if (changeOrder(); as co) {
      <h1>{{ 'billing.changeOrder.title' | translate: { number: co.number, title: co.title } }}</h1>
      <p class="meta">{{ 'billing.changeOrder.for' | translate: { job: co.jobTitle } }}</p>

      <!-- in the page before the answer and filled by it, so screen readers read it; focus moves here -->
      <div class="outcome" role="status" tabindex="-1">
        @if (co.status === 'approved') {
          <div class="lb-success">
            <mat-icon aria-hidden="true">verified</mat-icon>
            <p>
              {{
                'billing.changeOrder.approved'
                  | translate: { name: co.signedName, when: co.decidedAt | lbDate: 'long' : 'short' : co.timeZone }
              }}
            </p>
          </div>
        } @else if (co.status === 'declined') {
          <div class="lb-notice">
            <mat-icon aria-hidden="true">do_not_disturb_on</mat-icon>
            <p>
              {{ 'billing.changeOrder.declined' | translate: { when: co.decidedAt | lbDate: 'long' : 'short' : co.timeZone } }}
              @if (co.clientComment) {
                {{ 'proposals.page.youWrote' | translate: { comment: co.clientComment } }}
              }
            </p>
          </div>
        }
      </div>
      @if (co.status === 'sent') {
        <p class="lb-lead">{{ 'billing.changeOrder.readBelow' | translate }}</p>
      }

      @if (co.description) {
        <p class="description">{{ co.description }}</p>
      }
      @if (co.engine; as e) {
        <h2 id="co-work-heading">{{ 'billing.changeOrder.work' | translate }}</h2>
        <p>{{ 'billing.changeOrder.finishOn' | translate: { finish: e.finishName } }}</p>
        <ul aria-labelledby="co-work-heading">
          @for (s of e.surfaces; track $index) {
            <li>{{ s.room }} · {{ s.surface }}: {{ s.quantity }}</li>
          }
        </ul>
        <p class="meta">
          {{
            (e.workingDays === 1 ? 'billing.changeOrder.effortOneDay' : 'billing.changeOrder.effort')
              | translate: { hours: e.labourHours | lbNumber, days: e.workingDays }
          }}
        </p>
      }

      <h2 id="co-price-heading">{{ 'billing.changeOrder.price' | translate }}</h2>
      <dl class="figures" aria-labelledby="co-price-heading">
        <dt>{{ 'proposals.document.price' | translate }}</dt>
        <dd>{{ money(co.price, co.currency) }}</dd>
        <dt>{{ 'proposals.document.tax' | translate }}</dt>
        <dd>{{ money(co.tax, co.currency) }}</dd>
        <dt>{{ 'billing.changeOrder.change' | translate }}</dt>
        <dd class="total">{{ money(co.amount, co.currency) }}</dd>
        <dt>{{ 'billing.statement.contractSum' | translate }}</dt>
        <dd>{{ money(co.contractSumBefore, co.currency) }} → {{ money(co.contractSumAfter, co.currency) }}</dd>
      </dl>
      @if (co.taxNote) {
        <p class="meta">{{ 'billing.changeOrder.taxNotes.' + co.taxNote | translate }}</p>
      }
      <p>{{ sumWords() }}</p>

      @if (co.status === 'sent') {
        <section class="answer" [attr.aria-label]="'proposals.page.answer' | translate">
          <lb-change-order-decision [changeOrder]="co" (decided)="show($event)" />
        </section>
      }
    }
  `,
  styles: `
    h1 {
      margin: 0;
    }
    .outcome:focus {
      outline: none;
    }
    .meta {
      color: var(--mat-sys-on-surface-variant);
      margin: 0.25rem 0 1rem;
    }
    .description {
      white-space: pre-line;
    }
    .figures {
      display: grid;
      grid-template-columns: max-content auto;
      gap: 0.35rem 1.5rem;
      max-width: 32rem;
    }
    .figures dt {
      color: var(--mat-sys-on-surface-variant);
    }
    .figures dd {
      margin: 0;
      font-variant-numeric: tabular-nums;
    }
    .total {
      font-weight: 600;
    }
    .answer {
      margin: 2rem 0 0;
      padding: 1.25rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangeOrderPage {
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);
  private readonly focus = focusAfterRender();

  /** route parameter */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<PortalChangeOrder>(() => changeOrderUrl(this.id()));

  protected readonly changeOrder = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = this.loaded.isLoading;
  /** 404 and a malformed id read the same: the link is wrong, or the change order is not theirs. */
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing() ? 'billing.changeOrder.missing' : problemMessage(error);
  });
  protected readonly sumWords = computed(() => {
    const co = this.changeOrder();
    this.language.current();
    return co
      ? contractChangeWords(co, this.language.locale(), (key, params) => this.translate.instant(`billing.${key}`, params) as string)
      : '';
  });

  constructor() {
    effect(() => {
      const co = this.changeOrder();
      this.language.current();
      if (co)
        this.title.setTitle(this.translate.instant('layout.titles.changeOrderNumber', { number: co.number, title: co.title }) as string);
    });
    // Tells crawlers and the host's logs the truth while rendering on the server.
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  protected money(amount: string, currency: string): string {
    return formatAmount(amount, currency, this.language.locale());
  }

  /** After an answer the form goes away; the reader is brought back to the answer, said at the top, and it takes focus. */
  protected show(answer: PortalChangeOrder): void {
    this.loaded.set(answer);
    this.focus('.outcome');
  }
}
