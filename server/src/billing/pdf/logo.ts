import type { Readable } from 'node:stream';
import type { Logger } from 'pino';
import sharp from 'sharp';
import type { ObjectStore } from '../../files/object-store';

/** Big enough to print sharp at the logo's size on paper (about 2 × 0.8 in), small enough to keep the PDF light. */
const LOGO_BOX = { width: 600, height: 240 } as const;

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/**
 * The firm's logo as PNG for the PDF (pdfkit draws JPEG and PNG only; WebP uploads are converted),
 * or null when there is none or it cannot be read: a document is never refused for its logo.
 */
export async function logoPng(storage: ObjectStore, logger: Logger, key: string | null): Promise<Buffer | null> {
  if (!key) return null;
  try {
    const stream = await storage.get(key);
    if (!stream) return null;
    return await sharp(await bytesOf(stream))
      .resize({ ...LOGO_BOX, fit: 'inside', withoutEnlargement: true })
      .png()
      .toBuffer();
  } catch (err) {
    logger.warn({ err, key }, 'could not read the firm logo for a PDF');
    return null;
  }
}
