import { REFUND_PROCESSOR_PROBLEMS, refundCreate, uuid, type RefundView } from '@layerbook/contracts';
import { type Request, Router } from 'express';
import type Stripe from 'stripe';
import { z } from 'zod';
import type { AppContext } from '../context';
import { type Actor, staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { conflict, HttpError } from '../http/problem';
import { parse } from '../http/validate';
import { processorFor } from './processor';
import { askAgain, type CardRefundAnswer, sendCardRefund } from './refund-card';
import { settleRefund } from './refund-settle';
import { pendingCardRefund, readRefund, startRefund } from './refunds';
import { mountStaffReceiptRoutes } from './receipts/receipt-routes';

const paymentParam = z.strictObject({ id: uuid('payment id') });
const refundParam = z.strictObject({ id: uuid('refund id') });

/** The office's side of payments, mounted at /api/payments: refunds and receipt PDFs (owner and office; crew 403). */
export function paymentRoutes(ctx: AppContext): Router {
  const router = Router();
  const deps = { queue: ctx.queue, config: ctx.config };

  /**
   * The processor's answer settles the refund in a second transaction (its event may have settled
   * it first: then nothing more happens). A refusal is 502 with the refund marked failed; no answer
   * is 502 with the refund left pending for its event, or for sending again (same idempotency key).
   */
  async function settleAnswer(req: Request, actor: Actor, refundId: string, answer: CardRefundAnswer): Promise<RefundView> {
    const view = await withStaff(ctx, req, 'office', async (tx) => {
      if (answer.kind === 'answered') await settleRefund(tx, deps, actor, refundId, answer.outcome, ctx.now());
      return readRefund(tx, refundId);
    });
    if (view.status === 'failed') throw new HttpError(502, REFUND_PROCESSOR_PROBLEMS.refused, view.failureMessage ?? undefined);
    if (answer.kind === 'unknown') {
      ctx.logger.warn({ refundId, err: answer.message }, 'card refund sent without an answer; left pending');
      throw new HttpError(
        502,
        REFUND_PROCESSOR_PROBLEMS.noAnswer,
        'The refund is kept as being sent back: it is settled when the processor confirms it, or send it again — nothing is refunded twice.',
      );
    }
    return view;
  }

  const online = (): Stripe => {
    const stripe = processorFor(ctx.config);
    if (!stripe) throw conflict('Online payments are not set up.');
    return stripe;
  };

  /** POST /:id/refunds → 201 RefundView. Offline: recorded at once. Card: reserved (pending), sent, settled. */
  router.post('/:id/refunds', async (req, res) => {
    const stripe = processorFor(ctx.config);
    const { start, actor, tenantId } = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(paymentParam, req.params);
      const actor = staffActor(staff);
      const start = await startRefund(
        tx,
        { ...deps, onlinePayments: stripe !== null },
        actor,
        id,
        parse(refundCreate, req.body),
        ctx.now(),
      );
      return { start, actor, tenantId: tx.tenantId };
    });
    if (start.kind === 'recorded') {
      res.status(201).json(start.view satisfies RefundView);
      return;
    }
    const answer = await sendCardRefund(stripe!, tenantId, start.send);
    res.status(201).json((await settleAnswer(req, actor, start.send.refundId, answer)) satisfies RefundView);
  });

  /**
   * POST /refunds/:id/send → 200 RefundView: a card refund still being sent back (the processor did
   * not answer, or has not finished) is asked about again; 409 once it is settled.
   */
  router.post('/refunds/:id/send', async (req, res) => {
    // Who asks first (crew 403, a bad id 400), then whether there is a processor to ask (409).
    const { refund, actor, tenantId, stripe } = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const id = parse(refundParam, req.params).id;
      return { stripe: online(), refund: await pendingCardRefund(tx, id), actor: staffActor(staff), tenantId: tx.tenantId };
    });
    res.json((await settleAnswer(req, actor, refund.refundId, await askAgain(stripe, tenantId, refund))) satisfies RefundView);
  });

  mountStaffReceiptRoutes(router, ctx);
  return router;
}
