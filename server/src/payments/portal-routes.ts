import { Router } from 'express';
import type { AppContext } from '../context';

/**
 * The client's side of payments, mounted at /api/portal: start a checkout for an invoice's amount
 * due, follow it back from the processor's page, and download receipts.
 */
export function portalPaymentRoutes(ctx: AppContext): Router {
  const router = Router();
  void ctx;
  return router;
}
