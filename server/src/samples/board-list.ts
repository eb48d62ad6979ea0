import type { KeysetPage, SampleBoardListItem, SampleBoardListParams } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { decodeCursor, encodeCursor } from '../inquiries/cursor';

interface ListRow {
  id: string;
  label: string;
  client_id: string;
  client_name: string;
  site_id: string | null;
  round: number;
  status: SampleBoardListItem['status'];
  finish_name: string | null;
  photo_count: number;
  cover_file_id: string | null;
  decided_at: Date | null;
  created_at: Date;
  cursor_at: string;
}

/**
 * The firm's boards, newest first, a page at a time: a keyset over (created_at, id), so a deep page
 * costs what the first does and boards made at the same moment are neither skipped nor repeated.
 * One query brings each board's first photo and photo count: the list shows a thumbnail per row.
 */
export async function listBoards(tx: TenantTx, q: SampleBoardListParams): Promise<KeysetPage<SampleBoardListItem>> {
  const after = q.after ? decodeCursor(q.after, 'timestamptz') : null;
  const { rows } = await tx.client.query<ListRow>(
    `select b.id, b.label, b.client_id, c.name as client_name, b.site_id, b.round, b.status,
            b.finish_snapshot->>'systemName' as finish_name,
            (select count(*)::int from sample_board_photos p where p.tenant_id = b.tenant_id and p.board_id = b.id) as photo_count,
            (select p.file_id from sample_board_photos p where p.tenant_id = b.tenant_id and p.board_id = b.id order by p.created_at, p.id limit 1) as cover_file_id,
            b.decided_at, b.created_at, b.created_at::text as cursor_at
       from sample_boards b join clients c on c.tenant_id = b.tenant_id and c.id = b.client_id
      where b.tenant_id = $1 and ($2::uuid is null or b.client_id = $2) and ($3::uuid is null or b.site_id = $3)
        and ($4::timestamptz is null or (b.created_at, b.id) < ($4::timestamptz, $5::uuid))
      order by b.created_at desc, b.id desc
      limit $6`,
    [tx.tenantId, q.clientId ?? null, q.siteId ?? null, after?.sortValue ?? null, after?.id ?? null, q.limit + 1],
  );
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  return {
    items: page.map((r): SampleBoardListItem => ({
      id: r.id,
      label: r.label,
      clientId: r.client_id,
      clientName: r.client_name,
      siteId: r.site_id,
      round: r.round,
      status: r.status,
      finishName: r.finish_name,
      photoCount: r.photo_count,
      coverThumbnailUrl: r.cover_file_id ? `/api/files/${r.cover_file_id}/thumbnail` : null,
      decidedAt: r.decided_at?.toISOString() ?? null,
      createdAt: r.created_at.toISOString(),
    })),
    nextCursor: rows.length > q.limit && last ? encodeCursor(last.cursor_at, last.id) : null,
  };
}
