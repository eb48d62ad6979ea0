import { createHash } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import { FIRM_EXPORT_FORMAT_VERSION } from '@layerbook/contracts';
import type { Response } from 'supertest';
import { pngImage } from '../../files/test-images';
import { joinAs } from '../../proposals/proposal-fixtures';
import { DEMO, seedDemo } from '../../seed/demo';
import { newAgent, signUpFirm, startTestServer, type TestServer } from '../../testing/harness';
import { readZip } from './read-zip';
import type { ExportManifest } from './write-export';

let t: TestServer;
let zip: Map<string, Buffer>;
let manifest: ExportManifest;
let demoFirmId: string;
let response: Response;
let other: Awaited<ReturnType<typeof signUpFirm>>;
let owner: Awaited<ReturnType<typeof newAgent>>;

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
const rowsOf = (table: string) => JSON.parse(zip.get(`data/${table}.json`)!.toString('utf8')) as Record<string, unknown>[];

/** The zip as one Buffer: supertest hands the node response over as its own type, which is the IncomingMessage stream. */
const binary = (response: Response, done: (error: Error | null, body: Buffer) => void) => {
  const stream = response as unknown as IncomingMessage;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  t = await startTestServer();
  await seedDemo(t.ctx.pool, new Date('2026-12-01T15:00:00Z'));
  other = await signUpFirm(t.app, 'Elsewhere Stucco Co');
  await other.agent
    .post('/api/clients')
    .set('x-csrf-token', other.csrf())
    .send({ kind: 'homeowner', name: 'Zephyrine Otherfirm', email: 'zephyrine@elsewhere.example' });
  await other.agent
    .post('/api/firm/logo')
    .set('x-csrf-token', other.csrf())
    .attach('file', await pngImage(90, 30), { filename: 'elsewhere-logo.png' });

  owner = await newAgent(t.app);
  const signedIn = await owner.agent
    .post('/api/auth/signin')
    .set('x-csrf-token', owner.csrf())
    .send({ email: DEMO.people[0].email, password: DEMO.password });
  expect(signedIn.status).toBe(200);
  await owner.refresh();
  demoFirmId = (signedIn.body as { user: { firmId: string } }).user.firmId;
  const logo = await owner.agent
    .post('/api/firm/logo')
    .set('x-csrf-token', owner.csrf())
    .attach('file', await pngImage(120, 40), { filename: 'fern logo.png' });
  expect(logo.status).toBe(200);

  response = await owner.agent.get('/api/firm/export').buffer(true).parse(binary);
  zip = readZip(response.body as Buffer);
  manifest = JSON.parse(zip.get('manifest.json')!.toString('utf8')) as ExportManifest;
}, 180_000);
afterAll(() => t.stop());

