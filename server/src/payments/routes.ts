import { Router } from 'express';
import type { AppContext } from '../context';

/** The office's side of payments, mounted at /api/payments: refunds and receipt PDFs. */
export function paymentRoutes(ctx: AppContext): Router {
  const router = Router();
  void ctx;
  return router;
}
