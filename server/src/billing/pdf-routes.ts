import { uuid } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withClient, withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { clientIdOf } from '../proposals/client-proposals';
import { notFound } from '../http/problem';
import { creditNoteFilename, invoiceFilename } from './pdf/filename';
import { logoPng } from './pdf/logo';
import { loadPrintableCreditNote, loadPrintableInvoice, type Reader } from './pdf/printable';
import { renderCreditNotePdf } from './pdf/render-credit-note';
import { renderInvoicePdf } from './pdf/render-invoice';

const invoiceParam = z.strictObject({ id: uuid('invoice id') });
const creditNoteParam = z.strictObject({ id: uuid('credit note id') });

function sendPdf(res: Response, pdf: Buffer, filename: string): void {
  res.set({
    'content-type': 'application/pdf',
    'content-disposition': `attachment; filename="${filename}"`,
    'x-content-type-options': 'nosniff',
    'cache-control': 'private, no-store',
    'content-length': String(pdf.length),
  });
  res.end(pdf);
}

/** Who reads: staff (owner, office: drafts too, for review) or the signed-in client (their own issued invoices). */
type Opener = <T>(ctx: AppContext, req: Request, load: (tx: TenantTx, reader: Reader) => Promise<T>) => Promise<T>;

const asOffice: Opener = (ctx, req, load) => withStaff(ctx, req, 'office', (tx) => load(tx, { kind: 'office' }));
const asClient: Opener = (ctx, req, load) =>
  withClient(ctx, req, async (tx, client) => {
    const clientId = await clientIdOf(tx, client);
    if (!clientId) throw notFound('invoice');
    return load(tx, { kind: 'client', clientId });
  });

/**
 * GET …/invoices/:id/pdf and …/credit-notes/:id/pdf for one kind of reader. The rows are read in
 * the firm's transaction; the logo and the drawing happen after it has ended (a GET with no side effects).
 */
function mountPdfRoutes(router: Router, ctx: AppContext, open: Opener): void {
  router.get('/invoices/:id/pdf', async (req, res) => {
    const inv = await open(ctx, req, (tx, reader) => loadPrintableInvoice(tx, parse(invoiceParam, req.params).id, reader, ctx.now()));
    const pdf = await renderInvoicePdf(inv, await logoPng(ctx.storage, ctx.logger, inv.logoKey));
    sendPdf(res, pdf, invoiceFilename(inv.number, inv.document.jobTitle));
  });

  router.get('/credit-notes/:id/pdf', async (req, res) => {
    const note = await open(ctx, req, (tx, reader) => loadPrintableCreditNote(tx, parse(creditNoteParam, req.params).id, reader));
    const pdf = await renderCreditNotePdf(note, await logoPng(ctx.storage, ctx.logger, note.logoKey));
    sendPdf(res, pdf, creditNoteFilename(note.number, note.document.jobTitle));
  });
}

/** The office's PDFs, mounted at /api: drafts print with the draft mark for review. */
export function billingPdfRoutes(ctx: AppContext): Router {
  const router = Router();
  mountPdfRoutes(router, ctx, asOffice);
  return router;
}

/** The client's PDFs, mounted at /api/portal: only their own issued invoices and their credit notes. */
export function mountPortalPdfRoutes(router: Router, ctx: AppContext): void {
  mountPdfRoutes(router, ctx, asClient);
}
