import type { TenantTx } from '@layerbook/db';
import { Router } from 'express';
import type { AppContext } from '../../context';
import { withStaff } from '../../http/guards';
import { streamCsv } from './csv-stream';
import { EXPORTS } from './export-kinds';
import { type ExportRequest, parseExportRequest } from './export-query';

/** `<firm-slug>-<kind>-<from>-<to>.csv`; the slug is kept to the characters a file name may hold everywhere. */
async function fileName(tx: TenantTx, q: ExportRequest): Promise<string> {
  const { rows } = await tx.client.query<{ slug: string }>(`select slug from firms where id = $1`, [tx.tenantId]);
  const slug = (rows[0]?.slug ?? 'firm').replace(/[^a-z0-9-]/gi, '') || 'firm';
  return `${slug}-${q.kind}-${q.from}-${q.to}.csv`;
}

/**
 * CSV exports for the accountant, mounted at /api/cash/exports: `GET /:kind.csv?from=&to=` for
 * invoices, payments, refunds, credit-notes and clients. Owner and office (crew 403 before any
 * parsing); the firm's rows only (its tenant transaction); streamed from one snapshot.
 */
export function cashExportRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:kind.csv', async (req, res) => {
    try {
      await withStaff(ctx, req, 'office', async (tx) => {
        const q = parseExportRequest(req.params, req.query);
        res.status(200).set({
          'content-type': 'text/csv; charset=utf-8',
          'content-disposition': `attachment; filename="${await fileName(tx, q)}"`,
          'cache-control': 'no-store',
        });
        await streamCsv(tx, EXPORTS[q.kind], [tx.tenantId, q.from, q.to], res);
      });
    } catch (error) {
      if (!res.headersSent) {
        res.removeHeader('content-disposition');
        throw error;
      }
      // Half a file is already out: the download is cut off (never a file that looks complete), and the error logged.
      req.log?.error({ err: error }, 'cash export stopped');
      res.destroy();
    }
  });

  return router;
}
