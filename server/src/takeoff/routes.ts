import {
  moveInput,
  roomInput,
  roomUpdate,
  surfaceInput,
  surfaceUpdate,
  uuid,
  type RoomView,
  type SurfaceView,
  type TakeoffView,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { discardObjects } from '../files/stored-files';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { roomPhotoRoutes } from './photo-routes';
import {
  addRoom,
  addSurface,
  deleteRoom,
  deleteSurface,
  duplicateSurface,
  getTakeoff,
  moveRoom,
  moveSurface,
  updateRoom,
  updateSurface,
} from './service';

const siteParam = z.strictObject({ siteId: uuid('site id') });
const idParam = (label: string) => z.strictObject({ id: uuid(label) });
const roomParam = idParam('room id');
const surfaceParam = idParam('surface id');

/**
 * Site takeoff: rooms and their measured surfaces. Crew read it (the job sheet needs the rooms);
 * owner and office change it. Bodies are parsed inside withStaff so a wrong role hears 403 first.
 */
export function takeoffRoutes(ctx: AppContext): Router {
  const router = Router();
  router.use(roomPhotoRoutes(ctx));

  router.get('/sites/:siteId', async (req, res) => {
    const view = await withStaff(ctx, req, 'crew', (tx) => getTakeoff(tx, parse(siteParam, req.params).siteId));
    res.json(view satisfies TakeoffView);
  });

  router.post('/sites/:siteId/rooms', async (req, res) => {
    const room = await withStaff(ctx, req, 'office', (tx, staff) =>
      addRoom(tx, staffActor(staff), parse(siteParam, req.params).siteId, parse(roomInput, req.body)),
    );
    res.status(201).json(room satisfies RoomView);
  });

  router.patch('/rooms/:id', async (req, res) => {
    const room = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateRoom(tx, staffActor(staff), parse(roomParam, req.params).id, parseChanges(roomUpdate, req.body), ctx.now()),
    );
    res.json(room satisfies RoomView);
  });

  router.delete('/rooms/:id', async (req, res) => {
    const photoKeys = await withStaff(ctx, req, 'office', (tx, staff) =>
      deleteRoom(tx, staffActor(staff), parse(roomParam, req.params).id),
    );
    await discardObjects(ctx.storage, ctx.logger, photoKeys);
    res.status(204).end();
  });

  router.post('/rooms/:id/move', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx) => moveRoom(tx, parse(roomParam, req.params).id, parse(moveInput, req.body)));
    res.json(view satisfies TakeoffView);
  });

  router.post('/rooms/:id/surfaces', async (req, res) => {
    const surface = await withStaff(ctx, req, 'office', (tx, staff) =>
      addSurface(tx, staffActor(staff), parse(roomParam, req.params).id, parse(surfaceInput, req.body)),
    );
    res.status(201).json(surface satisfies SurfaceView);
  });

  router.patch('/surfaces/:id', async (req, res) => {
    const surface = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateSurface(tx, staffActor(staff), parse(surfaceParam, req.params).id, parseChanges(surfaceUpdate, req.body), ctx.now()),
    );
    res.json(surface satisfies SurfaceView);
  });

  router.delete('/surfaces/:id', async (req, res) => {
    await withStaff(ctx, req, 'office', (tx, staff) => deleteSurface(tx, staffActor(staff), parse(surfaceParam, req.params).id));
    res.status(204).end();
  });

  router.post('/surfaces/:id/duplicate', async (req, res) => {
    const copy = await withStaff(ctx, req, 'office', (tx, staff) =>
      duplicateSurface(tx, staffActor(staff), parse(surfaceParam, req.params).id),
    );
    res.status(201).json(copy satisfies SurfaceView);
  });

  router.post('/surfaces/:id/move', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx) =>
      moveSurface(tx, parse(surfaceParam, req.params).id, parse(moveInput, req.body)),
    );
    res.json(view satisfies TakeoffView);
  });

  return router;
}
