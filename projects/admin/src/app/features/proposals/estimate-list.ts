import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, OnInit, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { EstimateApi, type EstimateListItem } from './estimate-api';
import { statusWord } from './estimate-words';

/** Estimates: every estimate of the firm, newest change first. */
@Component({
  selector: 'lb-estimate-list',
  imports: [DatePipe, FormAlert, MatButtonModule, MatIconModule, MatProgressBarModule, MoneyPipe, RouterLink],
  template: `
    <section class="lb-page">
      <nav class="switch" aria-label="Jobs and proposals">
        <a routerLink="/estimates" aria-current="page">Estimates</a>
        <a routerLink="/jobs">Accepted jobs</a>
      </nav>
      <div class="heading">
        <h1>Jobs &amp; proposals</h1>
        <a mat-flat-button routerLink="/estimates/new">
          <mat-icon aria-hidden="true">add</mat-icon>
          New estimate
        </a>
      </div>
      <p class="lb-lead">Estimates priced from measured rooms and your finish systems, with their options and add-ons.</p>
      <lb-form-alert [message]="message()" />
      @if (isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading estimates" />
      }
      <div class="table-wrap">
        <table aria-label="Estimates">
          <thead>
            <tr>
              <th scope="col">Estimate</th>
              <th scope="col">Client</th>
              <th scope="col" class="num">Price</th>
              <th scope="col">Status</th>
              <th scope="col">Updated</th>
            </tr>
          </thead>
          <tbody>
            @for (e of items(); track e.id) {
              <tr>
                <th scope="row"><a [routerLink]="['/estimates', e.id]">{{ e.title }}</a></th>
                <td>{{ e.clientName }}</td>
                <td class="num">
                  @if (e.price !== null) {
                    {{ e.price | money: currency.code() }}
                  } @else {
                    <span class="muted">Not priced yet</span>
                  }
                </td>
                <td>{{ statusWord(e.status) }}</td>
                <td>{{ e.updatedAt | date: 'mediumDate' }}</td>
              </tr>
            } @empty {
              @if (!isLoading()) {
                <tr>
                  <td colspan="5" class="none">No estimates yet. Start one with “New estimate”.</td>
                </tr>
              }
            }
          </tbody>
        </table>
      </div>
    </section>
  `,
  styles: `
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
    .table-wrap {
      overflow-x: auto;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    table {
      width: 100%;
      min-width: 40rem;
      border-collapse: collapse;
    }
    th,
    td {
      padding: 0.6rem 1rem;
      text-align: left;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    thead th {
      font-size: 0.9rem;
      color: var(--mat-sys-on-surface-variant);
      background: var(--mat-sys-surface-container-low);
    }
    tbody tr:last-child > * {
      border-bottom: 0;
    }
    .num {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
    .muted,
    .none {
      color: var(--mat-sys-on-surface-variant);
    }
    .none {
      padding: 1.5rem 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EstimateList implements OnInit {
  private readonly api = inject(EstimateApi);
  protected readonly currency = inject(FirmCurrency);

  protected readonly items = signal<readonly EstimateListItem[]>([]);
  protected readonly isLoading = signal(true);
  protected readonly message = signal<string | null>(null);
  protected readonly statusWord = statusWord;

  ngOnInit(): void {
    void this.currency.load();
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      this.items.set((await this.api.list()).items);
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
