import { HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, afterNextRender, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { firstValueFrom } from 'rxjs';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { PhotoApi, type RoomPhoto } from './photo-api';

/** One file on its way up; `percent` is null until the browser reports a total. */
interface Upload {
  readonly key: number;
  readonly name: string;
  readonly percent: number | null;
}

// Mirror the server's defaults (FILE_MAX_BYTES, one file per request) so an obvious refusal needs
// no round trip on a phone connection; the server still decides.
const MAX_BYTES = 15 * 1024 * 1024;
const MAX_FILES = 10;
const THUMB_HEIGHT = 96;

/**
 * A room's photo strip: thumbnails, "Add photos" (camera on phones), a progress bar per file, and
 * delete for owner and office. Crew add progress photos from site, so they may upload too.
 */
@Component({
  selector: 'lb-room-photos',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './room-photos.html',
  styleUrl: './room-photos.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoomPhotos {
  private readonly api = inject(PhotoApi);
  private readonly dialog = inject(MatDialog);
  private readonly destroyRef = inject(DestroyRef);
  private readonly session = inject(Session);
  private nextKey = 0;

  readonly roomId = input.required<string>();
  readonly roomName = input.required<string>();

  protected readonly photos = signal<readonly RoomPhoto[]>([]);
  protected readonly uploads = signal<readonly Upload[]>([]);
  protected readonly errors = signal<readonly string[]>([]);
  protected readonly isLoaded = signal(false);
  protected readonly isBusy = signal(false);
  protected readonly canDelete = () => this.session.hasRole('office');

  constructor() {
    // Photos are loaded in the browser only: server rendering would fetch every room's list
    // before the page could be sent, for images the browser fetches again anyway.
    afterNextRender(() => void this.load());
  }

  protected altText(photo: RoomPhoto): string {
    return photo.caption || `Photo of ${this.roomName()}`;
  }

  /** The thumbnail's width at the strip's height, so the layout does not jump as images arrive. */
  protected thumbWidth(photo: RoomPhoto): number {
    return photo.width && photo.height ? Math.round((THUMB_HEIGHT * photo.width) / photo.height) : THUMB_HEIGHT;
  }

  protected readonly thumbHeight = THUMB_HEIGHT;

  protected async addPhotos(input: HTMLInputElement): Promise<void> {
    const files = Array.from(input.files ?? []);
    // Cleared at once so choosing the same photo again still fires a change.
    input.value = '';
    if (files.length === 0) return;
    const errors: string[] = [];
    if (files.length > MAX_FILES) errors.push(`Choose up to ${MAX_FILES} photos at a time; the first ${MAX_FILES} are being added.`);
    const accepted = files.slice(0, MAX_FILES).filter((file) => {
      if (file.size > MAX_BYTES) {
        errors.push(`${file.name}: larger than 15 MB. Choose a smaller photo.`);
        return false;
      }
      return true;
    });
    this.errors.set(errors);
    // One at a time: a phone on a site connection does better with one stream than ten.
    for (const file of accepted) {
      await this.uploadOne(file);
    }
  }

  protected async deletePhoto(photo: RoomPhoto, position: number): Promise<void> {
    const ok = await firstValueFrom(
      this.dialog
        .open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, {
          data: { title: `Delete photo ${position} of ${this.roomName()}?`, message: 'The photo and its original file will be gone.', confirmLabel: 'Delete photo' },
        })
        .afterClosed(),
    );
    if (!ok) return;
    this.isBusy.set(true);
    try {
      await this.api.delete(photo.id);
      this.photos.update((list) => list.filter((p) => p.id !== photo.id));
      this.errors.set([]);
    } catch (error) {
      this.errors.set([describe(error)]);
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(): Promise<void> {
    try {
      this.photos.set(await this.api.list(this.roomId()));
    } catch (error) {
      this.errors.set([`Photos could not be loaded: ${describe(error)}`]);
    } finally {
      this.isLoaded.set(true);
    }
  }

  private uploadOne(file: File): Promise<void> {
    const key = this.nextKey++;
    this.uploads.update((list) => [...list, { key, name: file.name, percent: null }]);
    const setPercent = (percent: number) => this.uploads.update((list) => list.map((u) => (u.key === key ? { ...u, percent } : u)));
    const finish = () => this.uploads.update((list) => list.filter((u) => u.key !== key));
    return new Promise<void>((resolve) => {
      this.api
        .upload(this.roomId(), file)
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

/** The server's own words for a refusal (problem+json names `file` with a plain message). */
function describe(error: unknown): string {
  const problem = toProblem(error);
  return problem.errors?.[0]?.message ?? problem.detail ?? problem.title;
}
