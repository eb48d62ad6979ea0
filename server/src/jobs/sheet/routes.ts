import {
  jobPhotoFields,
  uuid,
  type ItemList,
  type JobPhotoFields,
  type JobPhotoView,
  type JobSheet,
  type JobSheetSummary,
} from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { mountPhotoRoutes } from '../../files/photo-routes';
import { staffActor, type Actor } from '../../http/actor';
import { withStaff } from '../../http/guards';
import { parse } from '../../http/validate';
import { ensureJobWork, loadWorkItems } from '../../billing/work-items';
import { buildSheet } from './build-sheet';
import { addJobPhoto, deleteJobPhoto, findUploadJob, listJobPhotos } from './job-photos';
import { listSheets } from './list-sheets';
import { loadSheetSource } from './load-sheet';

const idParam = z.strictObject({ id: uuid('job id') });
const photoParams = z.strictObject({ id: uuid('job id'), photoId: uuid('photo id') });
/** the job's id on either photo path */
const jobOfPath = z.looseObject({ id: uuid('job id') });

async function jobSheet(tx: TenantTx, actor: Actor, jobId: string): Promise<JobSheet> {
  const src = await loadSheetSource(tx, jobId);
  // A job accepted before work items existed gets them here, as the progress view does.
  await ensureJobWork(tx, jobId);
  return buildSheet(src, await loadWorkItems(tx, jobId), await listJobPhotos(tx, actor, jobId));
}

/**
 * The crew's side of a job (crew, office, owner), with no money in any answer: `/sheets` (the jobs
 * under way), `/:id/sheet`, and the job's progress photos (`/:id/photos`; crew take them on site,
 * owner and office delete any, a crew member their own; a cancelled job takes no more). Mounted by jobRoutes before `/:id`.
 */
export function sheetRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/sheets', async (req, res) => {
    res.json((await withStaff(ctx, req, 'crew', (tx) => listSheets(tx))) satisfies ItemList<JobSheetSummary>);
  });

  router.get('/:id/sheet', async (req, res) => {
    res.json(
      (await withStaff(ctx, req, 'crew', (tx, staff) => jobSheet(tx, staffActor(staff), parse(idParam, req.params).id))) satisfies JobSheet,
    );
  });

  mountPhotoRoutes<JobPhotoView, JobPhotoFields>(router, ctx, {
    paths: { owner: '/:id/photos', photo: '/:id/photos/:photoId' },
    ownerId: (req) => parse(jobOfPath, req.params).id,
    photoId: (req) => parse(photoParams, req.params).photoId,
    roles: { read: 'crew', upload: 'crew', delete: 'crew' },
    // a cancelled job takes no more photos (409 before the upload's body is read)
    findOwner: findUploadJob,
    list: (tx, jobId, actor) => listJobPhotos(tx, actor, jobId),
    add: (tx, actor, jobId, _caption, stored, fields) => addJobPhoto(tx, actor, jobId, fields, stored),
    remove: (tx, actor, photoId, jobId) => deleteJobPhoto(tx, actor, jobId ?? '', photoId),
    fields: jobPhotoFields,
    deleteNamesOwner: true,
  });

  return router;
}
