import { execFileSync, spawn } from 'node:child_process';
import { mkdir, open, readFile } from 'node:fs/promises';
import path from 'node:path';
import { Client } from 'pg';
import { FORMAT, Manifest, readManifest, rowDifferences, verifyFiles, writeManifest } from './manifest';
import { downloadObject, ensureBucket, hashFile, inParallel, listKeys, s3Client, storeSettings, uploadObject } from './s3';
import { adminConnection, countRows, migrationLevel } from './tables';

/**
 * The Node half of ops/backup.sh and ops/restore.sh (run with tsx); the shell scripts are the entry
 * points and hold the usage text. Commands:
 *   backup DIR NAME DB -- PG_DUMP...   dump DB, copy the bucket and write DIR/manifest.json
 *   verify DIR                          every file of the backup against the manifest's sizes and sha256
 *   store-empty                         exit 0 when the bucket is missing or empty, 3 when it holds objects
 *   after-restore DIR DB                row counts against the manifest, then the objects into the bucket
 */
const ROOT = path.resolve(__dirname, '../..');
const COPY_WIDTH = 4;

async function backup(dir: string, name: string, db: string, pgDump: string[]): Promise<void> {
  const store = storeSettings();
  const client = new Client(adminConnection(db));
  await client.connect();
  let rows: Record<string, number>;
  let migrations: Manifest['app']['migrations'];
  let named: string[];
  try {
    // One snapshot for the dump and the counts, so the counts describe exactly what was dumped.
    await client.query('begin isolation level repeatable read read only');
    // A role that would see only some rows fails here instead of counting (and dumping) fewer.
    await client.query('set local row_security = off');
    const snapshot = (await client.query<{ id: string }>('select pg_export_snapshot() as id')).rows[0].id;
    await dump(pgDump, snapshot, path.join(dir, 'database.dump'));
    rows = await countRows(client);
    migrations = await migrationLevel(client, ROOT);
    named = await namedKeys(client);
    await client.query('commit');
  } finally {
    await client.end();
  }
  const dumped = await hashFile(path.join(dir, 'database.dump'));
  console.log(`  database ${db}: ${Object.keys(rows).length} tables, ${sum(Object.values(rows))} rows, ${dumped.size} bytes dumped`);

  // After the dump: the app stores an object before it writes the row naming it, so every row dumped has its object.
  const s3 = s3Client(store);
  try {
    await mkdir(path.join(dir, 'objects'));
    const keys: string[] = [];
    for await (const key of listKeys(s3, store.bucket)) keys.push(key);
    const objects = await inParallel(keys, COPY_WIDTH, (key, i) => downloadObject(s3, store.bucket, key, dir, i));
    const bytes = sum(objects.map((o) => o.size));
    console.log(`  store ${store.endpoint} bucket ${store.bucket}: ${objects.length} objects, ${bytes} bytes`);
    const copied = new Set(keys);
    const missing = named.filter((key) => !copied.has(key));
    if (missing.length > 0)
      console.warn(`  warning: ${missing.length} stored-file rows name an object the bucket does not have (manifest: store.missing)`);
    const manifest: Manifest = {
      format: FORMAT,
      name,
      createdAt: new Date().toISOString(),
      app: { ...(await appVersion()), migrations },
      database: { name: db, file: 'database.dump', format: 'custom', pgDump: pgDumpVersion(pgDump[0]), ...dumped, rows },
      store: { endpoint: store.endpoint, bucket: store.bucket, count: objects.length, bytes, missing, objects },
    };
    await writeManifest(dir, manifest);
  } finally {
    s3.destroy();
  }
}

/** The object keys the app's `files` rows name (an upload and its thumbnail), sorted. */
async function namedKeys(client: Client): Promise<string[]> {
  if (!(await client.query<{ t: string | null }>(`select to_regclass('public.files')::text as t`)).rows[0].t) return [];
  const res = await client.query<{ key: string }>(
    `select storage_key as key from public.files union select thumbnail_key from public.files where thumbnail_key is not null order by 1`,
  );
  return res.rows.map((r) => r.key);
}

