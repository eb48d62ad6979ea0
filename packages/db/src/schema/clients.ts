import { sql } from 'drizzle-orm';
import { boolean, index, integer, pgPolicy, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, jobsRole, lookupPolicy, tenantId, tenantPolicy, updatedAt } from './columns';
import { firms } from './firms';

export const CLIENT_KINDS = ['homeowner', 'designer', 'general_contractor', 'other'] as const;

/** A client of the firm: a person or a company. */
export const clients = pgTable(
  'clients',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    kind: text('kind', { enum: CLIENT_KINDS }).notNull(),
    isCompany: boolean('is_company').notNull().default(false),
    name: text('name').notNull(),
    email: text('email').notNull().default(''),
    phone: text('phone').notNull().default(''),
    notes: text('notes').notNull().default(''),
    /** the language of the client's portal, e-mails and PDFs; null = the firm's language */
    language: text('language', { enum: ['en', 'es'] }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('clients_tenant_created_idx').on(t.tenantId, t.createdAt, t.id),
    index('clients_tenant_name_idx').on(t.tenantId, t.name),
    tenantPolicy('clients'),
  ],
);

/** People at a client (the designer's assistant, the contractor's site manager). */
export const clientContacts = pgTable(
  'client_contacts',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    name: text('name').notNull(),
    email: text('email').notNull().default(''),
    phone: text('phone').notNull().default(''),
    roleTitle: text('role_title').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('client_contacts_client_idx').on(t.tenantId, t.clientId), tenantPolicy('client_contacts')],
);

/** A place where work is done: its age drives lead-safe rules, its heights drive access. */
export const sites = pgTable(
  'sites',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    label: text('label').notNull().default(''),
    addressLine1: text('address_line1').notNull(),
    addressLine2: text('address_line2').notNull().default(''),
    city: text('city').notNull().default(''),
    region: text('region').notNull().default(''),
    postalCode: text('postal_code').notNull().default(''),
    country: text('country').notNull().default('US'),
    yearBuilt: integer('year_built'),
    accessNotes: text('access_notes').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('sites_client_idx').on(t.tenantId, t.clientId), tenantPolicy('sites')],
);

/** A client's sign-in to the portal (homeowner, designer or contractor contact). */
export const portalUsers = pgTable(
  'portal_users',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id').references(() => clients.id),
    email: text('email').notNull(),
    name: text('name').notNull(),
    status: text('status', { enum: ['active', 'disabled'] })
      .notNull()
      .default('active'),
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
    portalUserId: uuid('portal_user_id')
      .notNull()
      .references(() => portalUsers.id),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    /** The client asked for it on the sign-in page (capped an hour); false for links the firm's mail carries. */
    asked: boolean('asked').notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('portal_links_token_hash_key').on(t.tokenHash),
    index('portal_links_asked_idx')
      .on(t.portalUserId, t.createdAt)
      .where(sql`asked`),
    tenantPolicy('portal_links'),
    lookupPolicy('portal_links', 'token_hash', 'token_hash'),
    // The hourly prune (jobs role) deletes links used or expired a day ago, for every firm (a delete reads the rows it matches).
    pgPolicy('portal_links_prune_read', { as: 'permissive', for: 'select', to: jobsRole, using: sql`true` }),
    pgPolicy('portal_links_prune', { as: 'permissive', for: 'delete', to: jobsRole, using: sql`true` }),
  ],
);
