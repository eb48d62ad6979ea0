import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { startS3Fake } from './s3-fake';

/**
 * `node server/dist/files/s3-fake-cli.js <directory> <port>`: the local S3 stand-in as a process of
 * its own, for `npm start` and the e2e setup, which start it by PID and stop it with SIGTERM.
 */
async function run(): Promise<void> {
  const directory = path.resolve(process.argv[2] ?? '.data/s3');
  const port = Number(process.argv[3] ?? process.env['S3_FAKE_PORT'] ?? 4569);
  mkdirSync(directory, { recursive: true });
  const fake = await startS3Fake({ directory, port, bucket: process.env['S3_BUCKET'] ?? 'layerbook' });
  console.log(`S3 fake listening at ${fake.endpoint} (objects in ${directory})`);
  const stop = () => void fake.stop().then(() => process.exit(0));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

run().catch((error) => {
  console.error(error);
  process.exit(1);
});
