import { createHash } from 'node:crypto';
import { Readable } from 'node:stream';
import type { Archiver } from 'archiver';

export interface WrittenEntry {
  readonly path: string;
  readonly bytes: number;
  readonly sha256: string;
}

/**
 * Adds one entry to the zip from its pieces and resolves once the archive has read all of it, with
 * its size and SHA-256. Entries go one at a time: the next is not started (nor its source read)
 * until this one is in, so a source reading a database cursor never runs beside another.
 */
export function addEntry(archive: Archiver, path: string, pieces: AsyncIterable<Buffer | string>): Promise<WrittenEntry> {
  const hash = createHash('sha256');
  let bytes = 0;
  async function* hashed(): AsyncGenerator<Buffer> {
    for await (const piece of pieces) {
      const chunk = typeof piece === 'string' ? Buffer.from(piece, 'utf8') : piece;
      hash.update(chunk);
      bytes += chunk.length;
      yield chunk;
    }
  }
  const source = Readable.from(hashed(), { objectMode: false });
  return new Promise<WrittenEntry>((resolve, reject) => {
    source.once('error', reject);
    source.once('end', () => resolve({ path, bytes, sha256: hash.digest('hex') }));
    archive.append(source, { name: path });
  });
}
