import { execFile } from 'node:child_process';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Readable } from 'node:stream';
import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { migrateDatabase, withTenant } from '@layerbook/db';
import { Client, Pool } from 'pg';
import { loadConfig } from '../../server/src/config';
import { RunningS3Fake, startS3Fake } from '../../server/src/files/s3-fake';
import { createLogger } from '../../server/src/http/logger';
import { startQueue } from '../../server/src/queue/job-queue';
import { DEMO, seedDemo } from '../../server/src/seed/demo';
import { testDatabaseUrls } from '../../server/src/testing/test-env';
import { listKeys, s3Client, storeSettings } from './s3';
import { adminConnection, listTables } from './tables';

/**
 * Round trip: the demo firm and some stored files, backed up with ops/backup.sh and restored with
 * ops/restore.sh into a fresh database and a fresh store, must come back the same — every table's
 * rows, owners, grants and row-level security, and every object's bytes.
 */
const ROOT = path.resolve(__dirname, '../..');
const SOURCE = `layerbook_backup_src_${process.pid}`;
const TARGET = `layerbook_backup_dst_${process.pid}`;
const BUCKET = 'layerbook';

const dirs: string[] = [];
const tempDir = (prefix: string) => {
  const dir = mkdtempSync(path.join(os.tmpdir(), prefix));
  dirs.push(dir);
  return dir;
};

let storeA: RunningS3Fake;
let storeB: RunningS3Fake;
let backups: string;

/** Runs an ops script; resolves with its exit code and output (never rejects on a non-zero exit). */
function run(script: string, args: string[], env: Record<string, string>): Promise<{ code: number; out: string }> {
  return new Promise((resolve) => {
    execFile(
      'bash',
      [path.join(ROOT, script), ...args],
      { env: { ...process.env, ...env }, maxBuffer: 16 << 20 },
      (error, stdout, stderr) => resolve({ code: error ? Number(error.code ?? 1) : 0, out: `${stdout}${stderr}` }),
    );
  });
}

async function asAdmin<T>(db: string, work: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client(adminConnection(db));
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Per table: row count and an md5 of every row (as text, in byte order: a total order, so both sides hash alike). */
const tableSums = (db: string) =>
  asAdmin(db, async (c) => {
    const out: Record<string, { rows: number; md5: string }> = {};
    for (const table of await listTables(c)) {
      const r = await c.query<{ n: string; md5: string }>(
        `select count(*) as n, md5(coalesce(string_agg(t::text, E'\\n' order by t::text collate "C"), '')) as md5 from ${table} t`,
      );
      out[table] = { rows: Number(r.rows[0].n), md5: r.rows[0].md5 };
    }
    return out;
  });

/** Who owns what, who may do what, and which row-level security applies — as the catalogue says. */
const security = (db: string) =>
  asAdmin(db, async (c) => ({
    database: (
      await c.query(`select datdba::regrole::text as owner, datacl::text as acl from pg_database where datname = current_database()`)
    ).rows,
    relations: (
      await c.query(
        `select n.nspname, c.relname, c.relkind, c.relowner::regrole::text as owner, c.relacl::text as acl,
                c.relrowsecurity, c.relforcerowsecurity
           from pg_class c join pg_namespace n on n.oid = c.relnamespace
          where n.nspname not in ('pg_catalog', 'information_schema') and n.nspname not like 'pg\\_toast%'
          order by 1, 2`,
      )
    ).rows,
    columns: (
      await c.query(
        `select attrelid::regclass::text as rel, attname, attacl::text as acl from pg_attribute where attacl is not null order by 1, 2`,
      )
    ).rows,
    policies: (await c.query(`select * from pg_policies order by schemaname, tablename, policyname`)).rows,
    schemas: (
      await c.query(
        `select nspname, nspowner::regrole::text as owner, nspacl::text as acl from pg_namespace
          where nspname not like 'pg\\_%' and nspname <> 'information_schema' order by 1`,
      )
    ).rows,
    functions: (
      await c.query(
        `select p.oid::regprocedure::text as fn, p.proowner::regrole::text as owner, p.proacl::text as acl
           from pg_proc p join pg_namespace n on n.oid = p.pronamespace where n.nspname = 'public' order by 1`,
      )
    ).rows,
  }));

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** Every object of a store as key → sha256, read through the S3 API. */
async function storedObjects(endpoint: string): Promise<Record<string, string>> {
  const client: S3Client = s3Client(storeSettings({ S3_ENDPOINT: endpoint, S3_BUCKET: BUCKET }));
  try {
    const out: Record<string, string> = {};
    for await (const key of listKeys(client, BUCKET)) {
      const res = await client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }));
      const chunks: Buffer[] = [];
      for await (const chunk of res.Body as Readable) chunks.push(chunk as Buffer);
      out[key] = sha256(Buffer.concat(chunks));
    }
    return out;
  } finally {
    client.destroy();
  }
}

