import { bigint, index, integer, pgTable, varchar } from 'drizzle-orm/pg-core';

/**
 * Requests counted per client address for the sign-in and public-form limits, shared by every web
 * process (server/src/http/rate-limit.ts). The layout is rate-limiter-flexible's RateLimiterPostgres
 * (it inserts by position: key, points, expire as epoch milliseconds), made here so the web role
 * needs no CREATE. Not firm data: no tenant, no RLS; the web role counts and clears expired rows.
 */
export const rateLimitCounts = pgTable(
  'rate_limit_counts',
  {
    key: varchar('key', { length: 255 }).primaryKey(),
    points: integer('points').notNull().default(0),
    expire: bigint('expire', { mode: 'number' }),
  },
  (t) => [index('rate_limit_counts_expire').on(t.expire)],
);
