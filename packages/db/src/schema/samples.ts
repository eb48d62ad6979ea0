import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id, tenantId, tenantPolicy, updatedAt } from './columns';
import { clients, portalUsers, sites } from './clients';
import { files } from './files';
import { firms } from './firms';
import { finishSystems } from './library';
import { estimates } from './proposals';

/**
 * A sample board made for a client: the finish as it was made (a snapshot of the finish system,
 * so the crew can reproduce the approved board as the control sample), photos, and the client's word.
 */
export const sampleBoards = pgTable(
  'sample_boards',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    clientId: uuid('client_id')
      .notNull()
      .references(() => clients.id),
    siteId: uuid('site_id').references(() => sites.id),
    estimateId: uuid('estimate_id').references(() => estimates.id),
    label: text('label').notNull(),
    round: integer('round').notNull().default(1),
    /** the board this round follows (after the client asked for changes); one next round per board */
    previousBoardId: uuid('previous_board_id'),
    finishSystemId: uuid('finish_system_id').references(() => finishSystems.id),
    finishSnapshot: jsonb('finish_snapshot'),
    notes: text('notes').notNull().default(''),
    status: text('status', { enum: ['draft', 'shown', 'approved', 'changes_requested'] })
      .notNull()
      .default('draft'),
    clientComment: text('client_comment').notNull().default(''),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
    decidedBy: uuid('decided_by').references(() => portalUsers.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('sample_boards_client_idx').on(t.tenantId, t.clientId, t.createdAt),
    // The firm's board list pages by (created_at, id), newest first (samples/board-list.ts).
    index('sample_boards_list_idx').on(t.tenantId, t.createdAt, t.id),
    uniqueIndex('sample_boards_previous_key').on(t.tenantId, t.previousBoardId),
    tenantPolicy('sample_boards'),
  ],
);

export const sampleBoardPhotos = pgTable(
  'sample_board_photos',
  {
    id: id(),
    tenantId: tenantId().references(() => firms.id),
    boardId: uuid('board_id')
      .notNull()
      .references(() => sampleBoards.id),
    fileId: uuid('file_id')
      .notNull()
      .references(() => files.id),
    caption: text('caption').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('sample_board_photos_board_idx').on(t.tenantId, t.boardId, t.createdAt), tenantPolicy('sample_board_photos')],
);
