import { index, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { firms } from './firms';

/**
 * A product the firm buys: how it is counted, the containers it is sold in (with prices as decimal
 * strings) and its hazards. `containers` and `hazards` are stored in the shapes @layerbook/domain
 * computes with (Container[], ProductHazards) and validated by @layerbook/contracts on the way in.
 */
export const products = pgTable(
  'products',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    name: text('name').notNull(),
    kind: text('kind').notNull(),
    unit: text('unit').notNull(),
    containers: jsonb('containers').notNull().default([]),
    hazards: jsonb('hazards').notNull().default({}),
    sdsUrl: text('sds_url').notNull().default(''),
    notes: text('notes').notNull().default(''),
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('products_tenant_name_idx').on(t.tenantId, t.name), tenantPolicy('products')],
);

/**
 * A finish system: an ordered stack of layers, edited and priced as a whole. `layers` holds
 * FinishLayer[] in @layerbook/domain's shape (product ids refer to `products`).
 */
export const finishSystems = pgTable(
  'finish_systems',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    layers: jsonb('layers').notNull().default([]),
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('finish_systems_tenant_name_idx').on(t.tenantId, t.name), tenantPolicy('finish_systems')],
);
