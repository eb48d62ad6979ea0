import type { JobPhotoFields, JobPhotoView } from '@layerbook/contracts';
import { and, eq, jobPhotos, jobs, jobWorkItems, TenantTx } from '@layerbook/db';
import { addPhoto, deletePhoto, listPhotos, type PhotoAlbum } from '../../files/photos';
import type { ObjectKeys, StoredImage } from '../../files/stored-files';
import type { Actor } from '../../http/actor';
import { badRequest, forbidden, notFound } from '../../http/problem';

const COLUMNS: PhotoAlbum['columns'] = {
  id: jobPhotos.id,
  tenantId: jobPhotos.tenantId,
  ownerId: jobPhotos.jobId,
  fileId: jobPhotos.fileId,
  caption: jobPhotos.caption,
  createdAt: jobPhotos.createdAt,
};

/**
 * Progress photos, kept with the job (files/photos.ts does the rest). A new photo also records the
 * work item it shows and who took it, so the album for an upload is made per upload.
 */
function jobAlbum(
  extra: { readonly workItemId: string | null; readonly createdBy: string | null } = { workItemId: null, createdBy: null },
) {
  const album: PhotoAlbum = {
    table: jobPhotos,
    columns: COLUMNS,
    link: async (tx, row) =>
      (
        await tx.db
          .insert(jobPhotos)
          .values({ tenantId: tx.tenantId, jobId: row.ownerId, fileId: row.fileId, caption: row.caption, ...extra })
          .returning({ id: jobPhotos.id, createdAt: jobPhotos.createdAt })
      )[0],
    purpose: 'job_photo',
    audit: { entity: 'job_photo', area: 'jobs', ownerKey: 'jobId' },
  };
  return album;
}

export const JOB_PHOTOS: PhotoAlbum = jobAlbum();

/** The job, or the same 404 whether it never existed or belongs to another firm. */
export async function findPhotoJob(tx: TenantTx, jobId: string): Promise<{ id: string; title: string }> {
  const job = (
    await tx.db
      .select({ id: jobs.id, title: jobs.title })
      .from(jobs)
      .where(and(eq(jobs.tenantId, tx.tenantId), eq(jobs.id, jobId)))
  )[0];
  if (!job) throw notFound('job');
  return job;
}

/** The job's photos in the order they were taken, each with the work item it shows. */
export async function listJobPhotos(tx: TenantTx, jobId: string): Promise<JobPhotoView[]> {
  await findPhotoJob(tx, jobId);
  const views = (await listPhotos(tx, JOB_PHOTOS, [jobId])).get(jobId) ?? [];
  const links = await tx.db
    .select({ id: jobPhotos.id, workItemId: jobPhotos.workItemId })
    .from(jobPhotos)
    .where(and(eq(jobPhotos.tenantId, tx.tenantId), eq(jobPhotos.jobId, jobId)));
  const workItemOf = new Map(links.map((l) => [l.id, l.workItemId]));
  return views.map((view) => ({ ...view, workItemId: workItemOf.get(view.id) ?? null }));
}

export async function addJobPhoto(
  tx: TenantTx,
  actor: Actor,
  jobId: string,
  fields: JobPhotoFields,
  stored: StoredImage,
): Promise<JobPhotoView> {
  const job = await findPhotoJob(tx, jobId);
  const workItemId = fields.workItemId ?? null;
  if (workItemId !== null) {
    const item = await tx.db
      .select({ id: jobWorkItems.id })
      .from(jobWorkItems)
      .where(and(eq(jobWorkItems.tenantId, tx.tenantId), eq(jobWorkItems.jobId, jobId), eq(jobWorkItems.id, workItemId)));
    if (!item[0]) throw badRequest([{ field: 'workItemId', message: 'No such layer on this job.' }]);
  }
  const album = jobAlbum({ workItemId, createdBy: actor.kind === 'staff' ? actor.userId : null });
  const about = { jobTitle: job.title, workItemId };
  const view = await addPhoto(tx, album, actor, { id: jobId, about }, fields.caption ?? '', stored);
  return { ...view, workItemId };
}

/**
 * Deletes a photo of this job (404 for a photo of another job): owner and office may delete any,
 * a crew member only a photo they took themselves.
 */
export function deleteJobPhoto(tx: TenantTx, actor: Actor, jobId: string, photoId: string): Promise<ObjectKeys> {
  return deletePhoto(tx, JOB_PHOTOS, actor, photoId, async (ownerId) => {
    if (ownerId !== jobId) throw notFound('photo');
    if (actor.kind === 'staff' && actor.role === 'crew') {
      const row = await tx.db
        .select({ createdBy: jobPhotos.createdBy })
        .from(jobPhotos)
        .where(and(eq(jobPhotos.tenantId, tx.tenantId), eq(jobPhotos.id, photoId)));
      if (row[0]?.createdBy !== actor.userId) throw forbidden('Only the office or the person who took a photo may delete it.');
    }
  });
}
