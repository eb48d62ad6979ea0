import { withTenant } from '@layerbook/db';
import type { FirmSettings } from '@layerbook/contracts';
import { joinAs } from '../proposals/proposal-fixtures';
import { HTML, pngImage, TEXT } from '../files/test-images';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { issuedInvoice } from '../payments/refund-fixtures';
import { binary } from '../testing/binary';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;
const upload = (o: Owner, bytes: Buffer, filename: string) =>
  o.agent.post('/api/firm/logo').set('x-csrf-token', o.csrf()).attach('file', bytes, { filename });
const profileOf = (firm: FirmSettings) => {
  const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = firm;
  return profile;
};
const fileIdOf = (url: string | null) => url?.split('/').pop() ?? '';
const objectExists = async (key: string) => {
  const body = await t.ctx.storage.get(key);
  body?.destroy();
  return body !== null;
};

describe('the firm tax id', () => {
  it('is saved with the profile, kept when not sent, and refused over 40 characters naming taxId', async () => {
    const o = await signUpFirm(t.app, 'Tax Line Plaster');
    const firm = (await o.agent.get('/api/firm')).body as FirmSettings;
    expect(firm.taxId).toBe('');
    expect(firm.logoUrl).toBeNull();
    const saved = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...profileOf(firm), taxId: ' EIN 12-3456789 ' });
    expect(saved.status).toBe(200);
    expect(saved.body.taxId).toBe('EIN 12-3456789');
    const { taxId: _taxId, ...withoutTaxId } = profileOf(saved.body as FirmSettings);
    const kept = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...withoutTaxId, phone: '+1 802 555 0100' });
    expect(kept.status).toBe(200);
    expect(kept.body.taxId).toBe('EIN 12-3456789');
    const long = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...profileOf(firm), taxId: 'X'.repeat(41) });
    expect(long.status).toBe(400);
    expect(long.body.errors.map((e: { field: string }) => e.field)).toEqual(['taxId']);
    expect((await o.agent.get('/api/firm')).body.taxId).toBe('EIN 12-3456789');
  });
});

describe('the firm logo', () => {
  it('uploads, replaces (the old objects deleted), and removes; the URL serves the image to the firm only', async () => {
    const o = await signUpFirm(t.app, 'Logo Lane Plaster');
    const first = await upload(o, await pngImage(300, 120), 'logo.png');
    expect(first.status).toBe(200);
    const firstId = fileIdOf(first.body.logoUrl);
    expect(first.body.logoUrl).toBe(`/api/files/${firstId}`);
    expect((await o.agent.get('/api/firm')).body.logoUrl).toBe(first.body.logoUrl);
    const image = await o.agent.get(first.body.logoUrl as string);
    expect(image.status).toBe(200);
    expect(image.headers['content-type']).toBe('image/png');
    expect(await objectExists(`${o.firmId}/${firstId}`)).toBe(true);

    const other = await signUpFirm(t.app, 'Other Logo Studio');
    expect((await other.agent.get(first.body.logoUrl as string)).status).toBe(404);

    const second = await upload(o, await pngImage(200, 80), 'new-logo.png');
    expect(second.status).toBe(200);
    const secondId = fileIdOf(second.body.logoUrl);
    expect(secondId).not.toBe(firstId);
    expect((await o.agent.get(`/api/files/${firstId}`)).status).toBe(404);
    expect(await objectExists(`${o.firmId}/${firstId}`)).toBe(false);
    expect(await objectExists(`${o.firmId}/${firstId}-thumb.webp`)).toBe(false);
    const purposes = await withTenant(t.ctx.pool, o.firmId, async (tx) => {
      const { rows } = await tx.client.query<{ purpose: string }>(`select purpose from files where tenant_id = $1`, [tx.tenantId]);
      return rows.map((r) => r.purpose);
    });
    expect(purposes).toEqual(['firm-logo']);

    const removed = await o.agent.delete('/api/firm/logo').set('x-csrf-token', o.csrf());
    expect(removed.status).toBe(200);
    expect(removed.body.logoUrl).toBeNull();
    expect(await objectExists(`${o.firmId}/${secondId}`)).toBe(false);
    expect((await o.agent.delete('/api/firm/logo').set('x-csrf-token', o.csrf())).status).toBe(200);
  });

  it('refuses a file that is not an image with a 400 naming file, and keeps the logo', async () => {
    const o = await signUpFirm(t.app, 'Careful Logo Plaster');
    const kept = (await upload(o, await pngImage(), 'logo.png')).body.logoUrl;
    for (const [bytes, name] of [
      [TEXT, 'logo.png'],
      [HTML, 'logo.html'],
    ] as const) {
      const res = await upload(o, bytes, name);
      expect(res.status).toBe(400);
      expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(['file']);
    }
    const none = await o.agent.post('/api/firm/logo').set('x-csrf-token', o.csrf()).field('caption', 'x');
    expect(none.status).toBe(400);
    expect(none.body.errors[0].field).toBe('file');
    expect((await o.agent.get('/api/firm')).body.logoUrl).toBe(kept);
  });

  it('is the owner’s: office and crew get 403 before the file is read', async () => {
    const o = await signUpFirm(t.app, 'Owner Logo Plaster');
    for (const role of ['office', 'crew'] as const) {
      const m = await joinAs(t, o, role);
      const res = await m.agent.post('/api/firm/logo').set('x-csrf-token', m.csrf()).attach('file', TEXT, { filename: 'x.txt' });
      expect([role, res.status]).toEqual([role, 403]);
      expect([role, (await m.agent.delete('/api/firm/logo').set('x-csrf-token', m.csrf())).status]).toEqual([role, 403]);
    }
  });
});

describe('a logo already printed on an issued invoice', () => {
  const pdf = async (agent: Owner['agent'], url: string) => {
    const res = await binary(agent, url);
    expect(res.status).toBe(200);
    return res.body as Buffer;
  };
  const images = (bytes: Buffer) => (bytes.toString('latin1').match(/\/Subtype\s*\/Image/g) ?? []).length;

  it('stays on that invoice when the firm replaces or removes its logo (an issued document never changes)', async () => {
    const f = await issuedInvoice(t, 'Rebrand Plaster');
    const url = `/api/invoices/${f.invoiceId}/pdf`;
    expect(images(await pdf(f.agent, url))).toBe(1);
    const replaced = await f.agent
      .post('/api/firm/logo')
      .set('x-csrf-token', f.csrf())
      .attach('file', await pngImage(200, 80), { filename: 'new-logo.png' });
    expect(replaced.status).toBe(200);
    expect(images(await pdf(f.agent, url))).toBe(1);
    expect((await f.agent.delete('/api/firm/logo').set('x-csrf-token', f.csrf())).status).toBe(200);
    expect(images(await pdf(f.agent, url))).toBe(1);
  });
});