describe('GET /api/firm/export', () => {
  it('answers a zip to download', () => {
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/zip');
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="fernhollow-data-\d{4}-\d{2}-\d{2}\.zip"$/);
    expect(response.headers['cache-control']).toBe('no-store');
  });

  it('writes a manifest whose counts and SHA-256 match every entry (FIPS 180-4 SHA-256, through node:crypto)', () => {
    expect(manifest).toMatchObject({ format: 'layerbook-firm-export', formatVersion: FIRM_EXPORT_FORMAT_VERSION, firmId: demoFirmId });
    expect(Number.isNaN(Date.parse(manifest.exportedAt))).toBe(false);
    for (const table of manifest.tables) {
      const bytes = zip.get(table.path)!;
      expect({ path: table.path, sha256: sha256(bytes), bytes: bytes.length }).toEqual({
        path: table.path,
        sha256: table.sha256,
        bytes: table.bytes,
      });
      expect(rowsOf(table.table)).toHaveLength(table.rows);
    }
    for (const file of manifest.files) expect(sha256(zip.get(file.path)!)).toBe(file.sha256);
    // every entry of the zip is in the manifest, and the other way round
    expect([...zip.keys()].sort()).toEqual(
      ['manifest.json', ...manifest.tables.map((x) => x.path), ...manifest.files.map((x) => x.path)].sort(),
    );
  });

  it("holds the demo firm's records, every table of firm data, and its stored files", () => {
    const tables = manifest.tables.map((x) => x.table);
    expect(tables).toEqual(
      expect.arrayContaining(['firms', 'users', 'memberships', 'clients', 'invoices', 'credit_notes', 'payments', 'audit_log', 'files']),
    );
    expect(rowsOf('firms')).toEqual([expect.objectContaining({ id: demoFirmId, name: DEMO.firm.name })]);
    expect(
      rowsOf('users')
        .map((u) => u['email'])
        .sort(),
    ).toEqual(DEMO.people.map((p) => p.email).sort());
    expect(rowsOf('clients').map((c) => c['name'])).toContain(DEMO.client.name);
    expect(rowsOf('invoices').length).toBeGreaterThan(0);
    expect(rowsOf('audit_log').map((e) => e['action'])).toContain('firm.exported');
    // amounts keep their digits as PostgreSQL wrote them
    expect(zip.get('data/invoices.json')!.toString('utf8')).toMatch(/"total": \d+\.\d{2}\b/);
    const logo = manifest.files.find((f) => f.role === 'original');
    expect(logo?.path).toMatch(/^files\/[0-9a-f-]{36}\/fern_logo\.png$/);
    expect(zip.get(logo!.path)!.subarray(1, 4).toString('latin1')).toBe('PNG');
    expect(manifest.missingFiles).toEqual([]);
    expect(manifest.leftOut.map((x) => x.table)).toEqual(expect.arrayContaining(['portal_links', 'mail_outbox']));
  });

  it('never carries a password hash, token, session or second-factor secret', () => {
    for (const [name, bytes] of zip) {
      if (!name.endsWith('.json')) continue;
      const text = bytes.toString('utf8');
      for (const secret of ['password_hash', 'token_hash', '$argon2', 'totp', 'secret"', 'recovery']) {
        expect({ name, has: text.includes(secret) }).toEqual({ name, has: false });
      }
    }
    expect(manifest.tables.map((x) => x.table)).not.toContain('session');
  });

  it("never holds another firm's rows or files", () => {
    for (const [name, bytes] of zip) {
      if (!name.endsWith('.json')) continue;
      const text = bytes.toString('utf8');
      expect({ name, other: text.includes(other.firmId) || text.includes('Zephyrine') || text.includes(other.email) }).toEqual({
        name,
        other: false,
      });
    }
    for (const table of manifest.tables) {
      for (const row of rowsOf(table.table)) if ('tenant_id' in row) expect(row['tenant_id']).toBe(demoFirmId);
    }
    expect(manifest.files.every((f) => rowsOf('files').some((row) => row['id'] === f.fileId))).toBe(true);
  });

  it('cuts the download off when something fails halfway, never a zip that looks complete', async () => {
    const store = t.ctx.storage;
    const get = store.get.bind(store);
    store.get = () => Promise.reject(new Error('object store down'));
    try {
      const outcome = await owner.agent
        .get('/api/firm/export')
        .buffer(true)
        .parse(binary)
        .then(
          (res) => res.body as Buffer,
          (error: Error) => error,
        );
      if (Buffer.isBuffer(outcome)) expect(() => readZip(outcome)).toThrow();
      // (the client's own Error class: supertest runs outside jest's realm)
      else expect(outcome.message).toMatch(/aborted|hang up|reset|closed/i);
    } finally {
      store.get = get;
    }
  });

  it('is for the owner alone', async () => {
    const office = await joinAs(t, other, 'office');
    const crew = await joinAs(t, other, 'crew');
    expect((await office.agent.get('/api/firm/export')).status).toBe(403);
    expect((await crew.agent.get('/api/firm/export')).status).toBe(403);
    expect((await other.agent.get('/api/firm/export?format=csv')).status).toBe(400);
  });
});
