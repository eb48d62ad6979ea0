import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { rename, stat } from 'node:fs/promises';
import path from 'node:path';
import { Readable, Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import {
  CreateBucketCommand,
  GetObjectCommand,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';

/** One stored object as the manifest records it; `file` is where its bytes are inside the backup. */
export interface ObjectEntry {
  key: string;
  size: number;
  sha256: string;
  contentType: string | null;
  file: string;
}

/** The object store the app uses, read from the app's own settings with the app's defaults (server/src/config.ts). */
export interface StoreSettings {
  endpoint: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

export function storeSettings(env: NodeJS.ProcessEnv = process.env): StoreSettings {
  return {
    endpoint: env['S3_ENDPOINT'] || 'http://127.0.0.1:4569',
    bucket: env['S3_BUCKET'] || 'layerbook',
    region: env['S3_REGION'] || 'us-east-1',
    accessKeyId: env['S3_ACCESS_KEY_ID'] || 'S3RVER',
    secretAccessKey: env['S3_SECRET_ACCESS_KEY'] || 'S3RVER',
    forcePathStyle: (env['S3_FORCE_PATH_STYLE'] || 'true') === 'true',
  };
}

export function s3Client(s: StoreSettings): S3Client {
  return new S3Client({
    endpoint: s.endpoint,
    region: s.region,
    forcePathStyle: s.forcePathStyle,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
    // As the app's client does (server/src/files/object-store.ts): the local fake refuses the SDK's default checksums.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

const httpStatus = (error: unknown) => (error instanceof S3ServiceException ? error.$metadata.httpStatusCode : undefined);

/** Every key in the bucket, page by page (S3 answers at most 1,000 at a time). */
export async function* listKeys(client: S3Client, bucket: string, maxKeys?: number): AsyncGenerator<string> {
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token, MaxKeys: maxKeys }));
    for (const o of page.Contents ?? []) if (o.Key !== undefined) yield o.Key;
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}

/** Counts bytes and hashes them as they stream past. */
function meter(): Transform & { readonly size: () => number; readonly sha256: () => string } {
  const hash = createHash('sha256');
  let size = 0;
  const t = new Transform({
    transform(chunk: Buffer, _enc, done) {
      hash.update(chunk);
      size += chunk.length;
      done(null, chunk);
    },
  });
  return Object.assign(t, { size: () => size, sha256: () => hash.digest('hex') });
}

/** sha256 and size of a file on disk. */
export async function hashFile(file: string): Promise<{ size: number; sha256: string }> {
  const hash = createHash('sha256');
  let size = 0;
  for await (const chunk of createReadStream(file)) {
    hash.update(chunk as Buffer);
    size += (chunk as Buffer).length;
  }
  return { size, sha256: hash.digest('hex') };
}

/**
 * Copies one object into `<dir>/objects/<sha256>` (the same bytes stored twice are kept once) and
 * says what it copied.
 */
export async function downloadObject(client: S3Client, bucket: string, key: string, dir: string, n: number): Promise<ObjectEntry> {
  const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  if (!(res.Body instanceof Readable)) throw new Error(`object ${key}: no body`);
  const m = meter();
  const part = path.join(dir, 'objects', `.part-${n}`);
  await pipeline(res.Body, m, createWriteStream(part));
  const sha256 = m.sha256();
  const file = `objects/${sha256}`;
  await rename(part, path.join(dir, file));
  return { key, size: m.size(), sha256, contentType: res.ContentType ?? null, file };
}

export async function uploadObject(client: S3Client, bucket: string, entry: ObjectEntry, dir: string): Promise<void> {
  const file = path.join(dir, entry.file);
  const { size } = await stat(file);
  await client.send(
    new PutObjectCommand({
      Bucket: bucket,
      Key: entry.key,
      Body: createReadStream(file),
      ContentLength: size,
      ContentType: entry.contentType ?? undefined,
    }),
  );
}

/** Creates the bucket when it is missing (a fresh store); true when it was created. */
export async function ensureBucket(client: S3Client, bucket: string): Promise<boolean> {
  try {
    await client.send(new HeadBucketCommand({ Bucket: bucket }));
    return false;
  } catch (error) {
    if (httpStatus(error) !== 404) throw error;
    await client.send(new CreateBucketCommand({ Bucket: bucket }));
    return true;
  }
}

/** Runs `work` over `items`, `width` at a time, keeping the results in order. */
export async function inParallel<T, R>(items: readonly T[], width: number, work: (item: T, i: number) => Promise<R>): Promise<R[]> {
  const out = new Array<R>(items.length);
  let next = 0;
  const lane = async () => {
    while (next < items.length) {
      const i = next++;
      out[i] = await work(items[i], i);
    }
  };
  await Promise.all(Array.from({ length: Math.min(width, items.length) }, lane));
  return out;
}
