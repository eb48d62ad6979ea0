import { boolean, index, integer, jsonb, numeric, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { sites } from './clients';
import { files } from './files';
import { firms } from './firms';

/** A room (or an exterior elevation) measured at a site. */
export const rooms = pgTable(
  'rooms',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id),
    name: text('name').notNull(),
    position: integer('position').notNull().default(0),
    isExterior: boolean('is_exterior').notNull().default(false),
    notes: text('notes').notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('rooms_site_idx').on(t.tenantId, t.siteId, t.position), tenantPolicy('rooms')],
);

/**
 * A surface of a room with its measured shape. `shape` holds @layerbook/domain's SurfaceShape
 * (dimensions in the firm's length unit), so the number can be recomputed and audited.
 */
export const surfaces = pgTable(
  'surfaces',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    roomId: uuid('room_id')
      .notNull()
      .references(() => rooms.id),
    name: text('name').notNull(),
    position: integer('position').notNull().default(0),
    shape: jsonb('shape').notNull(),
    lengthUnit: text('length_unit').notNull(),
    disturbedPaintedArea: numeric('disturbed_painted_area', { precision: 12, scale: 2 }),
    notes: text('notes').notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('surfaces_room_idx').on(t.tenantId, t.roomId, t.position), tenantPolicy('surfaces')],
);

/** A photo of a room, taken on the site visit. */
export const roomPhotos = pgTable(
  'room_photos',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    roomId: uuid('room_id')
      .notNull()
      .references(() => rooms.id),
    fileId: uuid('file_id')
      .notNull()
      .references(() => files.id),
    caption: text('caption').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('room_photos_room_idx').on(t.tenantId, t.roomId, t.createdAt), tenantPolicy('room_photos')],
);
