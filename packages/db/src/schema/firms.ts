import { sql } from 'drizzle-orm';
import { boolean, jsonb, pgPolicy, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, currentTenant, id, jobsRole, lookupPolicy, tenantPolicy, updatedAt } from './columns';

/** The tenant. Its own id is its tenant id, so the policy compares `id`. */
export const firms = pgTable(
  'firms',
  {
    id: id(),
    name: text('name').notNull(),
    slug: text('slug').notNull(),
    addressLine1: text('address_line1').notNull().default(''),
    addressLine2: text('address_line2').notNull().default(''),
    city: text('city').notNull().default(''),
    region: text('region').notNull().default(''),
    postalCode: text('postal_code').notNull().default(''),
    country: text('country').notNull().default('US'),
    phone: text('phone').notNull().default(''),
    /** the firm's tax registration (VAT, GST, EIN…) printed on invoices; '' when none */
    taxId: text('tax_id').notNull().default(''),
    /** the logo printed on proposals, invoices and credit notes (a `files` row) */
    logoFileId: uuid('logo_file_id'),
    timeZone: text('time_zone').notNull().default('America/New_York'),
    currency: text('currency').notNull().default('USD'),
    units: text('units', { enum: ['imperial', 'metric'] })
      .notNull()
      .default('imperial'),
    language: text('language', { enum: ['en', 'es'] })
      .notNull()
      .default('en'),
    /** owner and office must sign in with a second factor (auth/second-factor) */
    secondFactorRequired: boolean('second_factor_required').notNull().default(false),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('firms_slug_key').on(t.slug),
    pgPolicy('firms_tenant_isolation', {
      as: 'permissive',
      for: 'all',
      to: 'public',
      using: sql`id = ${currentTenant}`,
      withCheck: sql`id = ${currentTenant}`,
    }),
    // The public inquiry form names its firm by slug; only that firm's row opens.
    lookupPolicy('firms', 'slug', 'lookup_slug'),
    // A person in several firms sees the names of those they are an active member of (the firm switch).
    pgPolicy('firms_lookup_by_member', {
      as: 'permissive',
      for: 'select',
      to: 'public',
      using: sql`exists (select 1 from memberships m where m.tenant_id = firms.id and m.status = 'active'
        and m.user_id = nullif(current_setting('app.user_id', true), '')::uuid)`,
    }),
    // The scheduler walks every firm (to fire each one's daily jobs at its local hour); it reads only.
    pgPolicy('firms_scheduler_read', { as: 'permissive', for: 'select', to: jobsRole, using: sql`true` }),
  ],
);

/**
 * How the firm prices and schedules work: rates, overhead and profit method, minimum charge, tax,
 * rounding, calendar and crew. `settings` holds @layerbook/contracts' EstimatingSettings.
 */
export const firmEstimatingSettings = pgTable(
  'firm_estimating_settings',
  {
    tenantId: uuid('tenant_id')
      .primaryKey()
      .references(() => firms.id),
    settings: jsonb('settings').notNull(),
    updatedAt: updatedAt(),
  },
  () => [tenantPolicy('firm_estimating_settings')],
);
