import { bigint, index, integer, json, pgTable, text, timestamp, uniqueIndex, uuid, varchar } from 'drizzle-orm/pg-core';
import { createdAt, id, updatedAt } from './columns';
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

/** The session table (rows read and written through security-definer functions by server/src/http/session.ts). */
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

/**
 * Sign-ups waiting for their e-mail to be confirmed. Not firm data (the firm does not exist yet):
 * like a reset link, only the token's hash is kept; the link is single-use and expires. The firm
 * id is chosen up front so the confirmation mail can be filed under it in the outbox.
 */
export const pendingSignUps = pgTable(
  'pending_sign_ups',
  {
    id: id(),
    tokenHash: text('token_hash').notNull(),
    firmId: uuid('firm_id').notNull(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    firmName: text('firm_name').notNull(),
    passwordHash: text('password_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('pending_sign_ups_token_hash_key').on(t.tokenHash)],
);

/**
 * A person's second factor (TOTP, RFC 6238). Not firm data: it belongs to the person, like their
 * password. The secret is kept encrypted (AES-256-GCM, server/src/auth/second-factor/secret-box.ts);
 * `confirmed_at` is null while an enrolment waits for its first code. `last_used_step` is the time
 * step of the last code accepted, so no code is accepted twice.
 */
export const userSecondFactors = pgTable('user_second_factors', {
  userId: uuid('user_id')
    .primaryKey()
    .references(() => users.id),
  secretSealed: text('secret_sealed').notNull(),
  confirmedAt: timestamp('confirmed_at', { withTimezone: true }),
  lastUsedStep: bigint('last_used_step', { mode: 'number' }),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** One-time recovery codes of a second factor: only a keyed hash of each is kept; each works once. */
export const userRecoveryCodes = pgTable(
  'user_recovery_codes',
  {
    id: id(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    codeHash: text('code_hash').notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('user_recovery_codes_user_hash_key').on(t.userId, t.codeHash)],
);
