import { HttpClient, HttpEventType } from '@angular/common/http';
import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  Injector,
  afterNextRender,
  inject,
  input,
  model,
  signal,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { PHOTO_CONTENT_TYPES, PHOTO_UPLOAD_MAX_BYTES, type PhotoThumbnail } from '@layerbook/contracts/types';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import type { KeyedWord } from '../forms/field-error-pipe';
import { photoProblemText, screenPick, thumbnailWidth, uploadPercent } from './photo-picks';

/** A photo as the gallery draws it: staff photos also carry their original to download. */
export interface GalleryPhoto extends PhotoThumbnail {
  readonly downloadUrl?: string;
  readonly originalName?: string;
  /** false when the server says the reader may not delete this one (a crew member and another's photo) */
  readonly canDelete?: boolean;
}

/** One file on its way up; `percent` is null until the browser reports a total. */
interface Upload {
  readonly key: number;
  readonly name: string;
  readonly percent: number | null;
}

let nextGalleryId = 0;

/**
 * Photos of one thing (a room, a sample board): thumbnails with captions, "Add photos" with a
 * progress bar per file (sent one at a time: a phone on a site connection does better with one
 * stream than ten), and delete after a yes in place. Read-only when given neither address.
 */
@Component({
  selector: 'lb-photo-gallery',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, TranslatePipe],
  template: `
    @let name = subject();
    <section class="gallery" [attr.aria-labelledby]="headingId">
      @if (headingLevel() === 3) {
        <h3 [id]="headingId">{{ heading() | translate }}</h3>
      } @else {
        <h2 [id]="headingId">{{ heading() | translate }}</h2>
      }
      @if (photos().length > 0) {
        <ul class="strip" [attr.aria-label]="'common.photoGallery.photosOf' | translate: { name }">
          @for (p of photos(); track p.id; let i = $index) {
            @let alt = p.caption || ('common.photoGallery.photoNumber' | translate: { number: i + 1, name });
            <li class="photo">
              @if (p.downloadUrl) {
                <a
                  [href]="p.downloadUrl"
                  [attr.aria-label]="
                    (p.originalName ? 'common.photoGallery.downloadNamed' : 'common.photoGallery.download')
                      | translate: { alt, file: p.originalName }
                  "
                >
                  <img [src]="p.thumbnailUrl" [alt]="alt" [width]="width(p)" [height]="thumbHeight()" loading="lazy" decoding="async" />
                </a>
              } @else {
                <img [src]="p.thumbnailUrl" [alt]="alt" [width]="width(p)" [height]="thumbHeight()" loading="lazy" decoding="async" />
              }
              @if (p.caption) {
                <span class="caption">{{ p.caption }}</span>
              }
              @if (canDelete() && p.canDelete !== false) {
                @if (confirming() === p.id) {
                  <span class="confirm" role="group" [attr.aria-label]="'common.photoGallery.deleteAsk' | translate: { number: i + 1 }">
                    <button mat-flat-button type="button" data-confirm [disabled]="isBusy()" (click)="deletePhoto(p)">
                      {{ 'common.photoGallery.delete' | translate }}
                    </button>
                    <button mat-button type="button" [disabled]="isBusy()" (click)="confirming.set(null)">
                      {{ 'common.photoGallery.keep' | translate }}
                    </button>
                  </span>
                } @else {
                  <button
                    mat-icon-button
                    type="button"
                    class="delete"
                    [disabled]="isBusy()"
                    [attr.aria-label]="'common.photoGallery.deleteLabel' | translate: { number: i + 1, name }"
                    (click)="askToDelete(p)"
                  >
                    <mat-icon aria-hidden="true">delete</mat-icon>
                  </button>
                }
              }
            </li>
          }
        </ul>
      } @else if (isLoaded() && uploads().length === 0) {
        <p class="muted">{{ emptyText() | translate }}</p>
      }

      @for (u of uploads(); track u.key) {
        <div class="upload">
          <span class="upload-name">{{ u.name }}</span>
          <mat-progress-bar
            [mode]="u.percent === null ? 'indeterminate' : 'determinate'"
            [value]="u.percent ?? 0"
            [attr.aria-label]="'common.photoGallery.uploading' | translate: { name: u.name }"
          />
        </div>
      }

      @if (canUpload() || errors().length > 0) {
        <div class="add">
          @if (canUpload()) {
            <input
              #picker
              class="picker"
              type="file"
              [accept]="accept"
              [attr.capture]="useCamera() ? 'environment' : null"
              multiple
              tabindex="-1"
              [attr.aria-label]="'common.photoGallery.files' | translate: { name }"
              (change)="addPhotos(picker)"
            />
            <button mat-stroked-button type="button" (click)="picker.click()">
              <mat-icon aria-hidden="true">add_a_photo</mat-icon>{{ 'common.photoGallery.add' | translate }}
            </button>
          }
          @if (errors().length > 0) {
            <div class="errors" role="alert">
              @for (message of errors(); track $index) {
                <p>{{ message }}</p>
              }
            </div>
          }
        </div>
      }
    </section>
  `,
  styles: `
    :host {
      display: block;
      margin: 1rem 0;
    }
    h2,
    h3 {
      margin: 0 0 0.5rem;
    }
    p {
      margin: 0.15rem 0;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
    /* One row that scrolls sideways on a phone rather than pushing the page far down. */
    .strip {
      list-style: none;
      margin: 0 0 0.5rem;
      padding: 0 0 0.25rem;
      display: flex;
      gap: 0.75rem;
      overflow-x: auto;
    }
    .photo {
      position: relative;
      flex: none;
      display: flex;
      flex-direction: column;
      align-items: flex-start;
      gap: 0.25rem;
      max-width: 16rem;
    }
    .photo img {
      display: block;
      width: auto;
      max-width: 16rem;
      object-fit: cover;
      border-radius: 4px;
      background: var(--mat-sys-surface-container);
    }
    .caption {
      font-size: 0.85rem;
      overflow-wrap: anywhere;
    }
    .delete {
      position: absolute;
      top: 0;
      right: 0;
      background: color-mix(in srgb, var(--mat-sys-surface) 85%, transparent);
    }
    .confirm {
      display: flex;
      gap: 0.25rem;
    }
    .upload {
      display: grid;
      grid-template-columns: minmax(0, 12rem) minmax(0, 1fr);
      align-items: center;
      gap: 0.5rem;
      margin: 0.25rem 0;
      max-width: 32rem;
    }
    .upload-name {
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    .add {
      display: flex;
      flex-wrap: wrap;
      align-items: flex-start;
      gap: 0.5rem 1rem;
    }
    /* Hidden but still in the page, so the button can open it and tests can hand it files. */
    .picker {
      position: absolute;
      width: 1px;
      height: 1px;
      opacity: 0;
      pointer-events: none;
    }
    .errors {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoGallery {
  private readonly http = inject(HttpClient);
  private readonly destroyRef = inject(DestroyRef);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);
  private readonly translate = inject(TranslateService);
  private nextKey = 0;

  readonly photos = model.required<readonly GalleryPhoto[]>();
  /** what the photos show, for alt texts and labels: "Photo 2 of Stair hall, board A" */
  readonly subject = input.required<string>();
  /** a words key (or text shown as is) */
  readonly heading = input('common.photoGallery.heading');
  readonly headingLevel = input<2 | 3>(2);
  /** where a new photo is posted (multipart field `file`); null: no upload */
  readonly uploadUrl = input<string | null>(null);
  /** a photo's address is `${deleteBase}/${id}`; null: no delete */
  readonly deleteBase = input<string | null>(null);
  /** shows the photos only, whatever addresses were given */
  readonly readOnly = input(false);
  /** offer the phone's back camera first (photos taken on site) */
  readonly useCamera = input(false);
  /** false while the host is still fetching the list, so "no photos" is not said too early */
  readonly isLoaded = input(true);
  /** a words key (or text shown as is) */
  readonly emptyText = input('common.photoGallery.empty');
  readonly thumbHeight = input(120);
  readonly maxBytes = input(PHOTO_UPLOAD_MAX_BYTES);
  /** more multipart fields sent with each photo after `file` (e.g. { caption, workItemId }); empty values are left out */
  readonly uploadFields = input<Readonly<Record<string, string>>>({});

  protected readonly headingId = `lb-photos-${nextGalleryId++}`;
  protected readonly accept = PHOTO_CONTENT_TYPES.join(',');
  protected readonly uploads = signal<readonly Upload[]>([]);
  protected readonly errors = signal<readonly string[]>([]);
  protected readonly isBusy = signal(false);
  /** the photo whose delete waits for a yes */
  protected readonly confirming = signal<string | null>(null);

  protected canUpload(): boolean {
    return !this.readOnly() && this.uploadUrl() !== null;
  }

  protected canDelete(): boolean {
    return !this.readOnly() && this.deleteBase() !== null;
  }

  protected width(photo: GalleryPhoto): number {
    return thumbnailWidth(photo, this.thumbHeight());
  }

  protected askToDelete(photo: GalleryPhoto): void {
    this.confirming.set(photo.id);
    // The yes takes the focus, so a keyboard user answers where they asked.
    afterNextRender(() => this.host.nativeElement.querySelector<HTMLButtonElement>('[data-confirm]')?.focus(), { injector: this.injector });
  }

  protected async addPhotos(picker: HTMLInputElement): Promise<void> {
    const files = Array.from(picker.files ?? []);
    // Cleared at once so choosing the same photo again still fires a change.
    picker.value = '';
    if (files.length === 0) return;
    const { accepted, refusals } = screenPick(files, this.maxBytes());
    this.errors.set(refusals.map((r) => this.say(r)));
    for (const file of accepted) await this.uploadOne(file);
  }

  protected async deletePhoto(photo: GalleryPhoto): Promise<void> {
    const base = this.deleteBase();
    if (base === null) return;
    this.isBusy.set(true);
    try {
      await firstValueFrom(this.http.delete(`${base}/${encodeURIComponent(photo.id)}`));
      this.photos.update((list) => list.filter((p) => p.id !== photo.id));
      this.errors.set([]);
    } catch (error) {
      this.errors.set([photoProblemText(error)]);
    } finally {
      this.confirming.set(null);
      this.isBusy.set(false);
    }
  }

  private say(word: KeyedWord): string {
    return this.translate.instant(word.key, word.params) as string;
  }

  private uploadOne(file: File): Promise<void> {
    const url = this.uploadUrl();
    if (url === null) return Promise.resolve();
    const key = this.nextKey++;
    this.uploads.update((list) => [...list, { key, name: file.name, percent: null }]);
    const setPercent = (percent: number | null) => this.uploads.update((list) => list.map((u) => (u.key === key ? { ...u, percent } : u)));
    const form = new FormData();
    form.append('file', file, file.name);
    for (const [name, value] of Object.entries(this.uploadFields())) if (value) form.append(name, value);
    return new Promise<void>((resolve) => {
      const done = () => {
        this.uploads.update((list) => list.filter((u) => u.key !== key));
        resolve();
      };
      this.http
        .post<GalleryPhoto>(url, form, { reportProgress: true, observe: 'events' })
        .pipe(takeUntilDestroyed(this.destroyRef))
        .subscribe({
          next: (event) => {
            if (event.type === HttpEventType.UploadProgress) setPercent(uploadPercent(event.loaded, event.total));
            if (event.type === HttpEventType.Response && event.body) {
              const photo = event.body;
              this.photos.update((list) => [...list, photo]);
            }
          },
          error: (error: unknown) => {
            this.errors.update((list) => [...list, `${file.name}: ${photoProblemText(error)}`]);
            done();
          },
          complete: done,
        });
    });
  }
}
