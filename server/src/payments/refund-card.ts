import Stripe from 'stripe';
import type { RefundOutcome } from './refund-settle';
import type { CardRefundToSend } from './refunds';

/** What asking the processor gave: a final or pending answer, or no answer at all (the outcome is unknown). */
export type CardRefundAnswer =
  { readonly kind: 'answered'; readonly outcome: RefundOutcome } | { readonly kind: 'unknown'; readonly message: string };

/**
 * Asks the processor to give a reserved refund back to the card, outside any transaction. The
 * idempotency key is our refund's id, so the SDK's own retries and any later attempt with the same
 * refund never refund twice; the metadata lets the processor's refund events find our row.
 * A refusal (a 4xx answer: already refunded, amount too large…) is final and told in words; no
 * answer (network, the processor's 5xx, a 409 for the key in use or a 429 after the SDK's retries)
 * leaves the refund pending, for its event or a later ask to settle.
 */
export async function sendCardRefund(stripe: Stripe, tenantId: string, refund: CardRefundToSend): Promise<CardRefundAnswer> {
  try {
    const answer = await stripe.refunds.create(
      {
        payment_intent: refund.paymentIntentId,
        amount: refund.processorAmount,
        metadata: { tenant_id: tenantId, refund_id: refund.refundId },
      },
      { idempotencyKey: refund.refundId },
    );
    return { kind: 'answered', outcome: outcomeOf(answer) };
  } catch (error) {
    // 409 (the same key still being worked on) and 429 (too many requests) are no answer yet: the first
    // request may still refund, so the refund stays being sent back rather than freeing its amount.
    const notYet = (status: number) => status === 409 || status === 429;
    if (
      error instanceof Stripe.errors.StripeError &&
      error.statusCode !== undefined &&
      error.statusCode < 500 &&
      !notYet(error.statusCode)
    ) {
      return { kind: 'answered', outcome: { status: 'failed', message: refusalWords(error) } };
    }
    return { kind: 'unknown', message: error instanceof Error ? error.message : String(error) };
  }
}

/**
 * A pending card refund asked about again: the processor's refund read back when we know its id;
 * else the payment's refunds at the processor are listed and the one carrying our refund id in its
 * metadata is taken; only when none does is it sent again (same idempotency key). Listing first
 * matters because the processor forgets an idempotency key after 24 hours (Stripe Docs
 * "Idempotent requests"), so a second send a day later would make a second refund.
 */
export async function askAgain(
  stripe: Stripe,
  tenantId: string,
  refund: CardRefundToSend & { readonly processorRefundId: string | null },
): Promise<CardRefundAnswer> {
  try {
    if (refund.processorRefundId) return { kind: 'answered', outcome: outcomeOf(await stripe.refunds.retrieve(refund.processorRefundId)) };
    for await (const made of stripe.refunds.list({ payment_intent: refund.paymentIntentId, limit: 100 })) {
      if (made.metadata?.['refund_id'] === refund.refundId) return { kind: 'answered', outcome: outcomeOf(made) };
    }
  } catch (error) {
    return { kind: 'unknown', message: error instanceof Error ? error.message : String(error) };
  }
  return sendCardRefund(stripe, tenantId, refund);
}

/** A processor refund object as our outcome: succeeded, failed (or canceled), or still on its way. */
export function outcomeOf(refund: Stripe.Refund): RefundOutcome {
  switch (refund.status) {
    case 'succeeded':
      return { status: 'succeeded', processorRefundId: refund.id };
    case 'failed':
    case 'canceled':
      return {
        status: 'failed',
        processorRefundId: refund.id,
        message: refund.failure_reason
          ? `The refund did not go through: ${refund.failure_reason.replace(/_/g, ' ')}.`
          : `The refund was ${refund.status === 'canceled' ? 'cancelled' : 'refused'} by the processor.`,
      };
    default:
      return { status: 'pending', processorRefundId: refund.id };
  }
}

function refusalWords(error: InstanceType<typeof Stripe.errors.StripeError>): string {
  if (error.code === 'charge_already_refunded') return 'The processor says this payment was already refunded in full.';
  if (error.statusCode === 401 || error.statusCode === 403) return 'The processor refused our key: check the online payments set-up.';
  return `The processor refused the refund: ${error.message}`;
}
