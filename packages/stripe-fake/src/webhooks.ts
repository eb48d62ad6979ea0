import { createHmac } from 'node:crypto';
import type Stripe from 'stripe';
import type { FakeState } from './state';

/** How a delivery was made: the normal first try, a retry, or one a test control asked for. */
export type DeliveryKind = 'first' | 'retry' | 'again' | 'stale' | 'badSignature';

export interface DeliveryAttempt {
  eventId: string;
  type: string;
  url: string;
  kind: DeliveryKind;
  /** 1 for the first try of a delivery chain, 2 for its first retry … (1 for test-control deliveries). */
  attempt: number;
  /** When it was sent (wall clock, ISO) and the timestamp it was signed with (fake clock, seconds). */
  sentAt: string;
  signedAt: number;
  /** The endpoint's HTTP status, or null when it could not be reached. */
  status: number | null;
  ok: boolean;
  error: string | null;
}

export interface WebhookOptions {
  secret: string;
  urls: string[];
  /** Waits before each retry; a failed delivery is tried 1 + retryDelaysMs.length times. */
  retryDelaysMs: number[];
  timeoutMs: number;
  onAttempt?: (attempt: DeliveryAttempt) => void;
}

export const DEFAULT_RETRY_DELAYS_MS = [1_000, 2_000, 4_000, 8_000, 16_000, 32_000, 64_000];

/** Stripe's scheme: `t=<seconds>,v1=<hex HMAC-SHA256 of "<t>.<payload>" with the endpoint secret>`. */
export function signatureHeader(payload: string, secret: string, timestamp: number): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

interface Pending {
  event: Stripe.Event;
  url: string;
  attempt: number;
}

/**
 * Sends every event to every endpoint, signed, and retries a delivery that fails (non-2xx or no
 * answer) after each of retryDelaysMs. Held (paused) deliveries wait in a queue until released, in
 * the order they were made or reversed.
 */
export class WebhookSender {
  readonly attempts: DeliveryAttempt[] = [];
  private held = false;
  private readonly queue: Pending[] = [];
  private readonly timers = new Set<NodeJS.Timeout>();
  private inFlight = 0;
  private idleWaiters: Array<() => void> = [];
  private stopped = false;
  /** Endpoints an event has not yet reached with a 2xx, by event id (Stripe's pending_webhooks). */
  private readonly unreached = new Map<string, Set<string>>();

  constructor(
    private readonly state: FakeState,
    readonly options: WebhookOptions,
  ) {
    state.onEvent((event) => this.dispatch(event));
  }

  get urls(): string[] {
    return this.options.urls;
  }

  private dispatch(event: Stripe.Event): void {
    if (this.stopped || this.options.urls.length === 0) return;
    this.unreached.set(event.id, new Set(this.options.urls));
    event.pending_webhooks = this.options.urls.length;
    for (const url of this.options.urls) this.enqueue({ event, url, attempt: 1 });
  }

  private enqueue(pending: Pending): void {
    if (this.held) this.queue.push(pending);
    else void this.run(pending);
  }

  /** One try of a delivery chain; on failure the next try is scheduled while tries remain. */
  private async run(pending: Pending): Promise<DeliveryAttempt> {
    const result = await this.send(pending.event, pending.url, pending.attempt === 1 ? 'first' : 'retry', pending.attempt);
    if (result.ok) {
      const left = this.unreached.get(pending.event.id);
      left?.delete(pending.url);
      pending.event.pending_webhooks = left?.size ?? 0;
    } else if (pending.attempt <= this.options.retryDelaysMs.length && !this.stopped) {
      const delay = this.options.retryDelaysMs[pending.attempt - 1];
      const timer = setTimeout(() => {
        this.timers.delete(timer);
        this.enqueue({ ...pending, attempt: pending.attempt + 1 });
        this.settle();
      }, delay);
      this.timers.add(timer);
    }
    this.settle();
    return result;
  }

  /** A delivery a test control asks for (no retries); idle() waits for it too. */
  async sendExtra(
    event: Stripe.Event,
    url: string,
    kind: DeliveryKind,
    sign: { secret?: string; timestamp?: number } = {},
  ): Promise<DeliveryAttempt> {
    try {
      return await this.send(event, url, kind, 1, sign);
    } finally {
      this.settle();
    }
  }

  /** Posts the event as Stripe does and records the attempt. */
  private async send(
    event: Stripe.Event,
    url: string,
    kind: DeliveryKind,
    attempt = 1,
    sign: { secret?: string; timestamp?: number } = {},
  ): Promise<DeliveryAttempt> {
    const payload = JSON.stringify(event, null, 2);
    const signedAt = sign.timestamp ?? this.state.now();
    const record: DeliveryAttempt = {
      eventId: event.id,
      type: event.type,
      url,
      kind,
      attempt,
      sentAt: new Date().toISOString(),
      signedAt,
      status: null,
      ok: false,
      error: null,
    };
    this.inFlight++;
    try {
      const res = await fetch(url, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'user-agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
          'cache-control': 'no-cache',
          accept: '*/*; q=0.5, application/xml',
          'stripe-signature': signatureHeader(payload, sign.secret ?? this.options.secret, signedAt),
        },
        body: payload,
        signal: AbortSignal.timeout(this.options.timeoutMs),
      });
      await res.arrayBuffer().catch(() => undefined);
      record.status = res.status;
      record.ok = res.status >= 200 && res.status < 300;
      if (!record.ok) record.error = `HTTP ${res.status}`;
    } catch (error) {
      record.error = error instanceof Error ? (error.cause instanceof Error ? error.cause.message : error.message) : String(error);
    } finally {
      this.inFlight--;
    }
    this.attempts.push(record);
    this.options.onAttempt?.(record);
    return record;
  }

  hold(): void {
    this.held = true;
  }

  /** Ends a hold: sends what waited one after another (first tries await their answer), oldest or newest first. */
  async release(order: 'sent' | 'reverse' = 'sent'): Promise<DeliveryAttempt[]> {
    this.held = false;
    const waiting = this.queue.splice(0);
    if (order === 'reverse') waiting.reverse();
    const results: DeliveryAttempt[] = [];
    for (const pending of waiting) results.push(await this.run(pending));
    return results;
  }

  get holding(): boolean {
    return this.held;
  }

  get heldCount(): number {
    return this.queue.length;
  }

  /** Resolves once nothing is being sent and no retry is waiting (held deliveries do not count). */
  idle(): Promise<void> {
    if (this.isIdle()) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  private isIdle(): boolean {
    return this.inFlight === 0 && this.timers.size === 0;
  }

  private settle(): void {
    if (!this.isIdle()) return;
    const waiters = this.idleWaiters.splice(0);
    for (const resolve of waiters) resolve();
  }

  stop(): void {
    this.stopped = true;
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    this.queue.splice(0);
    this.settle();
  }
}
