import express, { Router } from 'express';
import Stripe from 'stripe';
import type { AppContext } from '../context';
import { badRequest, HttpError } from '../http/problem';
import { eventTenant, storeEvent } from './events';

/** Stripe's default: a signature older than five minutes is refused (a replayed request). */
export const WEBHOOK_TOLERANCE_SECONDS = 300;

/**
 * POST /api/payments/webhook — mounted before the JSON parser, sessions and CSRF: the processor
 * signs the raw body. Checks the signature (and its age) on the raw bytes, stores the event under
 * its firm with its application queued in the same transaction, and answers 200 at once: the
 * effect is the payments-apply job's (apply-event.ts). A second delivery of a stored event is
 * answered 200 and changes nothing. Events that name no firm of ours are answered 200 and logged.
 */
export function paymentWebhookRoutes(ctx: AppContext): Router {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '256kb' }), async (req, res) => {
    const secret = ctx.config.STRIPE_WEBHOOK_SECRET;
    if (!secret) throw new HttpError(503, 'Online payments are off', 'This server takes no card payments.');
    const signature = req.header('stripe-signature');
    if (!signature) throw badRequest([{ field: 'stripe-signature', message: 'The signature header is missing.' }]);
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    let event: Stripe.Event;
    try {
      event = Stripe.webhooks.constructEvent(body, signature, secret, WEBHOOK_TOLERANCE_SECONDS, undefined, ctx.now().getTime());
    } catch (error) {
      const stale = error instanceof Error && /tolerance/i.test(error.message);
      req.log?.warn({ stale }, 'processor webhook refused: signature');
      throw badRequest([
        {
          field: 'stripe-signature',
          message: stale ? 'The signature is too old; the request may be a replay.' : 'The signature does not match the body.',
        },
      ]);
    }
    const tenantId = eventTenant(event);
    if (!tenantId) {
      req.log?.info({ eventId: event.id, type: event.type }, 'processor event names no firm; not stored');
      res.json({ received: true, stored: false });
      return;
    }
    const result = await storeEvent(ctx.pool, ctx.queue, tenantId, event, 'webhook');
    if (result === 'unknownFirm')
      req.log?.warn({ eventId: event.id, type: event.type }, 'processor event names an unknown firm; not stored');
    res.json({ received: true, stored: result !== 'unknownFirm' });
  });
  return router;
}
