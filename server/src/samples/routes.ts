import { uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { checkImage } from '../files/image';
import { discardObjects, storeImageThen } from '../files/stored-files';
import { receiveOneFile } from '../files/upload';
import { withStaff } from '../http/guards';
import { unauthorized } from '../http/problem';
import { parse } from '../http/validate';
import { addBoardPhoto, deleteBoardPhoto } from './board-photos';
import { createBoard, findBoard, getBoard, listBoards, showBoard, startNextRound, updateBoard } from './boards';
import { boardPhotoFields, sampleBoardInput, sampleBoardListQuery, sampleBoardUpdate } from './schemas';

const boardParam = z.strictObject({ id: uuid('sample board id') });
const photoParam = z.strictObject({ id: uuid('photo id') });

/**
 * Sample boards for staff, mounted at /api/samples. Owner and office make, edit and show boards;
 * crew read them (they reproduce the approved board on site) and may add photos.
 */
export function sampleRoutes(ctx: AppContext): Router {
  const router = Router();
  const receiveFile = receiveOneFile(ctx.config, 'file');

  router.get('/', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => listBoards(tx, parse(sampleBoardListQuery, req.query))));
  });

  router.post('/', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) => createBoard(tx, { userId: staff.id }, parse(sampleBoardInput, req.body), ctx.now()));
    res.status(201).json(board);
  });

  // Before '/:id' so that "photos" is never read as a board id.
  router.delete('/photos/:id', async (req, res) => {
    const keys = await withStaff(ctx, req, 'office', (tx, staff) => deleteBoardPhoto(tx, { userId: staff.id }, parse(photoParam, req.params).id));
    // Only after the commit: a rolled-back delete must still find its bytes.
    await discardObjects(ctx.storage, ctx.logger, keys);
    res.status(204).end();
  });

  router.get('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => getBoard(tx, parse(boardParam, req.params).id)));
  });

  router.patch('/:id', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'office', (tx, staff) =>
        updateBoard(tx, { userId: staff.id }, parse(boardParam, req.params).id, parse(sampleBoardUpdate, req.body), ctx.now()),
      ),
    );
  });

  router.post('/:id/show', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => showBoard(tx, ctx, { userId: staff.id, firmName: staff.firmName }, parse(boardParam, req.params).id, ctx.now())));
  });

  router.post('/:id/next-round', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx, staff) => startNextRound(tx, { userId: staff.id }, parse(boardParam, req.params).id)));
  });

  router.post(
    '/:id/photos',
    // Role and board are checked before the body is read: a refused upload costs neither memory nor
    // a decode, and a wrong role hears 403 before any 400 about the file.
    async (req, _res, next) => {
      await withStaff(ctx, req, 'crew', (tx) => findBoard(tx, parse(boardParam, req.params).id));
      next();
    },
    receiveFile,
    async (req, res) => {
      const fields = parse(boardPhotoFields, req.body);
      // Decoded and thumbnailed outside any transaction, so no database connection waits on sharp.
      const image = await checkImage(req.file, 'file');
      const tenantId = req.user?.tenantId;
      if (!tenantId) throw unauthorized();
      const photo = await storeImageThen(ctx.storage, ctx.logger, tenantId, image, (stored) =>
        withStaff(ctx, req, 'crew', (tx, staff) => addBoardPhoto(tx, { userId: staff.id }, parse(boardParam, req.params).id, fields.caption ?? '', stored)),
      );
      res.status(201).json(photo);
    },
  );

  return router;
}