/** Runs pg_dump (custom format, from the exported snapshot) with its output going straight to `file`. */
async function dump(pgDump: string[], snapshot: string, file: string): Promise<void> {
  const out = await open(file, 'wx');
  try {
    const child = spawn(pgDump[0], [...pgDump.slice(1), '--format=custom', `--snapshot=${snapshot}`], {
      stdio: ['ignore', out.fd, 'inherit'],
    });
    const code = await new Promise<number | null>((resolve, reject) => child.once('error', reject).once('close', resolve));
    if (code !== 0) throw new Error(`pg_dump failed (exit ${code})`);
  } finally {
    await out.close();
  }
}

function pgDumpVersion(program: string): string {
  return execFileSync(program, ['--version'], { encoding: 'utf8' }).trim();
}

async function appVersion(): Promise<{ version: string; commit: string | null }> {
  const { version } = JSON.parse(await readFile(path.join(ROOT, 'package.json'), 'utf8')) as { version: string };
  let commit: string | null = null;
  try {
    commit = execFileSync('git', ['-C', ROOT, 'rev-parse', 'HEAD'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim();
  } catch {
    commit = null; // not a git checkout (an installed copy)
  }
  return { version, commit };
}

async function verify(dir: string): Promise<Manifest> {
  const manifest = await readManifest(dir);
  const problems = await verifyFiles(dir, manifest);
  if (problems.length > 0) throw new Error(`the backup ${dir} is damaged:\n  ${problems.join('\n  ')}`);
  const { database: d, store: s, app } = manifest;
  console.log(
    `  ${manifest.name}: database ${d.name} (${Object.keys(d.rows).length} tables, ${sum(Object.values(d.rows))} rows), ` +
      `${s.count} objects (${s.bytes} bytes), app ${app.version} at migration ${app.migrations.latest ?? app.migrations.applied}: all checksums match`,
  );
  const missing = manifest.store.missing ?? [];
  if (missing.length > 0)
    console.warn(`  warning: ${missing.length} stored-file rows name an object the backup does not hold: ${missing.join(', ')}`);
  return manifest;
}

async function storeEmpty(): Promise<boolean> {
  const store = storeSettings();
  const s3 = s3Client(store);
  try {
    for await (const _key of listKeys(s3, store.bucket, 1)) return false;
    return true;
  } catch (error) {
    if ((error as { name?: string }).name === 'NoSuchBucket') return true;
    throw error;
  } finally {
    s3.destroy();
  }
}

async function afterRestore(dir: string, db: string): Promise<void> {
  const manifest = await readManifest(dir);
  const client = new Client(adminConnection(db));
  await client.connect();
  try {
    await client.query('begin isolation level repeatable read read only');
    const differences = rowDifferences(manifest.database.rows, await countRows(client));
    await client.query('commit');
    if (differences.length > 0) throw new Error(`the restored database differs from the backup:\n  ${differences.join('\n  ')}`);
  } finally {
    await client.end();
  }
  console.log(`  database ${db}: every table's row count matches the backup`);
  const store = storeSettings();
  const s3 = s3Client(store);
  try {
    if (await ensureBucket(s3, store.bucket)) console.log(`  created bucket ${store.bucket}`);
    await inParallel(manifest.store.objects, COPY_WIDTH, (o) => uploadObject(s3, store.bucket, o, dir));
    console.log(`  store ${store.endpoint} bucket ${store.bucket}: ${manifest.store.count} objects written`);
  } finally {
    s3.destroy();
  }
}

const sum = (ns: number[]) => ns.reduce((a, b) => a + b, 0);

async function main(argv: string[]): Promise<number> {
  const [command, ...args] = argv;
  switch (command) {
    case 'backup': {
      const [dir, name, db, dash, ...pgDump] = args;
      if (!dir || !name || !db || dash !== '--' || pgDump.length === 0) break;
      await backup(dir, name, db, pgDump);
      return 0;
    }
    case 'verify':
      if (!args[0]) break;
      await verify(args[0]);
      return 0;
    case 'store-empty':
      return (await storeEmpty()) ? 0 : 3;
    case 'after-restore':
      if (!args[0] || !args[1]) break;
      await afterRestore(args[0], args[1]);
      return 0;
  }
  console.error('usage: see ops/backup.sh and ops/restore.sh (this is their helper)');
  return 2;
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(`error: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  },
);
