import express, { Router } from 'express';
import type { AppContext } from '../context';

/**
 * POST /api/payments/webhook — mounted before the JSON parser, sessions and CSRF: the processor
 * signs the raw body. Checks the signature, stores the event under its firm, queues its
 * application and answers 2xx at once. (Owner: payments online part — see events.ts.)
 */
export function paymentWebhookRoutes(ctx: AppContext): Router {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '256kb' }), (_req, res) => {
    void ctx;
    res.status(503).json({ title: 'Not built yet' });
  });
  return router;
}
