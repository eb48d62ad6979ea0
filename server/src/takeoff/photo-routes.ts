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
import { addRoomPhoto, deleteRoomPhoto, findPhotoRoom, listRoomPhotos, roomPhotoFields } from './photos';

const roomParam = z.strictObject({ id: uuid('room id') });
const photoParam = z.strictObject({ id: uuid('photo id') });

/**
 * Room photos. Crew view and also upload (progress photos are taken on site); owner and office
 * delete. Mounted under /api/takeoff by takeoffRoutes.
 */
export function roomPhotoRoutes(ctx: AppContext): Router {
  const router = Router();
  const receiveFile = receiveOneFile(ctx.config, 'file');

  router.get('/rooms/:id/photos', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => listRoomPhotos(tx, parse(roomParam, req.params).id)));
  });

  router.post(
    '/rooms/:id/photos',
    // Role and room are checked before the body is read: a refused upload costs neither memory nor a
    // decode, and a wrong role hears 403 before any 400 about the file.
    async (req, _res, next) => {
      await withStaff(ctx, req, 'crew', (tx) => findPhotoRoom(tx, parse(roomParam, req.params).id));
      next();
    },
    receiveFile,
    async (req, res) => {
      const fields = parse(roomPhotoFields, req.body);
      // Decoded and thumbnailed outside any transaction: that takes a moment for a phone photo and
      // should not hold a database connection.
      const image = await checkImage(req.file, 'file');
      const tenantId = req.user?.tenantId;
      if (!tenantId) throw unauthorized();
      const photo = await storeImageThen(ctx.storage, ctx.logger, tenantId, image, (stored) =>
        withStaff(ctx, req, 'crew', (tx, staff) => addRoomPhoto(tx, { userId: staff.id }, parse(roomParam, req.params).id, fields, stored)),
      );
      res.status(201).json(photo);
    },
  );

  router.delete('/photos/:id', async (req, res) => {
    const keys = await withStaff(ctx, req, 'office', (tx, staff) => deleteRoomPhoto(tx, { userId: staff.id }, parse(photoParam, req.params).id));
    // Only after the commit: a rolled-back delete must still find its bytes.
    await discardObjects(ctx.storage, ctx.logger, keys);
    res.status(204).end();
  });

  return router;
}
