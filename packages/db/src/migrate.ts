import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { createDatabase } from './client';

/** Applies the committed SQL migrations as the owner role. Safe to run on every start. */
export async function migrateDatabase(ownerUrl: string, migrationsFolder: string): Promise<void> {
  const database = createDatabase(ownerUrl, { max: 1, applicationName: 'layerbook-migrate' });
  try {
    await migrate(database.db, { migrationsFolder });
  } finally {
    await database.close();
  }
}
