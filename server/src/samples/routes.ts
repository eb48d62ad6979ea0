import {
  sampleBoardInput,
  sampleBoardListQuery,
  sampleBoardUpdate,
  uuid,
  type KeysetPage,
  type SampleBoardListItem,
  type SampleBoardView,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { mountPhotoRoutes } from '../files/photo-routes';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { addBoardPhoto, deleteBoardPhoto, findBoardTakingPhotos, listBoardPhotos } from './board-photos';
import { listBoards } from './board-list';
import { createBoard, getBoard, showBoard, startNextRound, updateBoard } from './boards';

const boardParam = z.strictObject({ id: uuid('sample board id') });
const photoParam = z.strictObject({ id: uuid('photo id') });

/**
 * Sample boards for staff, mounted at /api/samples. Owner and office make, edit and show boards;
 * crew read them (they reproduce the approved board on site) and may add photos.
 */
export function sampleRoutes(ctx: AppContext): Router {
  const router = Router();

  // First, so that "photos" is never read as a board id.
  mountPhotoRoutes(router, ctx, {
    paths: { owner: '/:id/photos', photo: '/photos/:id' },
    ownerId: (req) => parse(boardParam, req.params).id,
    photoId: (req) => parse(photoParam, req.params).id,
    roles: { read: 'crew', upload: 'crew', delete: 'office' },
    findOwner: findBoardTakingPhotos,
    list: listBoardPhotos,
    add: addBoardPhoto,
    remove: deleteBoardPhoto,
  });

  router.get('/', async (req, res) => {
    const page = await withStaff(ctx, req, 'crew', (tx) => listBoards(tx, parse(sampleBoardListQuery, req.query)));
    res.json(page satisfies KeysetPage<SampleBoardListItem>);
  });

  router.post('/', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) =>
      createBoard(tx, staffActor(staff), parse(sampleBoardInput, req.body), ctx.now()),
    );
    res.status(201).json(board satisfies SampleBoardView);
  });

  router.get('/:id', async (req, res) => {
    res.json((await withStaff(ctx, req, 'crew', (tx) => getBoard(tx, parse(boardParam, req.params).id))) satisfies SampleBoardView);
  });

  router.patch('/:id', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateBoard(tx, staffActor(staff), parse(boardParam, req.params).id, parseChanges(sampleBoardUpdate, req.body), ctx.now()),
    );
    res.json(board satisfies SampleBoardView);
  });

  router.post('/:id/show', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) =>
      showBoard(tx, ctx, staffActor(staff), staff.firmName, parse(boardParam, req.params).id, ctx.now()),
    );
    res.json(board satisfies SampleBoardView);
  });

  router.post('/:id/next-round', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) =>
      startNextRound(tx, staffActor(staff), parse(boardParam, req.params).id),
    );
    res.status(201).json(board satisfies SampleBoardView);
  });

  return router;
}
