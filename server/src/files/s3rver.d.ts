// s3rver ships no types; this covers the part the local fake uses.
declare module 's3rver' {
  import type { Server } from 'node:http';
  import type { AddressInfo } from 'node:net';

  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory: string;
    configureBuckets?: { name: string; configs?: Buffer[] }[];
  }

  class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
    httpServer?: Server;
  }
  export = S3rver;
}
