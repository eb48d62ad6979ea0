export * as schema from './schema';
export * from './schema';
export * from './client';
export * from './tenant/scoped';
export * from './tenant/one-trip';
export * from './sql-text';
export * from './migrate';
export { sql, eq, and, or, desc, asc, isNull, isNotNull, inArray, gt, lt, gte, lte } from 'drizzle-orm';
