import { pipeline } from 'node:stream/promises';
import type { Readable } from 'node:stream';
import { uuid } from '@layerbook/contracts';
import { Response, Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { notFound } from '../http/problem';
import { parse } from '../http/validate';
import { findFile } from './stored-files';

const fileParam = z.strictObject({ id: uuid('file id') });

/**
 * Downloads of stored files. The row is read in the firm's transaction (RLS: another firm's id is a
 * 404), then the bytes stream from the store after the transaction has ended, so a slow phone
 * download holds no database connection.
 */
export function fileRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id', async (req, res) => {
    const file = await withStaff(ctx, req, 'crew', (tx) => findFile(tx, parse(fileParam, req.params).id));
    const body = await ctx.storage.get(file.storageKey);
    if (!body) throw notFound('file');
    // Always an attachment: the browser saves it rather than rendering anything inside our origin.
    res.attachment(file.originalName);
    res.set({ 'content-type': file.contentType, 'content-length': String(file.sizeBytes) });
    await send(ctx, res, body);
  });

  router.get('/:id/thumbnail', async (req, res) => {
    const file = await withStaff(ctx, req, 'crew', (tx) => findFile(tx, parse(fileParam, req.params).id));
    const body = file.thumbnailKey ? await ctx.storage.get(file.thumbnailKey) : null;
    if (!body) throw notFound('thumbnail');
    // Shown inline: the thumbnail is WebP that sharp wrote itself, not bytes from the uploader.
    res.set({
      'content-type': 'image/webp',
      'content-disposition': 'inline; filename="thumbnail.webp"',
      'cache-control': 'private, max-age=3600',
    });
    await send(ctx, res, body);
  });

  return router;
}

async function send(ctx: AppContext, res: Response, body: Readable): Promise<void> {
  // nosniff keeps the browser to the stated type; the sandbox CSP stops any markup that slipped
  // through from running with our origin's rights.
  res.set({ 'x-content-type-options': 'nosniff', 'content-security-policy': "default-src 'none'; sandbox" });
  try {
    await pipeline(body, res);
  } catch (err) {
    // Headers are already sent, so there is no problem+json to give: end the response and log.
    ctx.logger.warn({ err }, 'file download interrupted');
    res.destroy();
  }
}
