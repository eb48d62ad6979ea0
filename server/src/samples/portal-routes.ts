import { pipeline } from 'node:stream/promises';
import { sampleChangeRequest, uuid, type ClientBoardView, type ItemList } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import { notFound } from '../http/problem';
import { parse } from '../http/validate';
import { clientPhotoThumbnailKey, decideBoard, getClientBoard, listClientBoards } from './client-boards';

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

  // Clients cannot use the staff /api/files routes; this serves only thumbnails of boards they may see.
  router.get('/photos/:photoId/thumbnail', async (req, res) => {
    const key = await withClient(ctx, req, (tx, client) => clientPhotoThumbnailKey(tx, client, parse(photoParam, req.params).photoId));
    // Streamed after the transaction has ended, so a slow phone holds no database connection.
    const body = await ctx.storage.get(key);
    if (!body) throw notFound('photo');
    res.set({
      'content-type': 'image/webp',
      'content-disposition': 'inline; filename="sample-board.webp"',
      'cache-control': 'private, max-age=3600',
      'x-content-type-options': 'nosniff',
      'content-security-policy': "default-src 'none'; sandbox",
    });
    try {
      await pipeline(body, res);
    } catch (err) {
      ctx.logger.warn({ err }, 'board thumbnail interrupted');
      res.destroy();
    }
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
