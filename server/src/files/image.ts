import path from 'node:path';
import sharp from 'sharp';
import { badRequest } from '../http/problem';

/** What an upload turned out to be once decoded, plus the thumbnail made from it. */
export interface CheckedImage {
  readonly bytes: Buffer;
  readonly contentType: string;
  readonly originalName: string;
  /** As shown: EXIF rotation applied, so a portrait phone photo is taller than wide. */
  readonly width: number;
  readonly height: number;
  readonly thumbnail: Buffer;
}

export interface ReceivedFile {
  readonly buffer: Buffer;
  readonly originalname: string;
}

/**
 * The image formats we keep and the names they may carry. HEIC is absent on purpose: sharp's
 * prebuilt libvips reads HEIF only for AVIF (no HEVC decoder), so an iPhone HEIC could not be
 * checked or thumbnailed; browsers hand over JPEG for `accept="image/*"` inputs in practice.
 */
const ALLOWED = {
  jpeg: { contentType: 'image/jpeg', extensions: ['.jpg', '.jpeg', '.jpe', '.jfif'] },
  png: { contentType: 'image/png', extensions: ['.png'] },
  webp: { contentType: 'image/webp', extensions: ['.webp'] },
} as const;
type AllowedFormat = keyof typeof ALLOWED;
const isAllowed = (format: string): format is AllowedFormat => Object.hasOwn(ALLOWED, format);

/** Markup can carry scripts; refused by name and by content, whatever else the file claims to be. */
const MARKUP_EXTENSIONS = new Set(['.svg', '.svgz', '.html', '.htm', '.xhtml', '.xml']);
const ACCEPTED_WORDS = 'a JPEG, PNG or WebP photo';

// A decompression bomb (a small file that expands to billions of pixels) would exhaust memory;
// 100 megapixels is above any phone camera.
const MAX_PIXELS = 100_000_000;
export const THUMBNAIL_WIDTH = 480;

const refuse = (field: string, message: string) => badRequest([{ field, message }], message);

/**
 * Decides what the bytes are by decoding them (libvips reads the magic bytes, not the name or the
 * browser's claim), checks that against the file name, and makes a WebP thumbnail. Any refusal is
 * a 400 naming `field`.
 */
export async function checkImage(file: ReceivedFile | undefined, field = 'file'): Promise<CheckedImage> {
  if (!file || file.buffer.length === 0) throw refuse(field, `Choose ${ACCEPTED_WORDS} to upload.`);
  const extension = path.extname(file.originalname).toLowerCase();
  if (MARKUP_EXTENSIONS.has(extension)) throw refuse(field, `SVG and HTML files are not accepted. Upload ${ACCEPTED_WORDS}.`);

  const metadata = await sharp(file.buffer, { limitInputPixels: MAX_PIXELS })
    .metadata()
    .catch(() => {
      throw refuse(field, `This file is not an image we can read. Upload ${ACCEPTED_WORDS}.`);
    });
  const format: string = metadata.format;
  if (format === 'svg') throw refuse(field, `SVG and HTML files are not accepted. Upload ${ACCEPTED_WORDS}.`);
  if (!isAllowed(format)) throw refuse(field, `${format.toUpperCase()} images are not accepted. Upload ${ACCEPTED_WORDS}.`);
  const allowed = ALLOWED[format];
  if (!(allowed.extensions as readonly string[]).includes(extension)) {
    const named = extension ? `is named ${extension}` : 'has no extension';
    throw refuse(
      field,
      `The file ${named} but holds a ${format.toUpperCase()} image. Rename it to ${allowed.extensions[0]} and try again.`,
    );
  }

  let bytes: Buffer;
  let thumbnail: Buffer;
  try {
    // Decoding the whole image here also catches files whose header is fine but whose data is cut short.
    bytes = await withoutMetadata(file.buffer, format);
    thumbnail = await sharp(bytes, { limitInputPixels: MAX_PIXELS, failOn: 'error' })
      .resize({ width: THUMBNAIL_WIDTH, withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer();
  } catch {
    throw refuse(field, `This image is damaged or incomplete. Upload ${ACCEPTED_WORDS}.`);
  }
  return {
    bytes,
    contentType: allowed.contentType,
    originalName: safeName(file.originalname, allowed.extensions[0]),
    width: metadata.autoOrient.width,
    height: metadata.autoOrient.height,
    thumbnail,
  };
}

/**
 * The original as we keep it: re-encoded in its own format with the EXIF rotation applied and no
 * metadata written back (sharp drops EXIF, GPS, XMP and IPTC unless told to keep them), so a photo
 * taken on site never carries the camera's location or serial number to whoever downloads it.
 */
async function withoutMetadata(buffer: Buffer, format: AllowedFormat): Promise<Buffer> {
  const image = sharp(buffer, { limitInputPixels: MAX_PIXELS, failOn: 'error' }).autoOrient();
  if (format === 'jpeg') return image.jpeg({ quality: 90 }).toBuffer();
  if (format === 'webp') return image.webp({ quality: 90 }).toBuffer();
  return image.png().toBuffer();
}

/**
 * The uploader's name is kept only to offer it back on download: path parts and control
 * characters are dropped and the length capped. Storage never uses it.
 */
export function safeName(name: string, fallbackExtension: string): string {
  const base = path
    .basename(name.replaceAll('\\', '/'))
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f"]/g, '')
    .trim()
    .slice(-120);
  return base || `photo${fallbackExtension}`;
}
