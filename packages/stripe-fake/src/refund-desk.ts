import type Stripe from 'stripe';
import { invalidRequest, resourceMissing } from './errors';
import { formatAmount } from './minimums';
import { newRefund } from './objects/payment';
import type { EventCause, FakeState } from './state';

export interface RefundRequest {
  paymentIntent?: string;
  charge?: string;
  amount?: number;
  metadata: Record<string, string>;
  reason: Stripe.Refund.Reason | null;
}

/** Card refunds: never more than was charged and not yet refunded; pending refunds count as taken. */
export class RefundDesk {
  private pendingByDefault = false;

  constructor(private readonly state: FakeState) {}

  stayPending(pending: boolean): void {
    this.pendingByDefault = pending;
  }

  private chargeFor(request: RefundRequest): Stripe.Charge {
    if (request.charge) {
      const charge = this.state.charges.get(request.charge);
      if (!charge) throw resourceMissing('charge', request.charge, 'charge');
      return charge;
    }
    if (!request.paymentIntent)
      throw invalidRequest('One of the following params should be provided for this request: payment_intent or charge.');
    const pi = this.state.paymentIntents.get(request.paymentIntent);
    if (!pi) throw resourceMissing('payment_intent', request.paymentIntent, 'payment_intent');
    const charge = typeof pi.latest_charge === 'string' ? this.state.charges.get(pi.latest_charge) : undefined;
    if (pi.status !== 'succeeded' || !charge || charge.status !== 'succeeded') {
      throw invalidRequest(
        `This PaymentIntent (${pi.id}) does not have a successful charge to refund.`,
        'payment_intent',
        'charge_not_refundable',
      );
    }
    return charge;
  }

  /** What is still taken by refunds that have not failed. */
  private taken(chargeId: string): number {
    return [...this.state.refunds.values()]
      .filter((r) => r.charge === chargeId && (r.status === 'succeeded' || r.status === 'pending'))
      .reduce((sum, r) => sum + r.amount, 0);
  }

  create(request: RefundRequest, cause: EventCause | null): Stripe.Refund {
    const charge = this.chargeFor(request);
    const available = charge.amount - this.taken(charge.id);
    if (available <= 0) throw invalidRequest(`Charge ${charge.id} has already been refunded.`, undefined, 'charge_already_refunded');
    const amount = request.amount ?? available;
    if (amount <= 0) throw invalidRequest('Invalid positive integer', 'amount');
    if (amount > available) {
      throw invalidRequest(
        `Refund amount (${formatAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatAmount(available, charge.currency)})`,
        'amount',
        'amount_too_large',
      );
    }
    const refund = newRefund(
      { charge, amount, metadata: request.metadata, reason: request.reason, status: this.pendingByDefault ? 'pending' : 'succeeded' },
      this.state.now(),
    );
    this.state.created(refund.id);
    this.state.refunds.set(refund.id, refund);
    this.state.emit('refund.created', refund, cause);
    if (refund.status === 'succeeded') this.applyToCharge(charge, cause);
    return refund;
  }

  /**
   * The charge shows what succeeded refunds took back; charge.refunded says so. As Stripe since API
   * 2022-11-15, the charge does not embed its refunds (only with `expand[]=refunds`): list them.
   */
  private applyToCharge(charge: Stripe.Charge, cause: EventCause | null): void {
    const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
    const succeeded = [...this.state.refunds.values()].filter((r) => r.charge === charge.id && r.status === 'succeeded');
    charge.amount_refunded = succeeded.reduce((sum, r) => sum + r.amount, 0);
    charge.refunded = charge.amount_refunded >= charge.amount;
    this.state.emit('charge.refunded', charge, cause, previous);
  }

  settle(refundId: string, outcome: 'succeeded' | 'failed'): Stripe.Refund {
    const refund = this.state.refunds.get(refundId);
    if (!refund) throw resourceMissing('refund', refundId);
    if (refund.status !== 'pending') throw invalidRequest(`Refund ${refundId} is ${String(refund.status)}, not pending.`);
    const charge = this.state.charges.get(refund.charge as string)!;
    refund.status = outcome;
    if (outcome === 'succeeded') {
      this.state.emit('refund.updated', refund, null, { status: 'pending' });
      this.state.emit('charge.refund.updated', refund, null, { status: 'pending' });
      this.applyToCharge(charge, null);
    } else {
      refund.failure_reason = 'declined';
      this.state.emit('refund.failed', refund, null, { status: 'pending' });
      this.state.emit('refund.updated', refund, null, { status: 'pending' });
    }
    return refund;
  }
}
