import { ChangeDetectionStrategy, Component, computed, input, linkedSignal, signal } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import { type JobSheet, PHOTO_CAPTION_MAX } from '@layerbook/contracts/types';
import { PhotoGallery, type GalleryPhoto } from '../../../../../../shared/photos/photo-gallery';

const photosUrl = (jobId: string) => `/api/jobs/${encodeURIComponent(jobId)}/photos`;

/**
 * Progress photos from site: a caption and, if the crew picks one, the layer the photos show, sent
 * with each photo added (the phone's back camera first); the shared gallery shows them and the
 * upload progress, with a delete button only on the photos the server says the reader may delete.
 */
@Component({
  selector: 'lb-sheet-photos',
  imports: [MatFormFieldModule, MatInputModule, PhotoGallery, TranslatePipe],
  template: `
    @let s = sheet();
    <div class="fields">
      <mat-form-field subscriptSizing="dynamic">
        <mat-label>{{ 'sheet.photos.caption' | translate }}</mat-label>
        <input matInput [maxLength]="captionMax" [value]="caption()" (input)="caption.set($any($event.target).value)" />
      </mat-form-field>
      <mat-form-field subscriptSizing="dynamic">
        <mat-label>{{ 'sheet.photos.shows' | translate }}</mat-label>
        <select matNativeControl [value]="workItemId()" (change)="workItemId.set($any($event.target).value)">
          <option value="">{{ 'sheet.photos.wholeJob' | translate }}</option>
          @for (item of items(); track item.id) {
            <option [value]="item.id">
              {{ item.label }}
              @if (item.changeOrder !== null) {
                · {{ 'sheet.work.addedBy' | translate: { number: item.changeOrder } }}
              }
            </option>
          }
        </select>
      </mat-form-field>
    </div>
    <lb-photo-gallery
      [subject]="s.title"
      heading="sheet.photos.heading"
      [(photos)]="photos"
      [uploadUrl]="url()"
      [deleteBase]="url()"
      [uploadFields]="fields()"
      [useCamera]="true"
      [thumbHeight]="96"
      emptyText="sheet.photos.empty"
    />
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fit, minmax(min(100%, 14rem), 1fr));
      /* outlined fields float their label above the box: a row gap that leaves it clear of the field above */
      gap: 1.25rem 0.75rem;
      margin-top: 0.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetPhotos {
  readonly sheet = input.required<JobSheet>();

  protected readonly captionMax = PHOTO_CAPTION_MAX;
  protected readonly photos = linkedSignal<readonly GalleryPhoto[]>(() => this.sheet().photos);
  protected readonly url = computed(() => photosUrl(this.sheet().id));
  protected readonly caption = signal('');
  protected readonly workItemId = signal('');
  /**
   * the layers on surfaces a photo can show: "Dining room · Walls · Glaze coat", and a change order's
   * redo of a surface after it, named by its change order so it reads apart from the sold layers
   */
  protected readonly items = computed(() =>
    this.sheet().rooms.flatMap((room) =>
      room.surfaces.flatMap((surface) =>
        surface.layers.flatMap((layer) =>
          layer.workItemId
            ? [{ id: layer.workItemId, label: `${room.name} · ${surface.name} · ${layer.name}`, changeOrder: surface.changeOrder }]
            : [],
        ),
      ),
    ),
  );
  protected readonly fields = computed(() => ({ caption: this.caption().trim(), workItemId: this.workItemId() }));
}
