import type { FirmChoice } from '@layerbook/contracts';
import { withLookup } from '@layerbook/db';
import type { AppContext } from '../context';

/** The other firms a person is an active member of, by name (memberships and firms open by `app.user_id`). */
export async function otherFirmsOf(ctx: AppContext, userId: string, currentFirmId: string): Promise<FirmChoice[]> {
  const { rows } = await withLookup(ctx.pool, { userId }, (tx) =>
    tx.client.query<FirmChoice>(
      `select f.id, f.name, m.role from memberships m join firms f on f.id = m.tenant_id
        where m.user_id = $1 and m.status = 'active' and m.tenant_id <> $2 order by f.name, f.id`,
      [userId, currentFirmId],
    ),
  );
  return rows;
}
