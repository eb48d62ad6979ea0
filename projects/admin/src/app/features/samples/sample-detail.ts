import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { SampleBoardView } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { LbDatePipe } from '../../../../../shared/i18n/format';
import { Language } from '../../../../../shared/i18n/language';
import { PhotoGallery, type GalleryPhoto } from '../../../../../shared/photos/photo-gallery';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { BoardEditForm } from './board-edit-form';
import { BOARD_PHOTO_BASE, SampleApi, boardPhotosUrl, boardUrl } from './sample-api';
import { layerNote } from './layer-note';
import { STATUS_WORDS } from './status-words';

/** One board: its finish as made (layers in order), photos, and where it stands with the client. */
@Component({
  selector: 'lb-sample-detail',
  imports: [
    BoardEditForm,
    FormAlert,
    LbDatePipe,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    PhotoGallery,
    RouterLink,
    TranslatePipe,
  ],
  template: `
    <section class="lb-page">
      <p>
        <a routerLink="/samples">{{ 'samples.common.back' | translate }}</a>
      </p>
      @if (board(); as b) {
        <h1>{{ b.label }}</h1>
        <p class="status">
          <mat-icon aria-hidden="true">{{ words[b.status].icon }}</mat-icon>
          <span>{{ words[b.status].key | translate }}</span>
          <span aria-hidden="true">·</span>
          <span>{{ 'samples.detail.round' | translate: { round: b.round } }}</span>
        </p>
        <dl class="facts">
          <dt>{{ 'samples.detail.client' | translate }}</dt>
          <dd>{{ b.clientName }}</dd>
          @if (b.siteAddress) {
            <dt>{{ 'samples.detail.site' | translate }}</dt>
            <dd>{{ b.siteAddress }}</dd>
          }
          <dt>{{ 'samples.detail.made' | translate }}</dt>
          <dd>{{ b.createdAt | lbDate: 'medium' : null }}</dd>
        </dl>

        @if (b.status === 'approved') {
          <p class="decision" role="status">
            <mat-icon aria-hidden="true">verified</mat-icon>
            {{
              'samples.detail.approvedBy'
                | translate: { name: b.decidedByName ?? ('samples.detail.theClient' | translate), date: (b.decidedAt | lbDate: 'medium') }
            }}
          </p>
        }
        @if (b.status === 'changes_requested') {
          <div class="decision" role="status">
            <p>
              <mat-icon aria-hidden="true">edit_note</mat-icon>
              {{
                'samples.detail.changesAsked'
                  | translate
                    : { name: b.decidedByName ?? ('samples.detail.theClientStart' | translate), date: (b.decidedAt | lbDate: 'medium') }
              }}
            </p>
            <blockquote>{{ b.clientComment }}</blockquote>
          </div>
        }

        <lb-form-alert [message]="actionMessage()" />
        @if (isClientToFix()) {
          <p>
            <a [routerLink]="['/clients', b.clientId]">{{ 'samples.detail.openClient' | translate: { client: b.clientName } }}</a>
          </p>
        }
        @if (canWrite()) {
          <div class="actions">
            @if (b.status !== 'approved' && !isEditing()) {
              <button mat-stroked-button type="button" [disabled]="isBusy()" (click)="isEditing.set(true)">
                <mat-icon aria-hidden="true">edit</mat-icon
                >{{ (b.status === 'draft' ? 'samples.edit.editBoard' : 'samples.edit.editNotes') | translate }}
              </button>
            }
            @if (b.status === 'draft') {
              <button mat-flat-button type="button" [disabled]="isBusy()" (click)="showToClient()">
                <mat-icon aria-hidden="true">send</mat-icon>{{ 'samples.detail.showToClient' | translate }}
              </button>
            }
            @if (b.status === 'changes_requested' && !b.hasNextRound) {
              <button mat-flat-button type="button" [disabled]="isBusy()" (click)="startNextRound()">
                <mat-icon aria-hidden="true">replay</mat-icon>{{ 'samples.detail.startNextRound' | translate }}
              </button>
            }
          </div>
          @if (isEditing() && b.status !== 'approved') {
            <lb-board-edit-form [board]="b" (saved)="edited($event)" (cancelled)="isEditing.set(false)" />
          }
        }
        @if (b.status === 'shown') {
          <p class="muted">{{ 'samples.detail.withClientNote' | translate }}</p>
        }

        <section aria-labelledby="finish-heading">
          <h2 id="finish-heading">{{ 'samples.detail.finish' | translate }}</h2>
          @if (b.finish; as finish) {
            <p>
              <strong>{{ finish.systemName }}</strong>
              @if (finish.description) {
                — {{ finish.description }}
              }
            </p>
            <p class="muted">{{ 'samples.detail.takenAt' | translate: { date: (finish.takenAt | lbDate: 'medium' : null) } }}</p>
            <ol class="layers" [attr.aria-label]="'samples.detail.layers' | translate">
              @for (layer of finish.layers; track layer.position) {
                <li>
                  <strong>{{ layer.name }}</strong>
                  <span>{{ layerNote(layer) }}</span>
                </li>
              }
            </ol>
          } @else {
            <p class="muted">{{ 'samples.detail.noFinish' | translate }}</p>
          }
        </section>

        @if (b.notes) {
          <section aria-labelledby="notes-heading">
            <h2 id="notes-heading">{{ 'samples.detail.notes' | translate }}</h2>
            <p class="notes">{{ b.notes }}</p>
          </section>
        }

        <lb-photo-gallery
          [subject]="b.label"
          [(photos)]="photos"
          [uploadUrl]="b.status === 'draft' ? photosUrl(b.id) : null"
          [deleteBase]="canWrite() && b.status === 'draft' ? photoBase : null"
          emptyText="samples.detail.noPhotos"
        />
        @if (b.status === 'shown' || b.status === 'changes_requested') {
          <p class="muted">{{ 'samples.detail.photosFixed' | translate }}</p>
        }
      } @else if (isLoading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'samples.detail.loading' | translate" />
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
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);

  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<SampleBoardView>(() => boardUrl(this.id()));

  protected readonly words = STATUS_WORDS;
  protected readonly photoBase = BOARD_PHOTO_BASE;
  protected readonly photosUrl = boardPhotosUrl;
  protected readonly layerNote = (layer: Parameters<typeof layerNote>[0]) => {
    this.language.current(); // the note follows a language switch
    return layerNote(layer, (key, params) => this.say(key, params));
  };
  protected readonly board = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  /** the gallery adds and removes photos without reloading the board */
  protected readonly photos = linkedSignal<readonly GalleryPhoto[]>(() => this.board()?.photos ?? []);
  protected readonly isLoading = this.loaded.isLoading;
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return toProblem(error).status === 404 ? this.say('samples.detail.notFound') : describe(error);
  });
  protected readonly isBusy = signal(false);
  /** the edit form is open; closed again when the page moves to another board (the next round) */
  protected readonly isEditing = linkedSignal({ source: this.id, computation: () => false });
  protected readonly actionMessage = signal<string | null>(null);
  /** the last refusal was about the client's record (their e-mail address): the page links to it */
  protected readonly isClientToFix = signal(false);
  protected readonly canWrite = computed(() => this.session.hasRole('office'));

  protected async showToClient(): Promise<void> {
    const b = this.board();
    if (!b) return;
    const ok = await this.confirm({
      title: this.say('samples.detail.confirmShowTitle', { label: b.label, client: b.clientName }),
      message: this.say('samples.detail.confirmShowMessage'),
      confirmLabel: this.say('samples.detail.showToClient'),
    });
    if (!ok) return;
    const shown = await this.act(() => this.api.show(b.id));
    if (shown) {
      this.isEditing.set(false);
      this.loaded.set(shown);
      this.snackBar.open(this.say('samples.detail.shownNote'), this.say('samples.common.close'), { duration: 4000 });
    }
  }

  protected async startNextRound(): Promise<void> {
    const b = this.board();
    if (!b) return;
    const next = await this.act(() => this.api.startNextRound(b.id));
    if (next) {
      this.snackBar.open(this.say('samples.detail.roundStarted', { round: next.round }), this.say('samples.common.close'), {
        duration: 4000,
      });
      await this.router.navigate(['/samples', next.id]);
    }
  }

  protected edited(board: SampleBoardView): void {
    this.isEditing.set(false);
    this.actionMessage.set(null);
    this.loaded.set(board);
    this.snackBar.open(this.say('samples.edit.saved'), this.say('samples.common.close'), { duration: 4000 });
  }

  /** Runs one write with the buttons held; its refusal is said above them. */
  private async act(call: () => Promise<SampleBoardView>): Promise<SampleBoardView | null> {
    this.isBusy.set(true);
    this.actionMessage.set(null);
    this.isClientToFix.set(false);
    try {
      return await call();
    } catch (error) {
      this.actionMessage.set(describe(error));
      this.isClientToFix.set(toProblem(error).errors?.some((e) => e.field === 'client.email') ?? false);
      return null;
    } finally {
      this.isBusy.set(false);
    }
  }

  /** Words made here (dialog, snack bar, notes) in the current language. */
  private say(key: string, params?: Record<string, unknown>): string {
    return this.translate.instant(key, params) as string;
  }

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }
}

function describe(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
