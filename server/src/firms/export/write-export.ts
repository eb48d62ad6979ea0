import type { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { FIRM_EXPORT_FORMAT_VERSION } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import archiver from 'archiver';
import type { ObjectStore } from '../../files/object-store';
import { addEntry, type WrittenEntry } from './archive';
import { exportOrder, exportSql, planExport } from './tables';

/** Rows fetched per round trip (common practice, no source). */
const BATCH_ROWS = 500;

interface CursorRow {
  t: string;
  j: string;
}

/** The cursor's rows one at a time, with a look at the next without taking it. */
class RowReader {
  private batch: CursorRow[] = [];
  private isDone = false;
  constructor(private readonly tx: TenantTx) {}

  async peek(): Promise<CursorRow | null> {
    if (this.batch.length === 0 && !this.isDone) {
      const { rows } = await this.tx.client.query<CursorRow>(`fetch forward ${BATCH_ROWS} from firm_export`);
      this.batch = rows;
      if (rows.length < BATCH_ROWS) this.isDone = true;
    }
    return this.batch[0] ?? null;
  }

  take(): CursorRow | undefined {
    return this.batch.shift();
  }
}

interface StoredFile {
  readonly id: string;
  readonly storage_key: string;
  readonly thumbnail_key: string | null;
  readonly original_name: string;
}

/** A stored file's name as a zip path segment: letters, digits, dot, dash and underscore. */
const safeName = (name: string) =>
  name
    .replace(/[^A-Za-z0-9._-]+/g, '_')
    .replace(/^\.+/, '')
    .slice(0, 120) || 'file';

/** `data/<table>.json`: a JSON array, one row per line, as PostgreSQL wrote it. */
async function* tableJson(reader: RowReader, table: string, count: { rows: number }, files: StoredFile[]): AsyncGenerator<string> {
  yield '[';
  for (let row = await reader.peek(); row && row.t === table; row = await reader.peek()) {
    reader.take();
    yield `${count.rows === 0 ? '' : ','}\n${row.j}`;
    count.rows += 1;
    if (table === 'files') files.push(JSON.parse(row.j) as StoredFile);
  }
  yield count.rows === 0 ? ']\n' : '\n]\n';
}

export interface ExportManifest {
  readonly format: 'layerbook-firm-export';
  readonly formatVersion: number;
  readonly exportedAt: string;
  readonly firmId: string;
  readonly tables: readonly (WrittenEntry & { readonly table: string; readonly rows: number })[];
  readonly files: readonly (WrittenEntry & { readonly fileId: string; readonly role: 'original' | 'thumbnail' })[];
  readonly missingFiles: readonly { readonly fileId: string; readonly key: string }[];
  readonly leftOut: readonly { readonly table: string; readonly why: string }[];
}

/**
 * Writes the firm's data to `out` as a zip: `data/<table>.json` for every firm table (read through
 * one cursor in the caller's read-only transaction, so every file agrees with every other), each
 * stored file under `files/<file id>/`, and `manifest.json` (row counts, size and SHA-256 of every
 * entry, when, format version). Secrets never leave: see tables.ts. Resolves when the zip is out.
 */
export async function writeFirmExport(tx: TenantTx, store: ObjectStore, now: Date, out: Writable): Promise<ExportManifest> {
  await tx.client.query('set transaction read only');
  const plan = await planExport(tx);
  await tx.client.query(`declare firm_export no scroll cursor for ${exportSql(plan.tables)}`, [tx.tenantId]);
  const reader = new RowReader(tx);
  await reader.peek();
  // Nothing is written before this point, so a failure so far can still be answered as a problem.
  const archive = archiver('zip', { zlib: { level: 6 } });
  const sent = pipeline(archive, out);
  // If the reader goes away, the entry being added never finishes: every wait races the pipe's failure.
  const broken = sent.then(() => new Promise<never>(() => undefined));
  broken.catch(() => undefined);
  const add = (path: string, pieces: AsyncIterable<Buffer | string>) => Promise.race([addEntry(archive, path, pieces), broken]);
  try {
    const tables: ExportManifest['tables'][number][] = [];
    const stored: StoredFile[] = [];
    for (const table of exportOrder(plan.tables)) {
      const count = { rows: 0 };
      const entry = await add(`data/${table}.json`, tableJson(reader, table, count, stored));
      tables.push({ table, rows: count.rows, ...entry });
    }
    if (await reader.peek()) throw new Error('firm export: rows came out of table order');
    await tx.client.query('close firm_export');

    const files: ExportManifest['files'][number][] = [];
    const missingFiles: { fileId: string; key: string }[] = [];
    for (const file of stored) {
      const kinds = [
        { role: 'original' as const, key: file.storage_key, path: `files/${file.id}/${safeName(file.original_name)}` },
        ...(file.thumbnail_key ? [{ role: 'thumbnail' as const, key: file.thumbnail_key, path: `files/${file.id}/thumbnail.webp` }] : []),
      ];
      for (const kind of kinds) {
        const body = await store.get(kind.key);
        if (!body) {
          missingFiles.push({ fileId: file.id, key: kind.key });
          continue;
        }
        files.push({ fileId: file.id, role: kind.role, ...(await add(kind.path, body)) });
      }
    }
    const manifest: ExportManifest = {
      format: 'layerbook-firm-export',
      formatVersion: FIRM_EXPORT_FORMAT_VERSION,
      exportedAt: now.toISOString(),
      firmId: tx.tenantId,
      tables,
      files,
      missingFiles,
      leftOut: plan.leftOut,
    };
    archive.append(`${JSON.stringify(manifest, null, 2)}\n`, { name: 'manifest.json' });
    await Promise.race([archive.finalize(), broken]);
    await sent;
    return manifest;
  } catch (error) {
    // The download is cut off (never a zip that looks complete): destroying the archive ends the pipe with an error.
    archive.destroy(error instanceof Error ? error : new Error('firm export failed'));
    await sent.catch(() => undefined);
    throw error;
  }
}
