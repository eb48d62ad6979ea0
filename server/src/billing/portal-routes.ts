import { uuid, type ItemList, type PortalInvoiceDetail, type PortalInvoiceSummary, type PortalStatement } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import { parse } from '../http/validate';
import { mountPortalPdfRoutes } from './pdf-routes';
import { getClientInvoice, getClientStatement, listClientInvoices } from './portal-invoices';

const invoiceParam = z.strictObject({ id: uuid('invoice id') });
const jobParam = z.strictObject({ id: uuid('job id') });

/**
 * The client's side of billing, mounted at /api/portal: their invoices (never drafts), one invoice,
 * its PDF and its credit note's PDF, and a statement per job.
 */
export function portalBillingRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/invoices', async (req, res) => {
    const items = await withClient(ctx, req, (tx, client) => listClientInvoices(tx, client, ctx.now()));
    res.json({ items } satisfies ItemList<PortalInvoiceSummary>);
  });

  router.get('/invoices/:id', async (req, res) => {
    const invoice = await withClient(ctx, req, (tx, client) =>
      getClientInvoice(tx, client, parse(invoiceParam, req.params).id, ctx.now(), ctx.config),
    );
    res.json(invoice satisfies PortalInvoiceDetail);
  });

  router.get('/jobs/:id/statement', async (req, res) => {
    const statement = await withClient(ctx, req, (tx, client) => getClientStatement(tx, client, parse(jobParam, req.params).id));
    res.json(statement satisfies PortalStatement);
  });

  mountPortalPdfRoutes(router, ctx);
  return router;
}
