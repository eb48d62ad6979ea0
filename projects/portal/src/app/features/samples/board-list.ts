import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { toProblem } from '../../core/errors/problem';
import { BoardApi } from './board-api';
import { BOARD_STATUS_WORDS, type ClientBoard } from './client-board';

/** The boards the firm has shown this client, each with its first photo and where it stands. */
@Component({
  selector: 'lb-board-list',
  imports: [MatIconModule, MatProgressBarModule, RouterLink],
  template: `
    <section class="lb-page">
      <h1>Your sample boards</h1>
      <p class="lead">A sample board shows your finish made with the real products and colours. Look at each one, then approve it or ask for changes.</p>
      @if (isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading your sample boards" />
      } @else if (message()) {
        <p role="alert">{{ message() }}</p>
      } @else {
        <ul class="boards" aria-label="Sample boards">
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
                    <span>Round {{ b.round }}</span>
                  }
                  <span class="status">
                    <mat-icon aria-hidden="true">{{ words[b.status].icon }}</mat-icon>
                    {{ words[b.status].text }}
                  </span>
                </span>
              </a>
            </li>
          } @empty {
            <li class="none">No sample boards yet. When your finisher shows you one, it appears here.</li>
          }
        </ul>
      }
    </section>
  `,
  styles: `
    .lead { color: var(--mat-sys-on-surface-variant); }
    .boards { list-style: none; padding: 0; display: grid; gap: 1rem; }
    .board { display: flex; gap: 1rem; align-items: center; padding: 0.75rem; border: 1px solid var(--mat-sys-outline-variant); border-radius: 12px; text-decoration: none; color: inherit; }
    .board img { border-radius: 8px; object-fit: cover; }
    .no-photo { width: 160px; height: 120px; display: grid; place-items: center; border-radius: 8px; background: var(--mat-sys-surface-container); }
    .text { display: grid; gap: 0.25rem; }
    .status { display: inline-flex; gap: 0.3rem; align-items: center; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardList {
  private readonly api = inject(BoardApi);

  protected readonly words = BOARD_STATUS_WORDS;
  protected readonly boards = signal<readonly ClientBoard[]>([]);
  protected readonly isLoading = signal(true);
  protected readonly message = signal<string | null>(null);

  constructor() {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      this.boards.set(await this.api.list());
    } catch (error) {
      const problem = toProblem(error);
      this.message.set(problem.detail ?? problem.title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
