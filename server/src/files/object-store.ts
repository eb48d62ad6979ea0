import { Readable } from 'node:stream';
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { Config } from '../config';

/**
 * Where uploaded bytes live. Small on purpose: services and tests need nothing more, and a
 * different backend (disk, another cloud) only has to provide these three calls.
 */
export interface ObjectStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The object's bytes as a stream, or null when there is no such key. */
  get(key: string): Promise<Readable | null>;
  /** Deleting a key that does not exist succeeds, so clean-up can run twice. */
  delete(key: string): Promise<void>;
  /** Frees the client's sockets (the test fake cannot close while they stay open). */
  close(): void;
}

const status = (error: unknown) => (error instanceof S3ServiceException ? error.$metadata.httpStatusCode : undefined);

class S3ObjectStore implements ObjectStore {
  constructor(
    private readonly client: S3Client,
    private readonly bucket: string,
  ) {}

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
    );
  }

  async get(key: string): Promise<Readable | null> {
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      // In Node the SDK answers with the HTTP response itself, which is a Readable.
      return res.Body instanceof Readable ? res.Body : null;
    } catch (error) {
      if (status(error) === 404) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  close(): void {
    this.client.destroy();
  }

  /** A fresh local fake (or a new environment) starts without the bucket; production's already exists. */
  async ensureBucket(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch (error) {
      if (status(error) !== 404) throw error;
      await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
    }
  }
}

/** The S3 store named by the configuration, with its bucket created when missing. */
export async function openObjectStore(config: Config): Promise<ObjectStore> {
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
    // Recent SDKs add CRC checksums and chunked bodies by default, which s3rver refuses; S3 itself
    // needs them only where an operation requires one.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const store = new S3ObjectStore(client, config.S3_BUCKET);
  await store.ensureBucket();
  return store;
}
