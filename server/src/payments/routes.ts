import { refundCreate, uuid, type RefundView } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { HttpError } from '../http/problem';
import { parse } from '../http/validate';
import { processorFor } from './processor';
import { sendCardRefund } from './refund-card';
import { settleRefund } from './refund-settle';
import { readRefund, startRefund } from './refunds';
import { mountStaffReceiptRoutes } from './receipts/receipt-routes';

const paymentParam = z.strictObject({ id: uuid('payment id') });

/** The office's side of payments, mounted at /api/payments: refunds and receipt PDFs (owner and office; crew 403). */
export function paymentRoutes(ctx: AppContext): Router {
  const router = Router();
  const deps = { queue: ctx.queue, config: ctx.config };

  /**
   * POST /:id/refunds → 201 RefundView. Offline: recorded at once. Card: reserved (pending) in a
   * first transaction, sent to the processor outside it, settled in a second; a refusal is 502 with
   * the refund marked failed; no answer is 502 with the refund left pending for the processor's
   * event to settle (its id is the idempotency key, so nothing is ever refunded twice).
   */
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
    const view = await withStaff(ctx, req, 'office', async (tx) => {
      if (answer.kind === 'answered') await settleRefund(tx, deps, actor, start.send.refundId, answer.outcome, ctx.now());
      return readRefund(tx, start.send.refundId);
    });
    if (view.status === 'failed') throw new HttpError(502, 'The payment processor refused the refund', view.failureMessage ?? undefined);
    if (answer.kind === 'unknown') {
      ctx.logger.warn({ refundId: view.id, err: answer.message }, 'card refund sent without an answer; left pending');
      throw new HttpError(
        502,
        'The payment processor did not answer',
        'The refund is kept as being sent back: it is settled when the processor confirms it, and nothing is refunded twice.',
      );
    }
    res.status(201).json(view satisfies RefundView);
  });

  mountStaffReceiptRoutes(router, ctx);
  return router;
}
