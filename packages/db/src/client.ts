import { drizzle, NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from './schema';

export type Schema = typeof schema;
export type Db = NodePgDatabase<Schema>;

export interface Database {
  readonly pool: Pool;
  readonly db: Db;
  close(): Promise<void>;
}

export function createDatabase(url: string, options: { max?: number; applicationName?: string } = {}): Database {
  const pool = new Pool({ connectionString: url, max: options.max ?? 10, application_name: options.applicationName });
  const db = drizzle(pool, { schema, casing: 'snake_case' });
  return { pool, db, close: () => pool.end() };
}
