import { uuid, type CheckoutStart, type CheckoutStatus } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { parse } from '../http/validate';
import { startCheckout } from './checkout';
import { checkoutStatus } from './checkout-status';
import { mountPortalReceiptRoutes } from './receipts/receipt-routes';

const invoiceParam = z.strictObject({ id: uuid('invoice id') });
const checkoutParam = z.strictObject({ id: uuid('invoice id'), checkoutId: uuid('payment id') });

/**
 * The client's side of payments, mounted at /api/portal: start a checkout for an invoice's amount
 * due, follow it back from the processor's page, and download receipts.
 */
export function portalPaymentRoutes(ctx: AppContext): Router {
  const router = Router();

  router.post('/invoices/:id/checkout', async (req, res) => {
    const started = await startCheckout(ctx, req, parse(invoiceParam, req.params).id);
    res.status(201).json(started satisfies CheckoutStart);
  });

  router.get('/invoices/:id/checkout/:checkoutId', async (req, res) => {
    const { id, checkoutId } = parse(checkoutParam, req.params);
    res.json((await checkoutStatus(ctx, req, id, checkoutId)) satisfies CheckoutStatus);
  });

  mountPortalReceiptRoutes(router, ctx);
  return router;
}
