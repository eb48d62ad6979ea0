import S3rver from 's3rver';

export interface RunningS3Fake {
  /** What S3_ENDPOINT should be set to. */
  readonly endpoint: string;
  readonly port: number;
  stop(): Promise<void>;
}

/**
 * s3rver on loopback, keeping objects as files under `directory`. Used in-process by the API
 * tests and as a process of its own by `npm start` and the e2e setup (s3-fake-cli.ts).
 */
export async function startS3Fake(options: { directory: string; port: number; bucket?: string }): Promise<RunningS3Fake> {
  const fake = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    silent: true,
    directory: options.directory,
    configureBuckets: options.bucket ? [{ name: options.bucket }] : [],
  });
  const address = await fake.run();
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    port: address.port,
    async stop() {
      // Keep-alive sockets from SDK clients would hold close() open until they time out.
      fake.httpServer?.closeAllConnections();
      await fake.close();
    },
  };
}
