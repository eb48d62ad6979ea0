import {
  billingSettings,
  invoiceDraftUpdate,
  invoiceIssue,
  invoiceListQuery,
  invoiceVoid,
  offlinePaymentCreate,
  uuid,
  type BillingSettingsView,
  type BillingToday,
  type InvoiceDetail,
  type InvoiceListQuery,
  type InvoiceSummary,
  type KeysetPage,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { readAsStaff, withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { deleteDraft, updateDraft } from './draft-edits';
import { buildInvoiceListQuery, getInvoice, type InvoiceListRow, invoicePage } from './invoice-read';
import { issueAndRead } from './issue';
import { enqueueCheckoutExpiry } from '../payments/checkout-expiry';
import { recordOfflinePayment } from './offline-payments';
import { clearAttentionNote } from '../payments/attention';
import { enqueueReceiptMail } from '../payments/receipt-mail';
import { getBillingSettings, saveBillingSettings } from './settings';
import { billingToday } from './today';
import { voidInvoice } from './void';

const idParam = z.strictObject({ id: uuid('invoice id') });

/** /api/firm/billing: money rules — office reads, the owner sets, crew never sees them. */
export function billingSettingsRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => getBillingSettings(tx))) satisfies BillingSettingsView);
  });

  router.put('/', async (req, res) => {
    const view = await withStaff(ctx, req, 'owner', (tx, staff) =>
      saveBillingSettings(tx, staffActor(staff), parse(billingSettings, req.body), ctx.now()),
    );
    res.json(view satisfies BillingSettingsView);
  });

  return router;
}

/** /api/invoices: owner and office (crew 403 before any parsing); another firm's invoice is 404 (RLS). */
export function invoiceRoutes(ctx: AppContext): Router {
  const router = Router();
  const deps = { queue: ctx.queue, config: ctx.config };

  router.get('/', async (req, res) => {
    // The busiest read: the person's re-check and the page in one round trip.
    const { input, rows } = await readAsStaff<InvoiceListQuery, InvoiceListRow>(
      ctx,
      req,
      'office',
      () => parse(invoiceListQuery, req.query),
      (tenantId, q) => buildInvoiceListQuery(tenantId, q, ctx.now()),
    );
    res.json(invoicePage(rows, input.limit) satisfies KeysetPage<InvoiceSummary>);
  });

  router.get('/:id', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', (tx) =>
      getInvoice(tx, parse(idParam, req.params).id, ctx.now(), { endsTransaction: true }),
    );
    res.json(detail satisfies InvoiceDetail);
  });

  router.patch('/:id', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      await updateDraft(tx, staffActor(staff), id, parseChanges(invoiceDraftUpdate, req.body), ctx.now());
      return getInvoice(tx, id, ctx.now());
    });
    res.json(detail satisfies InvoiceDetail);
  });

  router.delete('/:id', async (req, res) => {
    await withStaff(ctx, req, 'office', (tx, staff) => deleteDraft(tx, staffActor(staff), parse(idParam, req.params).id, ctx.now()));
    res.status(204).end();
  });

  // Issuing holds the firm's counter row until it commits: the page is read after that COMMIT
  // (issueAndRead), so other issuers wait only for the issue itself.
  router.post('/:id/issue', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', (tx, staff) =>
      issueAndRead(tx, deps, staffActor(staff), parse(idParam, req.params).id, parse(invoiceIssue, req.body), ctx.now()),
    );
    res.json(detail satisfies InvoiceDetail);
  });

  router.post('/:id/void', async (req, res) => {
    const id = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      await voidInvoice(tx, deps, staffActor(staff), id, parse(invoiceVoid, req.body).reason, ctx.now());
      return id;
    });
    res.json(
      (await withStaff(ctx, req, 'office', (tx) => getInvoice(tx, id, ctx.now(), { endsTransaction: true }))) satisfies InvoiceDetail,
    );
  });

  router.post('/:id/payments', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      const recorded = await recordOfflinePayment(tx, staffActor(staff), id, parse(offlinePaymentCreate, req.body), ctx.now());
      // The client's receipt goes out through the outbox with the payment (a client without an e-mail gets none);
      // a payment sent again was mailed the first time.
      if (!recorded.alreadyRecorded) {
        await enqueueReceiptMail(tx, deps, { kind: 'payment', id: recorded.paymentId });
        // A card page opened for the old amount due stops taking money once the job runs (payments/checkout-expiry.ts).
        await enqueueCheckoutExpiry(tx, ctx.queue, id);
      }
      return getInvoice(tx, id, ctx.now());
    });
    res.json(detail satisfies InvoiceDetail);
  });

  return router;
}

/** /api/billing: the money part of Today and its notes to check (owner, office). */
export function billingTodayRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/today', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => billingToday(tx, ctx.now()))) satisfies BillingToday);
  });
  router.post('/attention/:id/clear', async (req, res) => {
    await withStaff(ctx, req, 'office', (tx, staff) =>
      clearAttentionNote(tx, staffActor(staff), parse(z.strictObject({ id: uuid('note id') }), req.params).id),
    );
    res.status(204).end();
  });
  return router;
}
