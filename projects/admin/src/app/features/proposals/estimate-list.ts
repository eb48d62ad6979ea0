import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, OnInit, computed, inject, linkedSignal, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { EstimateListItem, KeysetPage } from '@layerbook/contracts/types';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { ESTIMATES_URL } from './estimate-api';
import { statusWord } from './estimate-words';

const PAGE_SIZE = 50;

/** Estimates: every estimate of the firm, newest first, a page at a time. */
@Component({
  selector: 'lb-estimate-list',
  imports: [DatePipe, FormAlert, MatButtonModule, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink, TranslatePipe],
  template: `
    <section class="lb-page">
      <nav class="switch" [attr.aria-label]="'proposals.list.switch' | translate">
        <a routerLink="/estimates" aria-current="page">{{ 'proposals.list.estimates' | translate }}</a>
        <a routerLink="/jobs">{{ 'proposals.list.acceptedJobs' | translate }}</a>
      </nav>
      <div class="heading">
        <h1>{{ 'proposals.list.heading' | translate }}</h1>
        <a mat-flat-button routerLink="/estimates/new">
          <mat-icon aria-hidden="true">add</mat-icon>
          {{ 'proposals.list.newEstimate' | translate }}
        </a>
      </div>
      <p class="lb-lead">{{ 'proposals.list.lead' | translate }}</p>
      <lb-form-alert [message]="message()" />
      @if (isLoading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'proposals.list.loading' | translate" />
      }
      <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'proposals.list.estimates' | translate">
        <table [attr.aria-label]="'proposals.list.estimates' | translate">
          <thead>
            <tr>
              <th scope="col">{{ 'proposals.list.estimate' | translate }}</th>
              <th scope="col">{{ 'proposals.list.client' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.list.price' | translate }}</th>
              <th scope="col">{{ 'proposals.list.status' | translate }}</th>
              <th scope="col">{{ 'proposals.list.updated' | translate }}</th>
            </tr>
          </thead>
          <tbody>
            @for (e of items(); track e.id) {
              <tr>
                <th scope="row">
                  <a [routerLink]="['/estimates', e.id]">{{ e.title }}</a>
                </th>
                <td>{{ e.clientName }}</td>
                <td class="num">
                  @if (e.price !== null) {
                    {{ e.price | money: currency.code() }}
                  } @else {
                    <span class="muted">{{ 'proposals.list.notPriced' | translate }}</span>
                  }
                </td>
                <td>{{ statusWord(e.status) }}</td>
                <td>{{ e.updatedAt | date: 'mediumDate' }}</td>
              </tr>
            } @empty {
              @if (!isLoading()) {
                <tr>
                  <td colspan="5" class="none">{{ 'proposals.list.none' | translate }}</td>
                </tr>
              }
            }
          </tbody>
        </table>
      </div>
      @if (nextCursor(); as cursor) {
        <button mat-stroked-button type="button" class="more" (click)="showMore(cursor)" [disabled]="isLoading()">
          {{ 'proposals.list.more' | translate }}
        </button>
      }
    </section>
  `,
  styles: `
    @use 'tables';

    .switch {
      display: flex;
      gap: 1rem;
      margin-bottom: 0.5rem;
    }
    .switch a[aria-current='page'] {
      font-weight: 600;
      text-decoration: none;
      color: inherit;
      border-bottom: 2px solid var(--lb-umber, currentColor);
    }
    .heading {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      justify-content: space-between;
      gap: 0.75rem;
    }
    .heading h1 {
      margin: 0;
    }
    @include tables.data-table($min-width: 40rem, $align: middle);

    .muted,
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
    .none {
      padding: 1.5rem 1rem;
    }
    .more {
      margin-top: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EstimateList implements OnInit {
  protected readonly currency = inject(FirmCurrency);

  /** The cursor of the page being read; null for the first. */
  private readonly after = signal<string | null>(null);
  private readonly page = httpResource<KeysetPage<EstimateListItem>>(() => {
    const after = this.after();
    const params: Record<string, string | number> = { limit: PAGE_SIZE };
    if (after) params['after'] = after;
    return { url: ESTIMATES_URL, params };
  });
  private readonly lastPage = computed(() => (this.page.hasValue() ? this.page.value() : null));
  /** Every page read so far: a further page is added below the ones shown. */
  protected readonly items = linkedSignal<KeysetPage<EstimateListItem> | null, readonly EstimateListItem[]>({
    source: this.lastPage,
    computation: (page, previous) => {
      if (!page) return previous?.value ?? [];
      return this.after() === null ? page.items : [...(previous?.value ?? []), ...page.items];
    },
  });
  protected readonly nextCursor = computed(() => this.lastPage()?.nextCursor ?? null);
  protected readonly isLoading = this.page.isLoading;
  protected readonly message = loadMessage(this.page);
  protected readonly statusWord = statusWord;

  ngOnInit(): void {
    void this.currency.load();
  }

  protected showMore(cursor: string): void {
    this.after.set(cursor);
  }
}
