import type Stripe from 'stripe';
import { readCard, type CardEntry } from './cards';
import { invalidRequest, resourceMissing } from './errors';
import { newId } from './ids';
import { newCharge, newPaymentIntent } from './objects/payment';
import type { EventCause, FakeState, SessionRecord } from './state';

/** Expires an open session now: status expired, checkout.session.expired. */
export function expireSession(state: FakeState, record: SessionRecord, cause: EventCause | null): void {
  record.session.status = 'expired';
  record.session.url = null;
  state.emit('checkout.session.expired', record.session, cause);
}

/** Open sessions whose expires_at has passed on the fake's clock expire (called before every read). */
export function expireDue(state: FakeState): void {
  const now = state.now();
  for (const record of state.sessions.values()) {
    if (record.session.status === 'open' && record.session.expires_at <= now) expireSession(state, record, null);
  }
}

export function sessionRecord(state: FakeState, id: string, param = 'session'): SessionRecord {
  expireDue(state);
  const record = state.sessions.get(id);
  if (!record) throw resourceMissing('checkout.session', id, param);
  return record;
}

export type PayResult =
  | { ok: true; session: Stripe.Checkout.Session; paymentIntent: Stripe.PaymentIntent }
  | { ok: false; field: 'number' | 'expiry' | 'cvc' | null; message: string; code: string | null; declineCode: string | null };

/**
 * The client pays a session with a card. An accepted test card completes it (PaymentIntent succeeded
 * with a charge; charge.succeeded, payment_intent.succeeded, checkout.session.completed); a declined
 * one leaves it open with the decline on the PaymentIntent (charge.failed, payment_intent.payment_failed).
 * A session that is not open cannot be paid.
 */
export function paySession(state: FakeState, sessionId: string, entry: CardEntry): PayResult {
  const record = sessionRecord(state, sessionId);
  const session = record.session;
  if (session.status !== 'open') {
    const message = session.status === 'complete' ? 'This payment is already complete.' : 'This payment page has expired.';
    return {
      ok: false,
      field: null,
      message,
      code: session.status === 'complete' ? 'checkout_complete' : 'checkout_expired',
      declineCode: null,
    };
  }
  const read = readCard(entry, new Date(state.nowMs()));
  if (!read.ok) return { ok: false, field: read.field, message: read.message, code: 'incorrect_number', declineCode: null };

  const created = state.now();
  let pi = typeof session.payment_intent === 'string' ? state.paymentIntents.get(session.payment_intent) : undefined;
  if (!pi) {
    pi = newPaymentIntent(
      {
        amount: session.amount_total ?? 0,
        currency: session.currency ?? 'usd',
        customer: typeof session.customer === 'string' ? session.customer : null,
        description: record.paymentIntentDescription,
        metadata: { ...record.paymentIntentMetadata },
        receiptEmail: null,
      },
      created,
    );
    state.created(pi.id);
    state.paymentIntents.set(pi.id, pi);
    session.payment_intent = pi.id;
    state.emit('payment_intent.created', pi, null);
  }
  const paymentMethod = newId('pm', 24);
  const email = session.customer_details?.email ?? session.customer_email ?? null;
  const failure = read.test.decline;
  const charge = newCharge({ paymentIntent: pi, paymentMethod, card: read.card, email, failure }, created);
  state.created(charge.id);
  state.charges.set(charge.id, charge);
  pi.latest_charge = charge.id;
  pi.payment_method = paymentMethod;

  if (failure) {
    pi.status = 'requires_payment_method';
    pi.last_payment_error = {
      type: 'card_error',
      code: failure.code,
      decline_code: failure.declineCode,
      message: failure.message,
      charge: charge.id,
      doc_url: `https://docs.stripe.com/error-codes/${failure.code.replace(/_/g, '-')}`,
    };
    state.emit('charge.failed', charge, null);
    state.emit('payment_intent.payment_failed', pi, null);
    return { ok: false, field: null, message: failure.message, code: failure.code, declineCode: failure.declineCode };
  }

  pi.status = 'succeeded';
  pi.amount_received = pi.amount;
  pi.last_payment_error = null;
  session.status = 'complete';
  session.payment_status = 'paid';
  session.url = null;
  session.customer_details = {
    address: null,
    business_name: null,
    email,
    individual_name: null,
    name: null,
    phone: null,
    tax_exempt: 'none',
    tax_ids: [],
  };
  state.emit('charge.succeeded', charge, null);
  state.emit('payment_intent.succeeded', pi, null);
  state.emit('checkout.session.completed', session, null);
  return { ok: true, session, paymentIntent: pi };
}

/** A card entry from loose input (a test control's JSON or the page's fields); '' when absent. */
export function cardEntry(input: {
  number?: unknown;
  expiry?: unknown;
  exp_month?: unknown;
  exp_year?: unknown;
  cvc?: unknown;
}): CardEntry {
  let expMonth = Number(input.exp_month ?? NaN);
  let expYear = Number(input.exp_year ?? NaN);
  if (typeof input.expiry === 'string') {
    const m = /^\s*(\d{1,2})\s*[/\s-]?\s*(\d{2}|\d{4})\s*$/.exec(input.expiry);
    expMonth = m ? Number(m[1]) : NaN;
    expYear = m ? Number(m[2]) : NaN;
  }
  return {
    number: typeof input.number === 'string' ? input.number : '',
    expMonth,
    expYear,
    cvc: typeof input.cvc === 'string' ? input.cvc : '',
  };
}

/** A card number alone (test controls): a valid expiry two years ahead and CVC 123. */
export function testEntry(number: string, now: Date): CardEntry {
  return { number, expMonth: 12, expYear: now.getUTCFullYear() + 2, cvc: '123' };
}

export function requireOpen(record: SessionRecord): void {
  if (record.session.status !== 'open') {
    throw invalidRequest(
      `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${String(record.session.status)}".`,
    );
  }
}
