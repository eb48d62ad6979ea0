import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { ItemList, PortalChangeOrderLink, PortalProposalSummary } from '@layerbook/contracts/types';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { LbDatePipe, LbMoneyPipe } from '../../../../../shared/i18n/format';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { PROPOSALS_URL } from './proposal-api';

@Component({
  selector: 'lb-proposal-list',
  imports: [LbDatePipe, LbMoneyPipe, MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  template: `
    <h1>{{ 'proposals.list.title' | translate }}</h1>
    @if (client(); as me) {
      <p class="lb-lead">{{ 'proposals.list.lead' | translate: { firm: me.firmName } }}</p>
    }
    <!-- What the home page puts first, under the page's heading (boards waiting for an answer). -->
    <ng-content />
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'proposals.list.loading' | translate" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">{{ message | lbSay }}</p>
    } @else if (projects().length === 0) {
      <div class="empty">
        <mat-icon aria-hidden="true">folder_open</mat-icon>
        <p>{{ 'proposals.list.empty' | translate }}</p>
      </div>
    } @else {
      <ul class="list">
        @for (project of projects(); track project.estimateId) {
          <li class="project">
            <h2>{{ project.title }}</h2>
            <p class="site">{{ project.siteAddress }}</p>
            <p>
              {{ 'proposals.list.version' | translate: { version: project.latest.version } }}
              @if (project.latest.status === 'sent' && project.latest.isExpired) {
                <strong>{{ 'proposals.list.expired' | translate }}</strong>
                {{ 'proposals.list.expiredOn' | translate: { day: project.latest.expiresOn | lbDate: 'long' } }}
              } @else {
                <strong>{{ 'proposals.status.' + project.latest.status | translate }}</strong>
                @if (project.latest.status === 'sent') {
                  {{ 'proposals.list.standsUntil' | translate: { day: project.latest.expiresOn | lbDate: 'long' } }}
                }
              }
            </p>
            <a [routerLink]="['/proposals', project.latest.id]"
              >{{ 'proposals.list.read' | translate
              }}<span class="lb-visually-hidden">{{ 'proposals.list.readFor' | translate: { title: project.title } }}</span></a
            >
            @if (project.changeOrders.length) {
              <h3>{{ 'proposals.list.changeOrders' | translate }}</h3>
              <ul class="orders">
                @for (order of project.changeOrders; track order.id) {
                  <li>
                    <a [routerLink]="['/change-orders', order.id]">{{
                      'proposals.list.changeOrder' | translate: { number: order.number, title: order.title }
                    }}</a>
                    <span [class.waiting]="order.status === 'sent'">
                      · {{ 'proposals.list.changeOrderStatus.' + order.status | translate }} ·
                      {{ 'proposals.list.' + change(order).key | translate: { amount: (change(order).amount | lbMoney: order.currency) } }}
                    </span>
                  </li>
                }
              </ul>
            }
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .empty {
      display: flex;
      gap: 1rem;
      align-items: flex-start;
      max-width: 40rem;
      padding: 1.25rem 1.5rem;
      border: 2px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .empty p {
      margin: 0;
    }
    .empty mat-icon {
      color: var(--lb-verdigris);
    }
    .list {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 1rem;
      max-width: 48rem;
    }
    .project {
      padding: 1rem 1.25rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .project h2 {
      font-family: var(--lb-serif);
      margin: 0 0 0.25rem;
      font-size: 1.25rem;
    }
    .project p {
      margin: 0 0 0.5rem;
    }
    .site {
      color: var(--mat-sys-on-surface-variant);
    }
    .project h3 {
      margin: 1rem 0 0.25rem;
      font-size: 1rem;
    }
    .orders {
      margin: 0;
      padding-left: 1.25rem;
    }
    .orders li {
      margin-bottom: 0.25rem;
    }
    .waiting {
      font-weight: 600;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
/** The client's proposals, one per estimate ("your projects" to the client). */
export class ProposalList {
  private readonly list = httpResource<ItemList<PortalProposalSummary>>(() => PROPOSALS_URL);

  protected readonly client = inject(Session).client;
  protected readonly projects = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly loadMessage = computed(() => {
    const error = this.list.error();
    return error ? toProblem(error).title : null;
  });

  /** What a change order does to the contract: the words' key and the amount without its sign. */
  protected change(order: PortalChangeOrderLink): { key: 'adds' | 'takesOff'; amount: string } {
    const amount = order.amount.trim();
    return amount.startsWith('-') ? { key: 'takesOff', amount: amount.slice(1) } : { key: 'adds', amount };
  }
}
