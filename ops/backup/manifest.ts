import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { hashFile, type ObjectEntry } from './s3';
import type { MigrationLevel } from './tables';

export const FORMAT = 'layerbook-backup/1';

/** `manifest.json`, beside `database.dump` and `objects/` in every backup folder. */
export interface Manifest {
  format: typeof FORMAT;
  /** The folder's name: `layerbook-<UTC time>`. */
  name: string;
  createdAt: string;
  app: { version: string; commit: string | null; migrations: MigrationLevel };
  database: {
    name: string;
    file: 'database.dump';
    /** `pg_dump --format=custom`, restored with pg_restore. */
    format: 'custom';
    pgDump: string;
    size: number;
    sha256: string;
    /** Rows per table (`schema.table`), counted in the snapshot the dump was taken from. */
    rows: Record<string, number>;
  };
  store: {
    endpoint: string;
    bucket: string;
    count: number;
    bytes: number;
    /** Keys the database's `files` rows name that the bucket did not hold when copied (none in a sound store). */
    missing: string[];
    objects: ObjectEntry[];
  };
}

export const manifestPath = (dir: string) => path.join(dir, 'manifest.json');

export async function readManifest(dir: string): Promise<Manifest> {
  let text: string;
  try {
    text = await readFile(manifestPath(dir), 'utf8');
  } catch {
    throw new Error(`${dir} holds no manifest.json: not a backup folder (or an unfinished one)`);
  }
  const manifest = JSON.parse(text) as { format?: unknown };
  if (manifest.format !== FORMAT) throw new Error(`${manifestPath(dir)}: format ${JSON.stringify(manifest.format)}, expected ${FORMAT}`);
  return manifest as Manifest;
}

export async function writeManifest(dir: string, manifest: Manifest): Promise<void> {
  await writeFile(manifestPath(dir), `${JSON.stringify(manifest, null, 2)}\n`);
}

/** Every file the manifest names, checked for its size and sha256; the problems found (none: the backup is whole). */
export async function verifyFiles(dir: string, manifest: Manifest): Promise<string[]> {
  const problems: string[] = [];
  const check = async (file: string, size: number, sha256: string, what: string) => {
    try {
      const found = await hashFile(path.join(dir, file));
      if (found.size !== size || found.sha256 !== sha256) problems.push(`${what}: ${file} does not match its size or sha256`);
    } catch {
      problems.push(`${what}: ${file} is missing`);
    }
  };
  await check(manifest.database.file, manifest.database.size, manifest.database.sha256, 'database');
  const seen = new Set<string>();
  for (const o of manifest.store.objects) {
    if (seen.has(o.file)) continue;
    seen.add(o.file);
    await check(o.file, o.size, o.sha256, `object ${o.key}`);
  }
  return problems;
}

/** Tables whose row count differs from the manifest's (or that are missing or extra). */
export function rowDifferences(expected: Record<string, number>, found: Record<string, number>): string[] {
  const names = [...new Set([...Object.keys(expected), ...Object.keys(found)])].sort();
  return names
    .filter((t) => expected[t] !== found[t])
    .map((t) => `${t}: ${expected[t] ?? 'absent'} rows in the backup, ${found[t] ?? 'absent'} restored`);
}
