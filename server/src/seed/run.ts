import path from 'node:path';
import { migrateDatabase } from '@layerbook/db';
import { Pool } from 'pg';
import { loadConfig } from '../config';
import { DEMO, seedDemo } from './demo';

/** `npm start` runs this: migrate, then seed the demo firm on first run. */
async function run(): Promise<void> {
  const config = loadConfig();
  await migrateDatabase(config.DATABASE_OWNER_URL, path.join(config.ROOT_DIR, 'migrations'));
  const pool = new Pool({ connectionString: config.DATABASE_URL, max: 2 });
  // The owner only dates the demo's history in the audit log (append-only for the web role).
  const ownerPool = new Pool({ connectionString: config.DATABASE_OWNER_URL, max: 1 });
  try {
    const result = await seedDemo(pool, new Date(), ownerPool);
    console.log(result === 'created' ? `Seeded the demo firm "${DEMO.firm.name}".` : `Demo firm "${DEMO.firm.name}" is already there.`);
  } finally {
    await pool.end();
    await ownerPool.end();
  }
}

run().catch((error) => {
  console.error(error);
  process.exit(1);
});
