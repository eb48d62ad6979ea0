import { sql } from 'drizzle-orm';
import { pgPolicy, pgRole, timestamp, uuid } from 'drizzle-orm/pg-core';

/** The role pg-boss and the workers run as (ops/pg-start.sh creates it). */
export const jobsRole = pgRole('layerbook_jobs').existing();

/** The firm a row belongs to. Every firm-owned table has it, and RLS checks it. */
export const tenantId = () => uuid('tenant_id').notNull();

export const id = () => uuid('id').primaryKey().defaultRandom();

export const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow();
export const updatedAt = () => timestamp('updated_at', { withTimezone: true }).notNull().defaultNow();

/**
 * The firm set for this transaction by withTenant(). `nullif` because after a transaction-local
 * set_config ends, the setting reads '' on that pooled connection, and ''::uuid throws.
 */
export const currentTenant = sql`nullif(current_setting('app.tenant_id', true), '')::uuid`;

/** Row-level security: a row is visible and writable only inside its own firm's transaction. */
export const tenantPolicy = (table: string) =>
  pgPolicy(`${table}_tenant_isolation`, {
    as: 'permissive',
    for: 'all',
    to: 'public',
    using: sql`tenant_id = ${currentTenant}`,
    withCheck: sql`tenant_id = ${currentTenant}`,
  });

/**
 * A second, read-only door for rows that must be found before the firm is known (sign-in,
 * one-time links): it opens only for the holder of the exact lookup key set by withLookup().
 */
export const lookupPolicy = (table: string, column: string, setting: string, cast = 'text') =>
  pgPolicy(`${table}_lookup_by_${column}`, {
    as: 'permissive',
    for: 'select',
    to: 'public',
    using: sql.raw(`${column} = nullif(current_setting('app.${setting}', true), '')::${cast}`),
  });
