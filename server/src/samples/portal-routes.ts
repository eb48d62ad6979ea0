import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { sampleChangeRequest, uuid, type ClientBoardView, type ItemList } from '@layerbook/contracts';
import { Router, type Response } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import { notFound } from '../http/problem';
import { parse } from '../http/validate';
import { clientBoardPhotoFile, decideBoard, getClientBoard, listClientBoards } from './client-boards';

const boardParam = z.strictObject({ id: uuid('sample board id') });
const photoParam = z.strictObject({ photoId: uuid('photo id') });
const noBody = z.strictObject({});

/**
 * The client's side of sample boards, mounted at /api/portal/boards: the boards of their own
 * client record that the firm has shown, their photos, and one answer per board.
 */
export function portalSampleRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const items = await withClient(ctx, req, (tx, client) => listClientBoards(tx, client));
    res.json({ items } satisfies ItemList<ClientBoardView>);
  });

  // Clients cannot use the staff /api/files routes; these serve only photos of boards they may see,
  // streamed after the transaction has ended, so a slow phone holds no database connection.
  router.get('/photos/:photoId/thumbnail', async (req, res) => {
    const file = await withClient(ctx, req, (tx, client) => clientBoardPhotoFile(tx, client, parse(photoParam, req.params).photoId));
    const body = file.thumbnailKey ? await ctx.storage.get(file.thumbnailKey) : null;
    if (!body) throw notFound('photo');
    // Shown inline: the thumbnail is WebP that sharp wrote itself, not bytes from the uploader.
    res.set({ 'content-type': 'image/webp', 'content-disposition': 'inline; filename="sample-board.webp"' });
    await send(ctx, res, body);
  });

  // The full photo, to look closely at the finish: always an attachment, as the staff route.
  router.get('/photos/:photoId', async (req, res) => {
    const file = await withClient(ctx, req, (tx, client) => clientBoardPhotoFile(tx, client, parse(photoParam, req.params).photoId));
    const body = await ctx.storage.get(file.storageKey);
    if (!body) throw notFound('photo');
    res.attachment(file.originalName);
    res.set({ 'content-type': file.contentType, 'content-length': String(file.sizeBytes) });
    await send(ctx, res, body);
  });

  router.get('/:id', async (req, res) => {
    res.json(
      (await withClient(ctx, req, (tx, client) => getClientBoard(tx, client, parse(boardParam, req.params).id))) satisfies ClientBoardView,
    );
  });

  router.post('/:id/approve', async (req, res) => {
    res.json(
      await withClient(ctx, req, (tx, client) =>
        decideBoard(tx, ctx, client, parse(boardParam, req.params).id, 'approved', () => {
          parse(noBody, req.body ?? {});
          return '';
        }),
      ),
    );
  });

  router.post('/:id/request-changes', async (req, res) => {
    res.json(
      await withClient(ctx, req, (tx, client) =>
        decideBoard(
          tx,
          ctx,
          client,
          parse(boardParam, req.params).id,
          'changes_requested',
          () => parse(sampleChangeRequest, req.body).comment,
        ),
      ),
    );
  });

  return router;
}

/** A photo's bytes to a client: private, never sniffed, never run as markup in our origin. */
async function send(ctx: AppContext, res: Response, body: Readable): Promise<void> {
  res.set({
    'cache-control': 'private, max-age=3600',
    'x-content-type-options': 'nosniff',
    'content-security-policy': "default-src 'none'; sandbox",
  });
  try {
    await pipeline(body, res);
  } catch (err) {
    ctx.logger.warn({ err }, 'board photo interrupted');
    res.destroy();
  }
}
