import { photoFields, type ItemList, type PhotoFields, type PhotoView, type StaffRole } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import type { Request, Router } from 'express';
import type { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor, type Actor } from '../http/actor';
import { withStaff } from '../http/guards';
import { unauthorized } from '../http/problem';
import { parse } from '../http/validate';
import { checkImage } from './image';
import { discardObjects, storeImageThen, type ObjectKeys, type StoredImage } from './stored-files';
import { receiveOneFile } from './upload';

/** What one kind of photo needs from its area; the HTTP steps around it are the same for all. */
export interface PhotoRoutes<V extends PhotoView, F extends PhotoFields = PhotoFields> {
  /** e.g. '/rooms/:id/photos' (list and upload) and '/photos/:id' (delete) */
  readonly paths: { readonly owner: string; readonly photo: string };
  /** the record's id from the route (400 naming it when malformed) */
  readonly ownerId: (req: Request) => string;
  /** the photo's id from the route */
  readonly photoId: (req: Request) => string;
  /** who may do what: crew take photos on site; deleting is for owner and office */
  readonly roles: { readonly read: StaffRole; readonly upload: StaffRole; readonly delete: StaffRole };
  /** 404 unless the record is there; run before the upload's body is read */
  readonly findOwner: (tx: TenantTx, ownerId: string) => Promise<unknown>;
  /** `actor`: the reader, for an album whose photos say what the reader may do with them */
  readonly list: (tx: TenantTx, ownerId: string, actor: Actor) => Promise<V[]>;
  readonly add: (tx: TenantTx, actor: Actor, ownerId: string, caption: string, stored: StoredImage, fields: F) => Promise<V>;
  /** `ownerId` when the delete path names the record too (`/jobs/:id/photos/:photoId`) */
  readonly remove: (tx: TenantTx, actor: Actor, photoId: string, ownerId: string | null) => Promise<ObjectKeys>;
  /** the text fields beside the file, when an album takes more than a caption (default `photoFields`) */
  readonly fields?: z.ZodType<F>;
  /** the delete path names the record: its id is checked and handed to `remove` */
  readonly deleteNamesOwner?: boolean;
}

/**
 * Mounts list (`{ items }`), upload and delete for one kind of photo. Upload: role and record are
 * checked before the body is read (a refused upload costs neither memory nor a decode, and a wrong
 * role hears 403 before any 400 about the file); the image is decoded and thumbnailed outside any
 * transaction; its objects are stored, then the rows written, and the objects removed again if
 * that fails. Delete: rows in the transaction, objects after the commit.
 */
export function mountPhotoRoutes<V extends PhotoView, F extends PhotoFields = PhotoFields>(
  router: Router,
  ctx: AppContext,
  photos: PhotoRoutes<V, F>,
): void {
  const receiveFile = receiveOneFile(ctx.config, 'file');

  router.get(photos.paths.owner, async (req, res) => {
    const items = await withStaff(ctx, req, photos.roles.read, (tx, staff) => photos.list(tx, photos.ownerId(req), staffActor(staff)));
    res.json({ items } satisfies ItemList<V>);
  });

  router.post(
    photos.paths.owner,
    async (req, _res, next) => {
      await withStaff(ctx, req, photos.roles.upload, (tx) => photos.findOwner(tx, photos.ownerId(req)));
      next();
    },
    receiveFile,
    async (req, res) => {
      const fields = parse(photos.fields ?? (photoFields as unknown as z.ZodType<F>), req.body);
      const image = await checkImage(req.file, 'file');
      const tenantId = req.user?.tenantId;
      if (!tenantId) throw unauthorized();
      const photo: V = await storeImageThen(ctx.storage, ctx.logger, tenantId, image, (stored) =>
        withStaff(ctx, req, photos.roles.upload, (tx, staff) =>
          photos.add(tx, staffActor(staff), photos.ownerId(req), fields.caption ?? '', stored, fields),
        ),
      );
      res.status(201).json(photo);
    },
  );

  router.delete(photos.paths.photo, async (req, res) => {
    const keys = await withStaff(ctx, req, photos.roles.delete, (tx, staff) =>
      photos.remove(tx, staffActor(staff), photos.photoId(req), photos.deleteNamesOwner === true ? photos.ownerId(req) : null),
    );
    await discardObjects(ctx.storage, ctx.logger, keys);
    res.status(204).end();
  });
}
