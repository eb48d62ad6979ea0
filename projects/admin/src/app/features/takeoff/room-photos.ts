import { isPlatformBrowser } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, PLATFORM_ID, computed, inject, input, linkedSignal } from '@angular/core';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { ItemList, RoomPhotoView } from '@layerbook/contracts/types';
import { PhotoGallery, type GalleryPhoto } from '../../../../../shared/photos/photo-gallery';
import { Session } from '../../core/auth/session';
import { problemMessage } from '../../core/errors/problem';
import { FormAlert } from '../../shared/ui/form-alert';

const roomPhotosUrl = (roomId: string) => `/api/takeoff/rooms/${encodeURIComponent(roomId)}/photos`;

/**
 * A room's photo strip. Crew add progress photos from site, so anyone may upload (the phone's
 * camera first); owner and office delete.
 */
@Component({
  selector: 'lb-room-photos',
  imports: [FormAlert, PhotoGallery, TranslatePipe],
  template: `
    <lb-photo-gallery
      [subject]="roomName()"
      [headingLevel]="3"
      [(photos)]="photos"
      [isLoaded]="isLoaded()"
      [uploadUrl]="uploadUrl()"
      [deleteBase]="canDelete() ? '/api/takeoff/photos' : null"
      [useCamera]="true"
      [thumbHeight]="96"
      [emptyText]="'takeoff.roomPhotos.empty' | translate"
    />
    <lb-form-alert [message]="loadMessage()" />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoomPhotos {
  private readonly session = inject(Session);
  private readonly translate = inject(TranslateService);
  private readonly isBrowser = isPlatformBrowser(inject(PLATFORM_ID));

  readonly roomId = input.required<string>();
  readonly roomName = input.required<string>();

  // Loaded in the browser only: server rendering would fetch every room's list before the page
  // could be sent, for images the browser fetches again anyway.
  protected readonly list = httpResource<ItemList<RoomPhotoView>>(() => (this.isBrowser ? roomPhotosUrl(this.roomId()) : undefined));
  protected readonly photos = linkedSignal<readonly GalleryPhoto[]>(() => (this.list.hasValue() ? this.list.value().items : []));
  /** false until the list came back (never on the server), so "no photos" is not said too early */
  protected readonly isLoaded = computed(() => this.list.hasValue() || this.list.error() !== undefined);
  protected readonly uploadUrl = computed(() => roomPhotosUrl(this.roomId()));
  protected readonly loadMessage = computed(() => {
    const error = this.list.error();
    return error ? String(this.translate.instant('takeoff.roomPhotos.loadFailed', { problem: problemMessage(error) })) : null;
  });
  protected readonly canDelete = () => this.session.hasRole('office');
}
