import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, lookupPolicy, tenantId, tenantPolicy } from './columns';
import { firms } from './firms';

/** A client's sign-in to the portal (homeowner, designer or contractor contact). */
export const portalUsers = pgTable(
  'portal_users',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    email: text('email').notNull(),
    name: text('name').notNull(),
    status: text('status', { enum: ['active', 'disabled'] }).notNull().default('active'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('portal_users_tenant_email_key').on(t.tenantId, t.email),
    index('portal_users_email_idx').on(t.email),
    tenantPolicy('portal_users'),
    // A link request arrives with only an e-mail address; the firm is found from it.
    lookupPolicy('portal_users', 'email', 'lookup_email'),
  ],
);

/** One-time portal sign-in links: hash only, single use, short-lived. */
export const portalLinks = pgTable(
  'portal_links',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    portalUserId: uuid('portal_user_id').notNull().references(() => portalUsers.id),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('portal_links_token_hash_key').on(t.tokenHash),
    tenantPolicy('portal_links'),
    lookupPolicy('portal_links', 'token_hash', 'token_hash'),
  ],
);
