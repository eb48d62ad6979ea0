import { HttpClient, HttpEvent } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';

/**
 * A room photo as the API answers it (server/src/takeoff/photos.ts). Typed here until the
 * contracts package carries it; the app imports only types from there anyway.
 */
export interface RoomPhoto {
  readonly id: string;
  readonly roomId: string;
  readonly fileId: string;
  readonly caption: string;
  readonly originalName: string;
  readonly thumbnailUrl: string;
  readonly downloadUrl: string;
  readonly width: number | null;
  readonly height: number | null;
  readonly createdAt: string;
}

const id = (value: string) => encodeURIComponent(value);

/** Room photos: list, upload one file at a time (with progress events), delete. */
@Injectable({ providedIn: 'root' })
export class PhotoApi {
  private readonly http = inject(HttpClient);

  list(roomId: string): Promise<RoomPhoto[]> {
    return firstValueFrom(this.http.get<RoomPhoto[]>(`/api/takeoff/rooms/${id(roomId)}/photos`));
  }

  /** Every HTTP event, so the caller can show upload progress; the last one carries the photo. */
  upload(roomId: string, file: File, caption = ''): Observable<HttpEvent<RoomPhoto>> {
    const form = new FormData();
    if (caption) form.append('caption', caption);
    form.append('file', file, file.name);
    return this.http.post<RoomPhoto>(`/api/takeoff/rooms/${id(roomId)}/photos`, form, { reportProgress: true, observe: 'events' });
  }

  delete(photoId: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/takeoff/photos/${id(photoId)}`));
  }
}
