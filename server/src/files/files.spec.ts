import { withTenant } from '@layerbook/db';
import sharp from 'sharp';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { checkImage } from './image';
import { insertImageRow, storeImageThen } from './stored-files';
import { HTML, jpegImage, jpegWithGps, noisyPng, pngImage, SVG, TEXT } from './test-images';
import { storedFor } from './test-storage';

// A small per-file limit so the oversized case needs only a few hundred kilobytes.
const MAX_BYTES = 200_000;

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer({ FILE_MAX_BYTES: String(MAX_BYTES) });
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

async function makeRoom(o: Owner): Promise<string> {
  const client = await o.agent.post('/api/clients').set('x-csrf-token', o.csrf()).send({ kind: 'homeowner', name: 'Ottoline Marsh' });
  const site = await o.agent
    .post(`/api/clients/${client.body.id}/sites`)
    .set('x-csrf-token', o.csrf())
    .send({ addressLine1: '9 Quarry Lane', city: 'Hobb' });
  const room = await o.agent.post(`/api/takeoff/sites/${site.body.id}/rooms`).set('x-csrf-token', o.csrf()).send({ name: 'Library' });
  return room.body.id;
}

const upload = (o: Owner, roomId: string, bytes: Buffer, filename: string, contentType = 'image/jpeg') =>
  o.agent.post(`/api/takeoff/rooms/${roomId}/photos`).set('x-csrf-token', o.csrf()).attach('file', bytes, { filename, contentType });

describe('files: upload, storage and download', () => {
  it('stores a PNG and a JPEG under server keys, with WebP thumbnails, and sends them back as attachments with nosniff', async () => {
    const o = await signUpFirm(t.app, 'Files Plaster');
    const roomId = await makeRoom(o);
    const png = await pngImage();
    const pngRes = await upload(o, roomId, png, '../../evil name.png', 'image/png');
    expect(pngRes.status).toBe(201);
    expect(pngRes.body).toMatchObject({ width: 64, height: 48, caption: '', originalName: 'evil name.png' });
    const jpegRes = await upload(o, roomId, await jpegImage(), 'ceiling.jpg');
    expect(jpegRes.status).toBe(201);

    const stored = await storedFor(t.ctx, o.firmId);
    expect(stored.rows).toBe(2);
    const fileIds = [pngRes.body.fileId, jpegRes.body.fileId].sort();
    // `<tenant>/<uuid>` and its thumbnail: never the uploader's name.
    expect(stored.keys).toEqual(fileIds.flatMap((id) => [`${o.firmId}/${id}`, `${o.firmId}/${id}-thumb.webp`]).sort());

    const download = await o.agent.get(pngRes.body.downloadUrl);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('image/png');
    expect(download.headers['content-disposition']).toBe('attachment; filename="evil name.png"');
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    // Re-encoded without metadata, losslessly: the same pixels come back.
    expect(
      await sharp(download.body as Buffer)
        .raw()
        .toBuffer(),
    ).toEqual(await sharp(png).raw().toBuffer());

    const jpegDownload = await o.agent.get(jpegRes.body.downloadUrl);
    expect(jpegDownload.headers['content-type']).toBe('image/jpeg');
    expect(jpegDownload.headers['content-disposition']).toMatch(/^attachment/);

    const thumb = await o.agent.get(pngRes.body.thumbnailUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['x-content-type-options']).toBe('nosniff');
    expect((await sharp(thumb.body as Buffer).metadata()).format).toBe('webp');
  });

  it('stores a camera photo without its EXIF or GPS position', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const res = await upload(o, roomId, await jpegWithGps(), 'on-site.jpg');
    expect(res.status).toBe(201);
    const download = await o.agent.get(res.body.downloadUrl);
    expect(download.status).toBe(200);
    const stored = download.body as Buffer;
    const meta = await sharp(stored).metadata();
    expect(meta.format).toBe('jpeg');
    expect(meta.exif).toBeUndefined();
    expect(stored.includes(Buffer.from('Trowelcam'))).toBe(false);
  });

  it.each([
    ['a text file renamed .jpg', TEXT, 'notes.jpg', 'image/jpeg', 400],
    ['an SVG', SVG, 'drawing.svg', 'image/svg+xml', 400],
    ['an HTML file', HTML, 'page.html', 'text/html', 400],
    ['an HTML file claiming to be a PNG', HTML, 'page.png', 'image/png', 400],
  ])('refuses %s with a 400 naming `file` and stores nothing', async (_what, bytes, filename, contentType, status) => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const res = await upload(o, roomId, bytes, filename, contentType);
    expect(res.status).toBe(status);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(['file']);
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('refuses a file over the size limit with 413 naming `file` and stores nothing', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const big = await noisyPng(400, 400);
    expect(big.length).toBeGreaterThan(MAX_BYTES);
    const res = await upload(o, roomId, big, 'huge.png', 'image/png');
    expect(res.status).toBe(413);
    expect(res.body.errors).toEqual([{ field: 'file', message: 'The file is larger than 0.2 MB. Upload a smaller photo.' }]);
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('refuses a request without a file, or with two, naming `file`', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const none = await o.agent.post(`/api/takeoff/rooms/${roomId}/photos`).set('x-csrf-token', o.csrf()).field('caption', 'Nothing');
    expect(none.status).toBe(400);
    expect(none.body.errors[0].field).toBe('file');
    const png = await pngImage();
    const two = await o.agent
      .post(`/api/takeoff/rooms/${roomId}/photos`)
      .set('x-csrf-token', o.csrf())
      .attach('file', png, 'a.png')
      .attach('file', png, 'b.png');
    expect(two.status).toBe(400);
    expect(two.body.errors[0].field).toBe('file');
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('refuses a bad caption before anything is stored', async () => {
    const o = await signUpFirm(t.app);
    const roomId = await makeRoom(o);
    const res = await o.agent
      .post(`/api/takeoff/rooms/${roomId}/photos`)
      .set('x-csrf-token', o.csrf())
      .attach('file', await pngImage(), 'a.png')
      .field('caption', 'x'.repeat(201));
    expect(res.status).toBe(400);
    expect(res.body.errors[0].field).toBe('caption');
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });

  it('deletes the stored objects again when the transaction that records them fails', async () => {
    const o = await signUpFirm(t.app);
    const image = await checkImage({ buffer: await pngImage(), originalname: 'a.png' });
    let keys: string[] = [];
    const failing = storeImageThen(t.ctx.storage, t.ctx.logger, o.firmId, image, async (stored) => {
      keys = [stored.storageKey, stored.thumbnailKey];
      expect((await storedFor(t.ctx, o.firmId)).keys).toEqual([...keys].sort());
      // Stands in for a failed insert or commit.
      await withTenant(t.ctx.pool, o.firmId, (tx) => insertImageRow(tx, stored, 'room_photo', '00000000-0000-4000-8000-000000000000'));
    });
    await expect(failing).rejects.toThrow();
    expect(keys).toHaveLength(2);
    expect(await storedFor(t.ctx, o.firmId)).toEqual({ keys: [], rows: 0 });
  });
});
