import { uuid } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';
import { logoPng } from '../../billing/pdf/logo';
import type { Reader } from '../../billing/pdf/printable';
import type { AppContext } from '../../context';
import { withClient, withStaff } from '../../http/guards';
import { notFound } from '../../http/problem';
import { parse } from '../../http/validate';
import { clientIdOf } from '../../proposals/client-proposals';
import { loadPaymentReceipt, loadRefundReceipt, type PrintableReceipt } from './receipt-read';
import { receiptFilename, renderReceiptPdf } from './render-receipt';

const paymentParam = z.strictObject({ id: uuid('payment id') });
const refundParam = z.strictObject({ id: uuid('refund id') });

type Opener = (
  ctx: AppContext,
  req: Request,
  load: (tx: TenantTx, reader: Reader) => Promise<PrintableReceipt>,
) => Promise<PrintableReceipt>;

const asOffice: Opener = (ctx, req, load) => withStaff(ctx, req, 'office', (tx) => load(tx, { kind: 'office' }));
const asClient: Opener = (ctx, req, load) =>
  withClient(ctx, req, async (tx, client) => {
    const clientId = await clientIdOf(tx, client);
    if (!clientId) throw notFound('receipt');
    return load(tx, { kind: 'client', clientId });
  });

async function sendReceipt(ctx: AppContext, res: Response, receipt: PrintableReceipt): Promise<void> {
  const pdf = await renderReceiptPdf(receipt, await logoPng(ctx.storage, ctx.logger, receipt.invoice.logoKey));
  res.set({
    'content-type': 'application/pdf',
    'content-disposition': `attachment; filename="${receiptFilename(receipt.number, receipt.invoice.document.jobTitle)}"`,
    'x-content-type-options': 'nosniff',
    'cache-control': 'private, no-store',
    'content-length': String(pdf.length),
  });
  res.end(pdf);
}

/**
 * GET …/payments/:id/receipt.pdf and …/refunds/:id/receipt.pdf for one kind of reader. The rows are
 * read in the firm's transaction; the logo and the drawing happen after it has ended.
 */
function mountReceiptRoutes(router: Router, ctx: AppContext, open: Opener, refundsPath: string, paymentsPath: string): void {
  router.get(`${refundsPath}/:id/receipt.pdf`, async (req, res) => {
    const receipt = await open(ctx, req, (tx, reader) => loadRefundReceipt(tx, parse(refundParam, req.params).id, reader, ctx.now()));
    await sendReceipt(ctx, res, receipt);
  });
  router.get(`${paymentsPath}/:id/receipt.pdf`, async (req, res) => {
    const receipt = await open(ctx, req, (tx, reader) => loadPaymentReceipt(tx, parse(paymentParam, req.params).id, reader, ctx.now()));
    await sendReceipt(ctx, res, receipt);
  });
}

/** The office's receipts, on the router mounted at /api/payments: /:id/receipt.pdf and /refunds/:id/receipt.pdf. */
export function mountStaffReceiptRoutes(router: Router, ctx: AppContext): void {
  mountReceiptRoutes(router, ctx, asOffice, '/refunds', '');
}

/**
 * The client's receipts, on the router mounted at /api/portal: /payments/:id/receipt.pdf and
 * /refunds/:id/receipt.pdf — only their own; anyone else's is 404.
 */
export function mountPortalReceiptRoutes(router: Router, ctx: AppContext): void {
  mountReceiptRoutes(router, ctx, asClient, '/refunds', '/payments');
}
