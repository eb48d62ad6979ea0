import { HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, inject, input, model, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { firstValueFrom } from 'rxjs';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import type { BoardPhoto } from './sample-board';
import { SampleApi } from './sample-api';

interface Upload {
  readonly key: number;
  readonly name: string;
  readonly percent: number | null;
}

// Mirrors the server's defaults so an obvious refusal needs no round trip; the server still decides.
const MAX_BYTES = 15 * 1024 * 1024;
const MAX_FILES = 10;
const THUMB_HEIGHT = 120;

/**
 * A board's photos: thumbnails, "Add photos" with a progress bar per file (one upload at a time),
 * and delete for owner and office while the board is not approved.
 */
@Component({
  selector: 'lb-board-photos',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule],
  template: `
    <section class="photos" aria-labelledby="board-photos-heading">
      <h2 id="board-photos-heading">Photos</h2>
      @if (photos().length > 0) {
        <ul class="strip" aria-label="Photos of the board">
          @for (p of photos(); track p.id; let i = $index) {
            <li class="photo">
              <a [href]="p.downloadUrl" [attr.aria-label]="'Download photo ' + (i + 1) + ' (' + p.originalName + ')'">
                <img [src]="p.thumbnailUrl" [alt]="p.caption || 'Photo ' + (i + 1) + ' of ' + label()" [width]="thumbWidth(p)" [height]="thumbHeight" loading="lazy" decoding="async" />
              </a>
              @if (p.caption) {
                <span class="caption">{{ p.caption }}</span>
              }
              @if (canDelete()) {
                <button mat-icon-button type="button" [disabled]="isBusy()" [attr.aria-label]="'Delete photo ' + (i + 1)" (click)="deletePhoto(p, i + 1)">
                  <mat-icon aria-hidden="true">delete</mat-icon>
                </button>
              }
            </li>
          }
        </ul>
      } @else if (uploads().length === 0) {
        <p class="muted">No photos yet. Photograph the board in the room's own light if you can.</p>
      }

      @for (u of uploads(); track u.key) {
        <div class="upload">
          <span>{{ u.name }}</span>
          <mat-progress-bar [mode]="u.percent === null ? 'indeterminate' : 'determinate'" [value]="u.percent ?? 0" [attr.aria-label]="'Uploading ' + u.name" />
        </div>
      }

      <div class="add">
        <input #picker class="picker" type="file" accept="image/jpeg,image/png,image/webp" multiple tabindex="-1" aria-label="Photo files for the board" (change)="addPhotos(picker)" />
        <button mat-stroked-button type="button" (click)="picker.click()">
          <mat-icon aria-hidden="true">add_a_photo</mat-icon>Add photos
        </button>
        @if (errors().length > 0) {
          <div class="errors" role="alert">
            @for (m of errors(); track $index) {
              <p>{{ m }}</p>
            }
          </div>
        }
      </div>
    </section>
  `,
  styles: `
    .strip { list-style: none; display: flex; flex-wrap: wrap; gap: 0.75rem; padding: 0; margin: 0 0 0.75rem; }
    .photo { display: flex; flex-direction: column; align-items: flex-start; gap: 0.25rem; }
    .photo img { display: block; border-radius: 4px; object-fit: cover; }
    .caption { font-size: 0.875rem; }
    .upload { display: grid; gap: 0.25rem; max-width: 24rem; margin-bottom: 0.5rem; }
    .picker { position: absolute; width: 1px; height: 1px; opacity: 0; pointer-events: none; }
    .errors p { margin: 0.25rem 0; color: var(--mat-sys-error, #8c1d18); }
    .muted { opacity: 0.8; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardPhotos {
  private readonly api = inject(SampleApi);
  private readonly dialog = inject(MatDialog);
  private readonly destroyRef = inject(DestroyRef);
  private nextKey = 0;

  readonly boardId = input.required<string>();
  readonly label = input.required<string>();
  readonly canDelete = input(false);
  readonly photos = model.required<readonly BoardPhoto[]>();

  protected readonly uploads = signal<readonly Upload[]>([]);
  protected readonly errors = signal<readonly string[]>([]);
  protected readonly isBusy = signal(false);
  protected readonly thumbHeight = THUMB_HEIGHT;

  protected thumbWidth(p: BoardPhoto): number {
    return p.width && p.height ? Math.round((THUMB_HEIGHT * p.width) / p.height) : THUMB_HEIGHT;
  }

  protected async addPhotos(picker: HTMLInputElement): Promise<void> {
    const files = Array.from(picker.files ?? []);
    picker.value = '';
    if (files.length === 0) return;
    const errors: string[] = [];
    if (files.length > MAX_FILES) errors.push(`Choose up to ${MAX_FILES} photos at a time; the first ${MAX_FILES} are being added.`);
    const accepted = files.slice(0, MAX_FILES).filter((f) => {
      if (f.size > MAX_BYTES) errors.push(`${f.name}: larger than 15 MB. Choose a smaller photo.`);
      return f.size <= MAX_BYTES;
    });
    this.errors.set(errors);
    for (const file of accepted) await this.uploadOne(file);
  }

  protected async deletePhoto(photo: BoardPhoto, position: number): Promise<void> {
    const ok = await firstValueFrom(
      this.dialog
        .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, {
          data: { title: `Delete photo ${position}?`, message: 'The photo and its original file will be gone.', confirmLabel: 'Delete photo' },
        })
        .afterClosed(),
    );
    if (!ok) return;
    this.isBusy.set(true);
    try {
      await this.api.deletePhoto(photo.id);
      this.photos.update((list) => list.filter((p) => p.id !== photo.id));
      this.errors.set([]);
    } catch (error) {
      this.errors.set([describe(error)]);
    } finally {
      this.isBusy.set(false);
    }
  }

  private uploadOne(file: File): Promise<void> {
    const key = this.nextKey++;
    this.uploads.update((list) => [...list, { key, name: file.name, percent: null }]);
    const setPercent = (percent: number) => this.uploads.update((list) => list.map((u) => (u.key === key ? { ...u, percent } : u)));
    const finish = () => this.uploads.update((list) => list.filter((u) => u.key !== key));
    return new Promise<void>((resolve) => {
      this.api
        .uploadPhoto(this.boardId(), file)
        .pipe(takeUntilDestroyed(this.destroyRef))
        .subscribe({
          next: (event) => {
            if (event.type === HttpEventType.UploadProgress && event.total) setPercent(Math.round((100 * event.loaded) / event.total));
            if (event.type === HttpEventType.Response && event.body) {
              const photo = event.body;
              this.photos.update((list) => [...list, photo]);
            }
          },
          error: (error: unknown) => {
            this.errors.update((list) => [...list, `${file.name}: ${describe(error)}`]);
            finish();
            resolve();
          },
          complete: () => {
            finish();
            resolve();
          },
        });
    });
  }
}

function describe(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
