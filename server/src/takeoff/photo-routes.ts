import { uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { mountPhotoRoutes } from '../files/photo-routes';
import { parse } from '../http/validate';
import { addRoomPhoto, deleteRoomPhoto, findPhotoRoom, listRoomPhotos } from './photos';

const roomParam = z.strictObject({ id: uuid('room id') });
const photoParam = z.strictObject({ id: uuid('photo id') });

/**
 * Room photos. Crew view and also upload (progress photos are taken on site); owner and office
 * delete. Mounted under /api/takeoff by takeoffRoutes.
 */
export function roomPhotoRoutes(ctx: AppContext): Router {
  const router = Router();
  mountPhotoRoutes(router, ctx, {
    paths: { owner: '/rooms/:id/photos', photo: '/photos/:id' },
    ownerId: (req) => parse(roomParam, req.params).id,
    photoId: (req) => parse(photoParam, req.params).id,
    roles: { read: 'crew', upload: 'crew', delete: 'office' },
    findOwner: findPhotoRoom,
    list: listRoomPhotos,
    add: addRoomPhoto,
    remove: deleteRoomPhoto,
  });
  return router;
}
