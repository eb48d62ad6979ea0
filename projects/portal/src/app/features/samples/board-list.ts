import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { ClientBoardView, ItemList } from '@layerbook/contracts/types';
import { problemMessage } from '../../core/errors/problem';
import { BOARDS_URL } from './board-api';
import { BOARD_STATUS_WORDS } from './board-words';
import { TranslatePipe } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';

/** The boards the firm has shown this client, each with its first photo and where it stands. */
@Component({
  selector: 'lb-board-list',
  imports: [MatIconModule, MatProgressBarModule, RouterLink, SayPipe, TranslatePipe],
  template: `
    <section class="lb-page">
      <h1>{{ 'samples.list.title' | translate }}</h1>
      <p class="lead">{{ 'samples.list.lead' | translate }}</p>
      @if (isLoading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'samples.list.loading' | translate" />
      } @else if (message()) {
        <p role="alert">{{ message() | lbSay }}</p>
      } @else {
        <ul class="boards" [attr.aria-label]="'samples.list.boards' | translate">
          @for (b of boards(); track b.id) {
            <li>
              <a [routerLink]="['/boards', b.id]" class="board">
                @if (b.photos[0]; as photo) {
                  <img [src]="photo.thumbnailUrl" alt="" width="160" height="120" loading="lazy" decoding="async" />
                } @else {
                  <span class="no-photo" aria-hidden="true"><mat-icon>photo</mat-icon></span>
                }
                <span class="text">
                  <strong>{{ b.label }}</strong>
                  @if (b.round > 1) {
                    <span>{{ 'samples.list.round' | translate: { round: b.round } }}</span>
                  }
                  <span class="status">
                    <mat-icon aria-hidden="true">{{ words[b.status].icon }}</mat-icon>
                    {{ words[b.status].text | translate }}
                  </span>
                </span>
              </a>
            </li>
          } @empty {
            <li class="none">{{ 'samples.list.empty' | translate }}</li>
          }
        </ul>
      }
    </section>
  `,
  styles: `
    .lead {
      color: var(--mat-sys-on-surface-variant);
    }
    .boards {
      list-style: none;
      padding: 0;
      display: grid;
      gap: 1rem;
    }
    .board {
      display: flex;
      gap: 1rem;
      align-items: center;
      padding: 0.75rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      text-decoration: none;
      color: inherit;
    }
    .board img {
      border-radius: 8px;
      object-fit: cover;
    }
    .no-photo {
      width: 160px;
      height: 120px;
      display: grid;
      place-items: center;
      border-radius: 8px;
      background: var(--mat-sys-surface-container);
    }
    .text {
      display: grid;
      gap: 0.25rem;
    }
    .status {
      display: inline-flex;
      gap: 0.3rem;
      align-items: center;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardList {
  private readonly list = httpResource<ItemList<ClientBoardView>>(() => BOARDS_URL);

  protected readonly words = BOARD_STATUS_WORDS;
  protected readonly boards = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly message = computed(() => {
    const error = this.list.error();
    return error ? problemMessage(error) : null;
  });
}
