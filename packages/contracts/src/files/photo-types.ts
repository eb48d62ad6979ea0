/**
 * Photos as both apps show them, whatever they are photos of (a room during takeoff, a sample
 * board). Zod-free; the caption schema is in `photo-fields.ts`.
 */

export const PHOTO_CAPTION_MAX = 200;

/**
 * The largest upload the server takes by default (its FILE_MAX_BYTES setting); the apps check it
 * first so an obvious refusal needs no round trip on a site connection. The server decides.
 */
export const PHOTO_UPLOAD_MAX_BYTES = 15 * 1024 * 1024;

/** The formats the server keeps (it decodes every upload to check). */
export const PHOTO_CONTENT_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

/** What any photo list needs to draw a thumbnail: clients get no more than this. */
export interface PhotoThumbnail {
  readonly id: string;
  readonly caption: string;
  readonly thumbnailUrl: string;
  /** as shown (EXIF rotation applied); null when unknown */
  readonly width: number | null;
  readonly height: number | null;
}

/** A photo as staff see it: the thumbnail plus the original file to download. */
export interface PhotoView extends PhotoThumbnail {
  readonly fileId: string;
  readonly originalName: string;
  readonly downloadUrl: string;
  readonly createdAt: string;
}

/** GET /api/takeoff/rooms/:id/photos (items), POST …/photos */
export interface RoomPhotoView extends PhotoView {
  readonly roomId: string;
}

/** GET /api/samples/:id/photos (items), POST …/photos, and in a board's `photos` */
export interface BoardPhotoView extends PhotoView {
  readonly boardId: string;
}

/** The text sent beside the file in a photo upload (multipart field `caption`). */
export interface PhotoFields {
  readonly caption?: string;
}
