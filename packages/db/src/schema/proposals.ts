import { date, index, jsonb, numeric, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, sites } from './clients';
import { firms } from './firms';
import { inquiries } from './inquiries';

/**
 * An estimate for the work at one site: the choices the office makes (`inputs`: which finish
 * system goes on which surface, in one or more variants, plus extras) and the numbers the server
 * computed from them with @layerbook/domain (`result`, per variant). The stored numbers are the server's.
 */
export const estimates = pgTable(
  'estimates',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    siteId: uuid('site_id').notNull().references(() => sites.id),
    clientId: uuid('client_id').notNull().references(() => clients.id),
    inquiryId: uuid('inquiry_id').references(() => inquiries.id),
    title: text('title').notNull(),
    status: text('status', { enum: ['draft', 'proposed', 'accepted', 'declined'] }).notNull().default('draft'),
    startDate: date('start_date').notNull(),
    inputs: jsonb('inputs').notNull(),
    result: jsonb('result'),
    /** the first variant's quoted price, for lists and the pipeline */
    price: numeric('price', { precision: 14, scale: 2 }),
    computedAt: timestamp('computed_at', { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('estimates_tenant_created_idx').on(t.tenantId, t.createdAt, t.id), index('estimates_site_idx').on(t.tenantId, t.siteId), tenantPolicy('estimates')],
);