const dropDatabases = () =>
  asAdmin('postgres', async (c) => {
    for (const db of [SOURCE, TARGET]) await c.query(`drop database if exists "${db}" with (force)`);
  });

beforeAll(async () => {
  await dropDatabases();
  const created = await run('ops/pg-createdb.sh', [SOURCE], {});
  if (created.code !== 0) throw new Error(`ops/pg-createdb.sh ${SOURCE} failed:\n${created.out}`);
  await migrateDatabase(testDatabaseUrls(SOURCE).DATABASE_OWNER_URL, path.join(ROOT, 'migrations'));
  // pg-boss's schema, owned by the jobs role with the web role's grants, as a running server leaves it.
  const config = loadConfig({
    NODE_ENV: 'test',
    ...testDatabaseUrls(SOURCE),
    SESSION_SECRET: 'backup-round-trip-secret-long-enough',
    LOG_LEVEL: 'silent',
  });
  await (await startQueue(config, createLogger(config))).stop();
  storeA = await startS3Fake({ directory: tempDir('layerbook-backup-a-'), port: 0, bucket: BUCKET });
  storeB = await startS3Fake({ directory: tempDir('layerbook-backup-b-'), port: 0 });
  backups = tempDir('layerbook-backups-');

  // The demo firm, as `npm start` seeds it, through the app's role.
  const pool = new Pool({ connectionString: testDatabaseUrls(SOURCE).DATABASE_URL, max: 2 });
  try {
    await seedDemo(pool, new Date('2026-12-01T15:00:00Z'));
    const firmId = await asAdmin(
      SOURCE,
      async (c) => (await c.query(`select id from firms where slug = $1`, [DEMO.firm.slug])).rows[0].id as string,
    );
    // Stored files as the app keeps them (`<firm>/<uuid>` and its thumbnail, a row naming both),
    // plus objects no row names: the same bytes twice, an empty one, a key with a space.
    const client = s3Client(storeSettings({ S3_ENDPOINT: storeA.endpoint, S3_BUCKET: BUCKET }));
    try {
      const put = (key: string, body: Buffer, type: string) =>
        client.send(new PutObjectCommand({ Bucket: BUCKET, Key: key, Body: body, ContentType: type, ContentLength: body.length }));
      for (let i = 0; i < 3; i++) {
        const id = randomUUID();
        const photo = randomBytes(150_000 + i * 1000);
        await put(`${firmId}/${id}`, photo, 'image/jpeg');
        await put(`${firmId}/${id}-thumb.webp`, randomBytes(4_000), 'image/webp');
        await withTenant(pool, firmId, (tx) =>
          tx.client.query(
            `insert into files (id, tenant_id, storage_key, thumbnail_key, original_name, content_type, size_bytes, width, height, purpose)
             values ($1, $2, $3, $4, $5, 'image/jpeg', $6, 1600, 1200, 'room_photo')`,
            [id, firmId, `${firmId}/${id}`, `${firmId}/${id}-thumb.webp`, `hall wall ${i + 1}.jpg`, photo.length],
          ),
        );
      }
      const same = randomBytes(20_000);
      await put('exports/first.bin', same, 'application/octet-stream');
      await put('exports/second copy.bin', same, 'application/octet-stream');
      await put('exports/empty.txt', Buffer.alloc(0), 'text/plain');
    } finally {
      client.destroy();
    }
  } finally {
    await pool.end();
  }
}, 60_000);

