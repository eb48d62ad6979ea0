import compression from 'compression';
import type { RequestHandler } from 'express';

/** Pages and API answers: HTML and JSON (problems included). */
const COMPRESSED_TYPES = /^(?:text\/html|application\/(?:[a-z.+-]+\+)?json)\b/i;

/**
 * Compresses rendered pages and JSON answers on the fly (brotli when the browser takes it, else gzip).
 * Static files come compressed from the build (projects/shared/ssr/ssr-app.ts); PDFs, images and zips
 * are compressed already, and streamed CSV exports go out as they are produced.
 */
export function compressAnswers(): RequestHandler {
  return compression({
    threshold: 1024,
    filter: (req, res) => COMPRESSED_TYPES.test(String(res.getHeader('content-type') ?? '')) && compression.filter(req, res),
  });
}
