import { sql } from 'drizzle-orm';
import { index, integer, pgPolicy, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, lookupPolicy, tenantId, tenantPolicy } from './columns';
import { firms } from './firms';

export const STAFF_ROLE_VALUES = ['owner', 'office', 'crew'] as const;

/**
 * A person who signs in to the admin app. Identity only (one row per e-mail across firms);
 * what they may do in a firm lives in `memberships`, which is firm data under RLS.
 */
export const users = pgTable(
  'users',
  {
    id: id(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash').notNull(),
    failedSignIns: integer('failed_sign_ins').notNull().default(0),
    lockedUntil: timestamp('locked_until', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('users_email_key').on(t.email)],
);

export const memberships = pgTable(
  'memberships',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    role: text('role', { enum: STAFF_ROLE_VALUES }).notNull(),
    status: text('status', { enum: ['active', 'deactivated'] })
      .notNull()
      .default('active'),
    /** the language this person reads Layerbook in at this firm; null = the firm's language */
    language: text('language', { enum: ['en', 'es'] }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('memberships_tenant_user_key').on(t.tenantId, t.userId),
    index('memberships_user_idx').on(t.userId),
    tenantPolicy('memberships'),
    // Sign-in needs a person's own memberships before a firm is chosen.
    pgPolicy('memberships_lookup_by_user', {
      as: 'permissive',
      for: 'select',
      to: 'public',
      using: sql`user_id = nullif(current_setting('app.user_id', true), '')::uuid`,
    }),
  ],
);

export const invitations = pgTable(
  'invitations',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    email: text('email').notNull(),
    role: text('role', { enum: STAFF_ROLE_VALUES }).notNull(),
    tokenHash: text('token_hash').notNull(),
    invitedBy: uuid('invited_by')
      .notNull()
      .references(() => users.id),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('invitations_token_hash_key').on(t.tokenHash),
    index('invitations_tenant_created_idx').on(t.tenantId, t.createdAt),
    tenantPolicy('invitations'),
    lookupPolicy('invitations', 'token_hash', 'token_hash'),
  ],
);
