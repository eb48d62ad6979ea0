import { cashReceivablesQuery } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { Router } from 'express';
import type { AppContext } from '../../context';
import { parse } from '../../http/validate';
import { readReport, withStaffReport } from '../read-only';
import { cashReceivableInvoices } from '../receivables';
import { streamCsv } from './csv-stream';
import { EXPORTS } from './export-kinds';
import { parseExportRequest } from './export-query';
import { receivablesCsv } from './receivables-csv';

const FIRM_SLUG = `select slug from firms where id = $1`;

/** `<firm-slug>-<what>.csv`; the slug is kept to the characters a file name may hold everywhere. */
function fileNameOf(rows: readonly Record<string, unknown>[], what: string): string {
  const found = rows[0]?.['slug'];
  const slug = (typeof found === 'string' ? found : 'firm').replace(/[^a-z0-9-]/gi, '') || 'firm';
  return `${slug}-${what}.csv`;
}

async function fileName(tx: TenantTx, what: string): Promise<string> {
  return fileNameOf((await tx.client.query(FIRM_SLUG, [tx.tenantId])).rows, what);
}

const csvHeaders = (name: string) => ({
  'content-type': 'text/csv; charset=utf-8',
  'content-disposition': `attachment; filename="${name}"`,
  'cache-control': 'no-store',
});

/**
 * CSV exports for the accountant, mounted at /api/cash/exports: `GET /:kind.csv?from=&to=` for
 * invoices, payments, refunds, credit-notes and clients (streamed from one snapshot), and
 * `GET /receivables.csv?asOf=` (the receivables page's aging). Owner and office (crew 403 before
 * any parsing); the firm's rows only (its tenant transaction, read-only, on the read replica when there is one).
 */
export function cashExportRoutes(ctx: AppContext): Router {
  const router = Router();

  // The receivables page's aging as of a day (default today in the firm's zone), as the page shows it.
  router.get('/receivables.csv', async (req, res) => {
    const file = await readReport(ctx, req, 'office', (staff) => {
      const { asOf } = parse(cashReceivablesQuery, req.query);
      const drill = cashReceivableInvoices(staff, ctx.now(), asOf ? { asOf } : {});
      return {
        queries: [...drill.queries, { text: FIRM_SLUG, values: [staff.tenantId] }],
        answer: ([found, slug]) => {
          const view = drill.answer([found]);
          return { name: fileNameOf(slug, `receivables-${view.asOf}`), text: receivablesCsv(view) };
        },
      };
    });
    res.status(200).set(csvHeaders(file.name)).send(file.text);
  });

  router.get('/:kind.csv', async (req, res) => {
    try {
      await withStaffReport(ctx, req, 'office', async (tx) => {
        const q = parseExportRequest(req.params, req.query);
        res.status(200).set(csvHeaders(await fileName(tx, `${q.kind}-${q.from}-${q.to}`)));
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
