import type Stripe from 'stripe';
import { newId } from './ids';

/** The API version the fake speaks (the pinned stripe SDK's). */
export const API_VERSION = '2026-10-28.endive';

/** What caused an event: the API request (id and idempotency key), or null for the hosted page and controls. */
export interface EventCause {
  id: string | null;
  idempotency_key: string | null;
}

export interface SessionRecord {
  session: Stripe.Checkout.Session;
  lineItems: Stripe.LineItem[];
  /** payment_intent_data.metadata, copied to the PaymentIntent the page creates when the client pays. */
  paymentIntentMetadata: Record<string, string>;
  paymentIntentDescription: string | null;
}

export type EventListener = (event: Stripe.Event) => void;

/** Everything the fake holds, in memory: objects unexpanded (ids in references), events oldest first. */
export class FakeState {
  readonly customers = new Map<string, Stripe.Customer>();
  readonly sessions = new Map<string, SessionRecord>();
  readonly paymentIntents = new Map<string, Stripe.PaymentIntent>();
  readonly charges = new Map<string, Stripe.Charge>();
  readonly refunds = new Map<string, Stripe.Refund>();
  readonly events: Stripe.Event[] = [];
  private readonly listeners: EventListener[] = [];
  /** Creation order of every object, so lists with the same `created` second keep a stable order. */
  private readonly order = new Map<string, number>();
  private sequence = 0;

  constructor(private readonly clock: () => Date) {}

  /** Seconds since the epoch, on the fake's clock (tests may inject the server's). */
  now(): number {
    return Math.floor(this.clock().getTime() / 1000);
  }

  nowMs(): number {
    return this.clock().getTime();
  }

  /** Marks an id's place in creation order. */
  created(id: string): void {
    this.order.set(id, ++this.sequence);
  }

  /** Newest first, as Stripe lists: by `created`, then by creation order. */
  compareNewestFirst = (a: { id: string; created: number }, b: { id: string; created: number }): number =>
    b.created - a.created || (this.order.get(b.id) ?? 0) - (this.order.get(a.id) ?? 0);

  onEvent(listener: EventListener): void {
    this.listeners.push(listener);
  }

  /** Records an event with a snapshot of the object as it is now, and hands it to the webhook sender. */
  emit(
    type: Stripe.Event.Type,
    object: { id: string },
    cause: EventCause | null,
    previousAttributes?: Record<string, unknown>,
  ): Stripe.Event {
    const snapshot = JSON.parse(JSON.stringify(object)) as Stripe.Event.Data.Object;
    const event = {
      id: newId('evt', 24),
      object: 'event',
      api_version: API_VERSION,
      created: this.now(),
      data: { object: snapshot, ...(previousAttributes ? { previous_attributes: previousAttributes } : {}) },
      livemode: false,
      pending_webhooks: 0,
      request: cause ?? { id: null, idempotency_key: null },
      type,
    } as Stripe.Event;
    this.created(event.id);
    this.events.push(event);
    for (const listener of this.listeners) listener(event);
    return event;
  }
}
