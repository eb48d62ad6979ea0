import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { SampleBoardView } from '@layerbook/contracts/types';
import { crewLayerNote } from '@layerbook/domain';
import { firstValueFrom } from 'rxjs';
import { PhotoGallery, type GalleryPhoto } from '../../../../../shared/photos/photo-gallery';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { BOARD_PHOTO_BASE, SampleApi, boardPhotosUrl, boardUrl } from './sample-api';
import { STATUS_WORDS } from './status-words';

/** One board: its finish as made (layers in order), photos, and where it stands with the client. */
@Component({
  selector: 'lb-sample-detail',
  imports: [DatePipe, FormAlert, MatButtonModule, MatIconModule, MatProgressBarModule, PhotoGallery, RouterLink],
  template: `
    <section class="lb-page">
      <p><a routerLink="/samples">Back to sample boards</a></p>
      @if (board(); as b) {
        <h1>{{ b.label }}</h1>
        <p class="status">
          <mat-icon aria-hidden="true">{{ words[b.status].icon }}</mat-icon>
          <span>{{ words[b.status].text }}</span>
          <span aria-hidden="true">·</span>
          <span>Round {{ b.round }}</span>
        </p>
        <dl class="facts">
          <dt>Client</dt>
          <dd>{{ b.clientName }}</dd>
          @if (b.siteAddress) {
            <dt>Site</dt>
            <dd>{{ b.siteAddress }}</dd>
          }
          <dt>Made</dt>
          <dd>{{ b.createdAt | date: 'mediumDate' }}</dd>
        </dl>

        @if (b.status === 'approved') {
          <p class="decision" role="status">
            <mat-icon aria-hidden="true">verified</mat-icon>
            Approved by {{ b.decidedByName ?? 'the client' }} on {{ b.decidedAt | date: 'medium' }}. This board is the control sample for
            the work.
          </p>
        }
        @if (b.status === 'changes_requested') {
          <div class="decision" role="status">
            <p>
              <mat-icon aria-hidden="true">edit_note</mat-icon> {{ b.decidedByName ?? 'The client' }} asked for changes on
              {{ b.decidedAt | date: 'medium' }}:
            </p>
            <blockquote>{{ b.clientComment }}</blockquote>
          </div>
        }

        <lb-form-alert [message]="actionMessage()" />
        @if (canWrite()) {
          <div class="actions">
            @if (b.status === 'draft') {
              <button mat-flat-button type="button" [disabled]="isBusy()" (click)="showToClient()">
                <mat-icon aria-hidden="true">send</mat-icon>Show to the client
              </button>
            }
            @if (b.status === 'changes_requested' && !b.hasNextRound) {
              <button mat-flat-button type="button" [disabled]="isBusy()" (click)="startNextRound()">
                <mat-icon aria-hidden="true">replay</mat-icon>Start the next round
              </button>
            }
          </div>
        }
        @if (b.status === 'shown') {
          <p class="muted">The client can see this board in their portal and will approve it or ask for changes.</p>
        }

        <section aria-labelledby="finish-heading">
          <h2 id="finish-heading">The finish</h2>
          @if (b.finish; as finish) {
            <p>
              <strong>{{ finish.systemName }}</strong>
              @if (finish.description) {
                — {{ finish.description }}
              }
            </p>
            <p class="muted">As it was in the library on {{ finish.takenAt | date: 'mediumDate' }}.</p>
            <ol class="layers" aria-label="Layers, in the order they go on">
              @for (layer of finish.layers; track layer.position) {
                <li>
                  <strong>{{ layer.name }}</strong>
                  <span>{{ layerNote(layer) }}</span>
                </li>
              }
            </ol>
          } @else {
            <p class="muted">No finish system was chosen for this board.</p>
          }
        </section>

        @if (b.notes) {
          <section aria-labelledby="notes-heading">
            <h2 id="notes-heading">Notes</h2>
            <p class="notes">{{ b.notes }}</p>
          </section>
        }

        <lb-photo-gallery
          [subject]="b.label"
          [(photos)]="photos"
          [uploadUrl]="b.status === 'approved' ? null : photosUrl(b.id)"
          [deleteBase]="canWrite() && b.status !== 'approved' ? photoBase : null"
          emptyText="No photos yet. Photograph the board in the room's own light if you can."
        />
      } @else if (isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the sample board" />
      } @else {
        <lb-form-alert [message]="loadMessage()" />
      }
    </section>
  `,
  styles: `
    .status {
      display: flex;
      align-items: center;
      gap: 0.4rem;
    }
    .facts {
      display: grid;
      grid-template-columns: max-content 1fr;
      gap: 0.25rem 1rem;
    }
    .facts dt {
      font-weight: 600;
    }
    .facts dd {
      margin: 0;
    }
    .decision {
      border-left: 4px solid currentColor;
      padding: 0.5rem 1rem;
      margin: 1rem 0;
    }
    .decision mat-icon {
      vertical-align: middle;
    }
    blockquote {
      margin: 0.5rem 0 0;
      white-space: pre-line;
    }
    .actions {
      display: flex;
      gap: 0.75rem;
      margin: 1rem 0;
    }
    .layers li {
      margin-bottom: 0.4rem;
    }
    .layers li span {
      display: block;
    }
    .notes {
      white-space: pre-line;
    }
    .muted {
      opacity: 0.8;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SampleDetail {
  private readonly api = inject(SampleApi);
  private readonly router = inject(Router);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);

  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<SampleBoardView>(() => boardUrl(this.id()));

  protected readonly words = STATUS_WORDS;
  protected readonly photoBase = BOARD_PHOTO_BASE;
  protected readonly photosUrl = boardPhotosUrl;
  protected readonly layerNote = crewLayerNote;
  protected readonly board = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  /** the gallery adds and removes photos without reloading the board */
  protected readonly photos = linkedSignal<readonly GalleryPhoto[]>(() => this.board()?.photos ?? []);
  protected readonly isLoading = this.loaded.isLoading;
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return toProblem(error).status === 404 ? 'This sample board does not exist, or is not one of yours.' : describe(error);
  });
  protected readonly isBusy = signal(false);
  protected readonly actionMessage = signal<string | null>(null);
  protected readonly canWrite = computed(() => this.session.hasRole('office'));

  protected async showToClient(): Promise<void> {
    const b = this.board();
    if (!b) return;
    const ok = await this.confirm({
      title: `Show "${b.label}" to ${b.clientName}?`,
      message: 'They will see it in their portal and get an e-mail, and the finish on this board will no longer change.',
      confirmLabel: 'Show to the client',
    });
    if (!ok) return;
    const shown = await this.act(() => this.api.show(b.id));
    if (shown) {
      this.loaded.set(shown);
      this.snackBar.open('The client can now see this board.', 'Close', { duration: 4000 });
    }
  }

  protected async startNextRound(): Promise<void> {
    const b = this.board();
    if (!b) return;
    const next = await this.act(() => this.api.startNextRound(b.id));
    if (next) {
      this.snackBar.open(`Round ${next.round} started.`, 'Close', { duration: 4000 });
      await this.router.navigate(['/samples', next.id]);
    }
  }

  /** Runs one write with the buttons held; its refusal is said above them. */
  private async act(call: () => Promise<SampleBoardView>): Promise<SampleBoardView | null> {
    this.isBusy.set(true);
    this.actionMessage.set(null);
    try {
      return await call();
    } catch (error) {
      this.actionMessage.set(describe(error));
      return null;
    } finally {
      this.isBusy.set(false);
    }
  }

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }
}

function describe(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
