import { FIRM_EXPORT_FORMAT_VERSION, firmExportQuery } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { Router } from 'express';
import { recordAudit } from '../../audit/record';
import type { AppContext } from '../../context';
import { withStaff } from '../../http/guards';
import { parse } from '../../http/validate';
import { localDate } from '../local-date';
import { writeFirmExport } from './write-export';

/**
 * `GET /api/firm/export` (owner only): every piece of the firm's data as a zip. The owner's request
 * is checked and audited ('firm.exported') in its own transaction on the primary; the data is then
 * read in a read-only tenant transaction (which, on the primary, sees that entry too).
 */
export function firmExportRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const asked = await withStaff(ctx, req, 'owner', async (tx, staff) => {
      parse(firmExportQuery, req.query);
      await recordAudit(tx, {
        actorUserId: staff.id,
        actorKind: 'staff',
        action: 'firm.exported',
        entity: 'firm',
        entityId: tx.tenantId,
        data: { formatVersion: FIRM_EXPORT_FORMAT_VERSION },
      });
      const { rows } = await tx.client.query<{ slug: string; time_zone: string }>(`select slug, time_zone from firms where id = $1`, [
        tx.tenantId,
      ]);
      return { tenantId: tx.tenantId, slug: rows[0]?.slug ?? 'firm', timeZone: rows[0]?.time_zone ?? 'UTC' };
    });
    const now = ctx.now();
    const slug = asked.slug.replace(/[^a-z0-9-]/gi, '') || 'firm';
    res.status(200).set({
      'content-type': 'application/zip',
      'content-disposition': `attachment; filename="${slug}-data-${localDate(asked.timeZone, now)}.zip"`,
      'cache-control': 'no-store',
    });
    try {
      // A report that only reads: on the read replica when there is one (DATABASE_READ_URL), as the cash exports.
      await withTenant(ctx.readPool ?? ctx.pool, asked.tenantId, (tx) => writeFirmExport(tx, ctx.storage, now, res));
    } catch (error) {
      if (!res.headersSent) {
        res.removeHeader('content-disposition');
        res.removeHeader('content-type');
        throw error;
      }
      req.log?.error({ err: error }, 'firm export stopped');
      res.destroy();
    }
  });

  return router;
}
