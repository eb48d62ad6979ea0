import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { BoardPhotos } from './board-photos';
import type { BoardPhoto, SampleBoard, SnapshotLayer } from './sample-board';
import { SampleApi } from './sample-api';
import { STATUS_WORDS } from './status-words';

/** One board: its finish as made (layers in order), photos, and where it stands with the client. */
@Component({
  selector: 'lb-sample-detail',
  imports: [BoardPhotos, DatePipe, FormAlert, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink],
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
            Approved by {{ b.decidedByName ?? 'the client' }} on {{ b.decidedAt | date: 'medium' }}. This board is the control sample for the work.
          </p>
        }
        @if (b.status === 'changes_requested') {
          <div class="decision" role="status">
            <p><mat-icon aria-hidden="true">edit_note</mat-icon> {{ b.decidedByName ?? 'The client' }} asked for changes on {{ b.decidedAt | date: 'medium' }}:</p>
            <blockquote>{{ b.clientComment }}</blockquote>
          </div>
        }

        <lb-form-alert [message]="message()" />
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
                  <span>{{ layerWords(layer) }}</span>
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

        <lb-board-photos [boardId]="b.id" [label]="b.label" [canDelete]="canWrite() && b.status !== 'approved'" [(photos)]="photos" />
      } @else if (isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the sample board" />
      } @else {
        <lb-form-alert [message]="message()" />
      }
    </section>
  `,
  styles: `
    .status { display: flex; align-items: center; gap: 0.4rem; }
    .facts { display: grid; grid-template-columns: max-content 1fr; gap: 0.25rem 1rem; }
    .facts dt { font-weight: 600; }
    .facts dd { margin: 0; }
    .decision { border-left: 4px solid currentColor; padding: 0.5rem 1rem; margin: 1rem 0; }
    .decision mat-icon { vertical-align: middle; }
    blockquote { margin: 0.5rem 0 0; white-space: pre-line; }
    .actions { display: flex; gap: 0.75rem; margin: 1rem 0; }
    .layers li { margin-bottom: 0.4rem; }
    .layers li span { display: block; }
    .notes { white-space: pre-line; }
    .muted { opacity: 0.8; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SampleDetail {
  private readonly api = inject(SampleApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly session = inject(Session);

  protected readonly words = STATUS_WORDS;
  protected readonly board = signal<SampleBoard | null>(null);
  protected readonly photos = signal<readonly BoardPhoto[]>([]);
  protected readonly isLoading = signal(true);
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly canWrite = computed(() => this.session.hasRole('office'));

  constructor() {
    this.route.paramMap.pipe(takeUntilDestroyed(inject(DestroyRef))).subscribe((params) => void this.load(params.get('id') ?? ''));
  }

  protected layerWords(layer: SnapshotLayer): string {
    const products =
      layer.products.length > 1
        ? `Mix by ${layer.mixBy ?? 'volume'}: ${layer.products.map((p) => `${p.parts ?? 1} part${p.parts === 1 ? '' : 's'} ${p.name}`).join(', ')}`
        : layer.products[0]?.name ?? '';
    const bits = [
      products,
      `${layer.method}, ${layer.coats} coat${layer.coats === 1 ? '' : 's'}`,
      layer.coverageShare !== undefined && layer.coverageShare < 1 ? `over ${Math.round(layer.coverageShare * 100)} % of the surface` : '',
      layer.dilution ? `thinned ${Math.round(layer.dilution.share * 100)} %` : '',
      layer.waitHoursAfter > 0 ? `wait ${layer.waitHoursAfter} h before the next layer` : '',
    ];
    return bits.filter(Boolean).join('; ');
  }

  protected async showToClient(): Promise<void> {
    const b = this.board();
    if (!b) return;
    const ok = await this.confirm({
      title: `Show "${b.label}" to ${b.clientName}?`,
      message: 'They will see it in their portal and get an e-mail, and the finish on this board will no longer change.',
      confirmLabel: 'Show to the client',
    });
    if (ok) await this.act(() => this.api.show(b.id), 'The client can now see this board.');
  }

  protected async startNextRound(): Promise<void> {
    const b = this.board();
    if (!b) return;
    this.isBusy.set(true);
    try {
      const next = await this.api.startNextRound(b.id);
      this.snackBar.open(`Round ${next.round} started.`, 'Close', { duration: 4000 });
      await this.router.navigate(['/samples', next.id]);
    } catch (error) {
      this.message.set(describe(error));
    } finally {
      this.isBusy.set(false);
    }
  }

  private async act(call: () => Promise<SampleBoard>, done: string): Promise<void> {
    this.isBusy.set(true);
    this.message.set(null);
    try {
      this.setBoard(await call());
      this.snackBar.open(done, 'Close', { duration: 4000 });
    } catch (error) {
      this.message.set(describe(error));
    } finally {
      this.isBusy.set(false);
    }
  }

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }

  private setBoard(b: SampleBoard): void {
    this.board.set(b);
    this.photos.set(b.photos);
  }

  private async load(id: string): Promise<void> {
    this.isLoading.set(true);
    this.message.set(null);
    try {
      this.setBoard(await this.api.get(id));
    } catch (error) {
      this.board.set(null);
      this.message.set(toProblem(error).status === 404 ? 'This sample board does not exist, or is not one of yours.' : describe(error));
    } finally {
      this.isLoading.set(false);
    }
  }
}

function describe(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