afterAll(async () => {
  await dropDatabases();
  await storeA?.stop();
  await storeB?.stop();
  for (const dir of dirs) rmSync(dir, { recursive: true, force: true });
});

describe('ops/backup.sh and ops/restore.sh', () => {
  it('restore a backup into a fresh database and store with every row, grant, policy and object as it was', async () => {
    const backedUp = await run('ops/backup.sh', [], {
      DATABASE_URL: testDatabaseUrls(SOURCE).DATABASE_URL,
      S3_ENDPOINT: storeA.endpoint,
      S3_BUCKET: BUCKET,
      LB_BACKUP_DIR: backups,
    });
    expect(backedUp).toMatchObject({ code: 0 });
    const written = readdirSync(backups, { withFileTypes: true });
    // One folder named by the UTC time, and no unfinished one left behind.
    expect(written.map((d) => d.name)).toEqual([expect.stringMatching(/^layerbook-\d{8}T\d{6}Z$/)]);
    const backup = path.join(backups, written[0].name);
    expect(existsSync(path.join(backup, 'database.dump'))).toBe(true);
    // Every object the files rows name was copied; the same bytes under two keys are kept once.
    const manifest = JSON.parse(readFileSync(path.join(backup, 'manifest.json'), 'utf8'));
    expect(manifest.store).toMatchObject({ count: 9, missing: [] });
    expect(readdirSync(path.join(backup, 'objects'))).toHaveLength(8);
    expect(manifest.database.rows['public.files']).toBe(3);

    const restored = await run('ops/restore.sh', ['--db', TARGET, backup], { S3_ENDPOINT: storeB.endpoint, S3_BUCKET: BUCKET });
    expect(restored).toMatchObject({ code: 0 });

    // Every table: the same number of rows and the same rows.
    const [before, after] = [await tableSums(SOURCE), await tableSums(TARGET)];
    expect(Object.keys(before).length).toBeGreaterThan(30);
    expect(before['public.firms'].rows).toBe(1);
    expect(before['public.files'].rows).toBe(3);
    expect(after).toEqual(before);
    // Owners, grants (tables, columns, schemas, functions) and row-level security as they were.
    expect(await security(TARGET)).toEqual(await security(SOURCE));

    // Every object, byte for byte (the same bytes under two keys kept once in the backup, restored twice).
    const [objectsBefore, objectsAfter] = [await storedObjects(storeA.endpoint), await storedObjects(storeB.endpoint)];
    expect(Object.keys(objectsBefore)).toHaveLength(9);
    expect(objectsAfter).toEqual(objectsBefore);

    // The app's role reads the restored firm under row-level security: its own rows, none of another firm's.
    const pool = new Pool({ connectionString: testDatabaseUrls(TARGET).DATABASE_URL, max: 1 });
    try {
      const firmId = (await asAdmin(TARGET, (c) => c.query(`select id from firms`))).rows[0].id as string;
      const count = (tenant: string) =>
        withTenant(pool, tenant, async (tx) => Number((await tx.client.query(`select count(*) as n from clients`)).rows[0].n));
      expect(await count(firmId)).toBe(before['public.clients'].rows);
      expect(await count(randomUUID())).toBe(0);
    } finally {
      await pool.end();
    }
  }, 120_000);

  it('refuses to restore over a database that holds tables, unless told to', async () => {
    const [backup] = readdirSync(backups);
    const again = await run('ops/restore.sh', ['--db', TARGET, path.join(backups, backup)], {
      S3_ENDPOINT: storeB.endpoint,
      S3_BUCKET: BUCKET,
    });
    expect(again.code).not.toBe(0);
    expect(again.out).toContain(`database ${TARGET} is not empty`);
  }, 60_000);

  it('finds a damaged backup before restoring anything', async () => {
    const [backup] = readdirSync(backups);
    const dir = path.join(backups, backup);
    const [object] = readdirSync(path.join(dir, 'objects'));
    rmSync(path.join(dir, 'objects', object));
    const checked = await run('ops/restore.sh', ['--verify-only', dir], {});
    expect(checked.code).not.toBe(0);
    expect(checked.out).toContain('is damaged');
  }, 60_000);
});
