import type { JobPhotoFields, JobPhotoView, JobStatus } from '@layerbook/contracts';
import { and, eq, jobPhotos, jobs, jobWorkItems, TenantTx } from '@layerbook/db';
import { addPhoto, deletePhoto, listPhotos, type PhotoAlbum } from '../../files/photos';
import type { ObjectKeys, StoredImage } from '../../files/stored-files';
import type { Actor } from '../../http/actor';
import { badRequest, conflict, forbidden, notFound } from '../../http/problem';

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
export async function findPhotoJob(tx: TenantTx, jobId: string): Promise<{ id: string; title: string; status: JobStatus }> {
  const job = (
    await tx.db
      .select({ id: jobs.id, title: jobs.title, status: jobs.status })
      .from(jobs)
      .where(and(eq(jobs.tenantId, tx.tenantId), eq(jobs.id, jobId)))
  )[0];
  if (!job) throw notFound('job');
  return job;
}

/** The job a photo is added to: 404 as findPhotoJob, 409 once it is cancelled (its record is closed). */
export async function findUploadJob(tx: TenantTx, jobId: string): Promise<{ id: string; title: string }> {
  const job = await findPhotoJob(tx, jobId);
  if (job.status === 'cancelled') throw conflict('This job is cancelled: no more photos can be added to it.');
  return job;
}

/** The one rule for deleting a progress photo: owner and office any, a crew member only one they took. */
export function mayDeletePhoto(actor: Actor, createdBy: string | null): boolean {
  return actor.kind !== 'staff' || actor.role !== 'crew' || (createdBy !== null && createdBy === actor.userId);
}

/** The job's photos in the order they were taken, each with the work item it shows and whether `actor` may delete it. */
export async function listJobPhotos(tx: TenantTx, actor: Actor, jobId: string): Promise<JobPhotoView[]> {
  await findPhotoJob(tx, jobId);
  const views = (await listPhotos(tx, JOB_PHOTOS, [jobId])).get(jobId) ?? [];
  const links = await tx.db
    .select({ id: jobPhotos.id, workItemId: jobPhotos.workItemId, createdBy: jobPhotos.createdBy })
    .from(jobPhotos)
    .where(and(eq(jobPhotos.tenantId, tx.tenantId), eq(jobPhotos.jobId, jobId)));
  const linkOf = new Map(links.map((l) => [l.id, l]));
  return views.map((view) => {
    const link = linkOf.get(view.id);
    return { ...view, workItemId: link?.workItemId ?? null, canDelete: mayDeletePhoto(actor, link?.createdBy ?? null) };
  });
}

export async function addJobPhoto(
  tx: TenantTx,
  actor: Actor,
  jobId: string,
  fields: JobPhotoFields,
  stored: StoredImage,
): Promise<JobPhotoView> {
  // Checked again after the upload: the job may have been cancelled while the photo was on its way.
  const job = await findUploadJob(tx, jobId);
  const workItemId = fields.workItemId ?? null;
  if (workItemId !== null) {
    const item = await tx.db
      .select({ id: jobWorkItems.id })
      .from(jobWorkItems)
      .where(and(eq(jobWorkItems.tenantId, tx.tenantId), eq(jobWorkItems.jobId, jobId), eq(jobWorkItems.id, workItemId)));
    if (!item[0]) throw badRequest([{ field: 'workItemId', message: 'No such layer on this job.' }]);
  }
  const createdBy = actor.kind === 'staff' ? actor.userId : null;
  const album = jobAlbum({ workItemId, createdBy });
  const about = { jobTitle: job.title, workItemId };
  const view = await addPhoto(tx, album, actor, { id: jobId, about }, fields.caption ?? '', stored);
  return { ...view, workItemId, canDelete: mayDeletePhoto(actor, createdBy) };
}

/**
 * Deletes a photo of this job (404 for a photo of another job), as mayDeletePhoto allows (403 otherwise).
 */
export function deleteJobPhoto(tx: TenantTx, actor: Actor, jobId: string, photoId: string): Promise<ObjectKeys> {
  return deletePhoto(tx, JOB_PHOTOS, actor, photoId, async (ownerId) => {
    if (ownerId !== jobId) throw notFound('photo');
    const row = await tx.db
      .select({ createdBy: jobPhotos.createdBy })
      .from(jobPhotos)
      .where(and(eq(jobPhotos.tenantId, tx.tenantId), eq(jobPhotos.id, photoId)));
    if (!mayDeletePhoto(actor, row[0]?.createdBy ?? null)) throw forbidden('Only the office or the person who took a photo may delete it.');
  });
}
