import type Stripe from 'stripe';
import { StripeFakeError, type StripeErrorBody } from './errors';
import { cardEntry, expireSession, paySession, requireOpen, sessionRecord, testEntry, type PayResult } from './lifecycle';
import type { FakeState } from './state';
import type { DeliveryAttempt, WebhookSender } from './webhooks';
import type { RefundDesk } from './refund-desk';

/** A card for the pay control: a test number ('4242424242424242') or the fields the page asks for. */
export type CardInput = string | { number: string; expiry?: string; exp_month?: number; exp_year?: number; cvc?: string };

/** A one-time failure of the next matching API call (method and path, e.g. POST /v1/refunds). */
export interface FailNext {
  method: string;
  path: string;
  status: number;
  error: StripeErrorBody;
  /** How many matching calls fail (1 by default): the SDK retries a 409 or 5xx by itself. */
  times?: number;
  /** Sent as Stripe-Should-Retry, which the SDK obeys (Stripe sends false when a retry cannot help). */
  shouldRetry?: boolean;
}

/** Test controls: pay without a browser, and make webhooks arrive twice, late, badly signed or out of order. */
export interface StripeFakeControls {
  /** Pays an open Checkout Session with a test card (4242… by default), as the hosted page does. */
  pay(sessionId: string, card?: CardInput): PayResult;
  /** Expires an open session as its expires_at passing would (checkout.session.expired). */
  expire(sessionId: string): Stripe.Checkout.Session;
  webhookUrls(): string[];
  setWebhookUrls(urls: string[]): void;
  addWebhookUrl(url: string): void;
  /** Every event so far, oldest first (optionally of one type). */
  events(type?: string): Stripe.Event[];
  /** The newest event of a type (undefined when none). */
  lastEvent(type: string): Stripe.Event | undefined;
  /** Sends an event again `times` times (one after another, or all at once), signed normally. */
  deliverAgain(eventId: string, options?: { times?: number; concurrently?: boolean; url?: string }): Promise<DeliveryAttempt[]>;
  /** Sends an event signed with a timestamp `ageSeconds` old (600 by default; Stripe's SDK accepts 300). */
  deliverStale(eventId: string, options?: { ageSeconds?: number; url?: string }): Promise<DeliveryAttempt>;
  /** Sends an event with a signature made with another secret. */
  deliverBadlySigned(eventId: string, options?: { url?: string }): Promise<DeliveryAttempt>;
  /** Holds every delivery (and retry) until release: `release('reverse')` sends them newest first. */
  hold(): void;
  release(order?: 'sent' | 'reverse'): Promise<DeliveryAttempt[]>;
  /** Same as hold / release('sent'). */
  pause(): void;
  resume(): Promise<DeliveryAttempt[]>;
  /** Every delivery attempt so far (optionally for one event). */
  attempts(eventId?: string): DeliveryAttempt[];
  /** Resolves when no delivery is being sent and no retry waits (held ones aside). */
  idle(): Promise<void>;
  /** New card refunds stay 'pending' until settleRefund (default: they succeed at once). */
  refundsStayPending(pending: boolean): void;
  /** Finishes a pending refund: succeeded (refund.updated, charge.refund.updated) or failed (refund.failed). */
  settleRefund(refundId: string, outcome: 'succeeded' | 'failed'): Stripe.Refund;
  /** The next API call(s) matching method and path answer this error (e.g. a 402 on POST /v1/refunds). */
  failNext(failure: FailNext): void;
}

export interface ControlDeps {
  state: FakeState;
  webhooks: WebhookSender;
  refunds: RefundDesk;
  failures: FailNext[];
}

function eventById(state: FakeState, id: string): Stripe.Event {
  const event = state.events.find((e) => e.id === id);
  if (!event)
    throw new StripeFakeError(404, {
      type: 'invalid_request_error',
      code: 'resource_missing',
      message: `No such event: '${id}'`,
      param: 'id',
    });
  return event;
}

export function createControls({ state, webhooks, refunds, failures }: ControlDeps): StripeFakeControls {
  const targets = (url?: string) => (url ? [url] : webhooks.urls);
  return {
    pay(sessionId, card = '4242424242424242') {
      const entry =
        typeof card === 'string'
          ? testEntry(card, new Date(state.nowMs()))
          : cardEntry({ exp_month: 12, exp_year: 2099, cvc: '123', ...card });
      return paySession(state, sessionId, entry);
    },
    expire(sessionId) {
      const record = sessionRecord(state, sessionId);
      requireOpen(record);
      expireSession(state, record, null);
      return record.session;
    },
    webhookUrls: () => [...webhooks.urls],
    setWebhookUrls(urls) {
      webhooks.urls.splice(0, webhooks.urls.length, ...urls);
    },
    addWebhookUrl(url) {
      if (!webhooks.urls.includes(url)) webhooks.urls.push(url);
    },
    events: (type) => state.events.filter((e) => !type || e.type === type),
    lastEvent: (type) => state.events.filter((e) => e.type === type).at(-1),
    async deliverAgain(eventId, { times = 1, concurrently = false, url } = {}) {
      const event = eventById(state, eventId);
      const sends = targets(url).flatMap((u) => Array.from({ length: times }, () => () => webhooks.sendExtra(event, u, 'again')));
      if (concurrently) return Promise.all(sends.map((s) => s()));
      const results: DeliveryAttempt[] = [];
      for (const s of sends) results.push(await s());
      return results;
    },
    async deliverStale(eventId, { ageSeconds = 600, url } = {}) {
      const event = eventById(state, eventId);
      const results = await Promise.all(
        targets(url).map((u) => webhooks.sendExtra(event, u, 'stale', { timestamp: state.now() - ageSeconds })),
      );
      return results[0];
    },
    async deliverBadlySigned(eventId, { url } = {}) {
      const event = eventById(state, eventId);
      const results = await Promise.all(
        targets(url).map((u) => webhooks.sendExtra(event, u, 'badSignature', { secret: 'whsec_not_this_endpoints_secret' })),
      );
      return results[0];
    },
    hold: () => webhooks.hold(),
    release: (order = 'sent') => webhooks.release(order),
    pause: () => webhooks.hold(),
    resume: () => webhooks.release('sent'),
    attempts: (eventId) => webhooks.attempts.filter((a) => !eventId || a.eventId === eventId),
    idle: () => webhooks.idle(),
    refundsStayPending: (pending) => refunds.stayPending(pending),
    settleRefund: (refundId, outcome) => refunds.settle(refundId, outcome),
    failNext(failure) {
      failures.push(failure);
    },
  };
}
