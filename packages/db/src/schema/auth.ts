import { index, integer, json, pgTable, text, timestamp, uniqueIndex, uuid, varchar } from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';
import { users } from './team';

/**
 * Password-reset links. A user is not firm data (see users), so neither is their reset link;
 * only the hash of the token is stored, it is single-use and short-lived.
 */
export const passwordResets = pgTable(
  'password_resets',
  {
    id: id(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('password_resets_token_hash_key').on(t.tokenHash), index('password_resets_user_idx').on(t.userId)],
);

/** connect-pg-simple's table, declared here so drizzle-kit owns the migration. */
export const sessions = pgTable(
  'session',
  {
    sid: varchar('sid').primaryKey(),
    sess: json('sess').notNull(),
    expire: timestamp('expire', { precision: 6, withTimezone: false }).notNull(),
  },
  (t) => [index('IDX_session_expire').on(t.expire)],
);

/**
 * Failed sign-ins counted per key (an account's e-mail, and that e-mail from one address), each
 * in a fixed window: sign-in is slowed for that key, never locked, and the answer is the same
 * whether the account exists or not. Keys are SHA-256 hashes, so no e-mail is stored here.
 */
export const signInThrottle = pgTable('sign_in_throttle', {
  key: text('key').primaryKey(),
  failures: integer('failures').notNull().default(0),
  windowStartedAt: timestamp('window_started_at', { withTimezone: true }).notNull(),
});
