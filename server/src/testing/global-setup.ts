import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { migrateDatabase } from '@layerbook/db';
import { TEST_DB, testDatabaseUrls } from './test-env';

/** Starts the local cluster if needed and gives the tests a fresh database of their own. */
export default async function globalSetup(): Promise<void> {
  const root = path.resolve(__dirname, '../../..');
  execFileSync('bash', [path.join(root, 'ops/pg-start.sh')], { stdio: 'inherit' });
  execFileSync('bash', [path.join(root, 'ops/pg-createdb.sh'), TEST_DB, '--fresh'], { stdio: 'inherit' });
  await migrateDatabase(testDatabaseUrls().DATABASE_OWNER_URL, path.join(root, 'migrations'));
}
