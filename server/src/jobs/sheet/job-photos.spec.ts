import type { ItemList, JobPhotoView, JobProgressView, JobSheet } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { acceptedJob } from '../../billing/progress-fixtures';
import { jpegImage } from '../../files/test-images';
import { joinAs } from '../../proposals/proposal-fixtures';
import { startTestServer, type TestServer } from '../../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Job = Awaited<ReturnType<typeof acceptedJob>>;
type Member = Pick<Job, 'agent' | 'csrf'>;
let job: Job;
let crew: Member;
let otherCrew: Member;
let workItemId: string;
beforeAll(async () => {
  job = await acceptedJob(t, 'Progress Photo Studio');
  crew = await joinAs(t, job, 'crew');
  otherCrew = await joinAs(t, job, 'crew');
  workItemId = ((await job.agent.get(`/api/jobs/${job.job.id}/progress`)).body as JobProgressView).workItems[1].id;
});

const upload = async (who: Member, fields: Record<string, string>, jobId = job.job.id) => {
  let req = who.agent
    .post(`/api/jobs/${jobId}/photos`)
    .set('x-csrf-token', who.csrf())
    .attach('file', await jpegImage(), 'wall.jpg');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
};
const remove = (who: Member, photoId: string, jobId = job.job.id) =>
  who.agent.delete(`/api/jobs/${jobId}/photos/${photoId}`).set('x-csrf-token', who.csrf());

describe('progress photos', () => {
  it('crew add a photo with a caption and the layer it shows; the album and the sheet list it', async () => {
    const added = await upload(crew, { caption: '  Second coat, north wall ', workItemId });
    expect(added.status).toBe(201);
    const photo = added.body as JobPhotoView;
    expect(photo).toMatchObject({
      caption: 'Second coat, north wall',
      workItemId,
      canDelete: true,
      width: 64,
      height: 48,
      originalName: 'wall.jpg',
    });
    expect(photo.thumbnailUrl).toBe(`/api/files/${photo.fileId}/thumbnail`);
    const plain = await upload(crew, { caption: 'Scaffold up', workItemId: '' });
    expect(plain.status).toBe(201);
    expect((plain.body as JobPhotoView).workItemId).toBeNull();

    const list = (await crew.agent.get(`/api/jobs/${job.job.id}/photos`)).body as ItemList<JobPhotoView>;
    expect(list.items.map((p) => [p.caption, p.workItemId])).toEqual([
      ['Second coat, north wall', workItemId],
      ['Scaffold up', null],
    ]);
    const sheet = (await crew.agent.get(`/api/jobs/${job.job.id}/sheet`)).body as JobSheet;
    expect(sheet.photos).toEqual(list.items);

    const audit = await withTenant(t.ctx.pool, job.firmId, async (tx) =>
      (
        await tx.client.query<{ action: string; data: { jobId: string; workItemId: string | null } }>(
          `select action, data from audit_log where tenant_id = $1 and entity = 'job_photo' and entity_id = $2`,
          [tx.tenantId, photo.id],
        )
      ).rows.map((r) => [r.action, r.data.jobId, r.data.workItemId]),
    );
    expect(audit).toEqual([['jobs.photo_added', job.job.id, workItemId]]);
  });

  it('refuses a layer of nothing (naming workItemId), a caption too long and unknown fields', async () => {
    const unknown = await upload(crew, { workItemId: '00000000-0000-4000-8000-000000000000' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.errors).toEqual([{ field: 'workItemId', message: 'No such layer on this job.' }]);
    const malformed = await upload(crew, { workItemId: 'north wall' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.errors[0].field).toBe('workItemId');
    const long = await upload(crew, { caption: 'x'.repeat(201) });
    expect(long.status).toBe(400);
    expect(long.body.errors[0].field).toBe('caption');
    const extra = await upload(crew, { price: '10' });
    expect(extra.status).toBe(400);
  });

  it('a crew member deletes only their own photos; owner and office delete any', async () => {
    const mine = ((await upload(crew, { caption: 'Mine' })).body as JobPhotoView).id;
    const theirs = ((await upload(crew, { caption: 'Theirs' })).body as JobPhotoView).id;
    expect((await remove(otherCrew, mine)).status).toBe(403);
    expect((await remove(crew, mine)).status).toBe(204);
    expect((await remove(crew, mine)).status).toBe(404);
    expect((await remove(job, theirs)).status).toBe(204);
    const captions = ((await crew.agent.get(`/api/jobs/${job.job.id}/photos`)).body as ItemList<JobPhotoView>).items.map((p) => p.caption);
    expect(captions).not.toContain('Mine');
    expect(captions).not.toContain('Theirs');
  });

  it('says on each photo whether the reader may delete it, by the rule the delete follows', async () => {
    const mine = ((await upload(crew, { caption: 'Mine to delete' })).body as JobPhotoView).id;
    const mayDelete = async (who: Member) =>
      Object.fromEntries(
        ((await who.agent.get(`/api/jobs/${job.job.id}/photos`)).body as ItemList<JobPhotoView>).items.map((p) => [p.id, p.canDelete]),
      )[mine];
    expect([await mayDelete(crew), await mayDelete(otherCrew), await mayDelete(job)]).toEqual([true, false, true]);
    const sheet = (await otherCrew.agent.get(`/api/jobs/${job.job.id}/sheet`)).body as JobSheet;
    expect(sheet.photos.find((p) => p.id === mine)?.canDelete).toBe(false);
    expect((await remove(otherCrew, mine)).status).toBe(403);
    expect((await remove(crew, mine)).status).toBe(204);
  });

  it('takes no photos on a cancelled job (409) but still lists them', async () => {
    const closing = await acceptedJob(t, 'Cancelled Photo Studio');
    const closingCrew = await joinAs(t, closing, 'crew');
    expect((await upload(closingCrew, { caption: 'Before' }, closing.job.id)).status).toBe(201);
    const cancel = await closing.agent
      .post(`/api/jobs/${closing.job.id}/status`)
      .set('x-csrf-token', closing.csrf())
      .send({ status: 'cancelled', reason: 'Client moved' });
    expect(cancel.status).toBe(200);
    const refused = await upload(closingCrew, { caption: 'After' }, closing.job.id);
    expect([refused.status, refused.body.detail]).toEqual([409, 'This job is cancelled: no more photos can be added to it.']);
    const captions = ((await closingCrew.agent.get(`/api/jobs/${closing.job.id}/photos`)).body as ItemList<JobPhotoView>).items.map(
      (p) => p.caption,
    );
    expect(captions).toEqual(['Before']);
  });

  it('another job’s photo is not found on this job; another firm sees nothing', async () => {
    const photo = ((await upload(crew, { caption: 'Here' })).body as JobPhotoView).id;
    const other = await acceptedJob(t, 'Other Photo Studio');
    expect((await other.agent.get(`/api/jobs/${job.job.id}/photos`)).status).toBe(404);
    expect((await upload(other, { caption: 'Not mine' })).status).toBe(404);
    expect((await remove(other, photo)).status).toBe(404);
    expect((await remove(other, photo, other.job.id)).status).toBe(404);
    // the photo exists in this firm, but not on the job the path names
    const elsewhere = '00000000-0000-4000-8000-000000000001';
    expect((await remove(job, photo, elsewhere)).status).toBe(404);
    expect((await remove(crew, photo)).status).toBe(204);
  });
});
