import type { AddressInfo } from 'node:net';
import { createServer } from 'node:http';
import express from 'express';
import { authenticate, decodeForm, errorHandler, IdempotencyStore, notFound, plumbing } from './api';
import { createControls, type FailNext, type StripeFakeControls } from './controls';
import { StripeFakeError } from './errors';
import { expireDue } from './lifecycle';
import { RefundDesk } from './refund-desk';
import { browserRoutes } from './routes/browser';
import { checkoutRoutes } from './routes/checkout';
import { eventRoutes } from './routes/events';
import { paymentRoutes } from './routes/payments';
import { testControlRoutes } from './routes/test-controls';
import { FakeState } from './state';
import { DEFAULT_RETRY_DELAYS_MS, type DeliveryAttempt, WebhookSender } from './webhooks';

export interface StripeFakeOptions {
  /** 0 (the default) picks a free port. */
  port?: number;
  host?: string;
  /** When set, only this key is accepted; otherwise any sk_test_… key. */
  secretKey?: string;
  /** The webhook endpoint's signing secret (whsec_…), the same the server checks with. */
  webhookSecret: string;
  /** Where events are posted; more can be added later (controls.setWebhookUrls / addWebhookUrl). */
  webhookUrls?: string[];
  /** Waits before each retry of a failed delivery (default 1 s, 2 s, 4 s … 64 s: 8 tries). */
  retryDelaysMs?: number[];
  /** How long a delivery waits for the endpoint's answer (default 10 s). */
  webhookTimeoutMs?: number;
  /** The address the payment page is reached at, if not http://<host>:<port>. */
  publicBaseUrl?: string;
  /** The clock of created, expires_at and signature timestamps (tests pass the server's). */
  now?: () => Date;
  /** Told of every webhook delivery attempt (the CLI logs them). */
  onDeliveryAttempt?: (attempt: DeliveryAttempt) => void;
}

export interface StripeFake {
  baseUrl: string;
  port: number;
  controls: StripeFakeControls;
  stop(): Promise<void>;
}

/** Starts the stand-in on loopback and resolves once it listens. */
export async function startStripeFake(options: StripeFakeOptions): Promise<StripeFake> {
  const state = new FakeState(options.now ?? (() => new Date()));
  const store = new IdempotencyStore();
  const refunds = new RefundDesk(state);
  const failures: FailNext[] = [];
  const webhooks = new WebhookSender(state, {
    secret: options.webhookSecret,
    urls: [...(options.webhookUrls ?? [])],
    retryDelaysMs: options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS,
    timeoutMs: options.webhookTimeoutMs ?? 10_000,
    onAttempt: options.onDeliveryAttempt,
  });
  const controls = createControls({ state, webhooks, refunds, failures });
  const host = options.host ?? '127.0.0.1';
  let baseUrl = '';

  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', (query: string) => decodeForm(query));
  app.use(browserRoutes(state));
  app.use(testControlRoutes(controls));
  app.use('/v1', plumbing(), authenticate(options.secretKey), (req, res, next) => {
    const failure = failures.find((f) => f.method.toUpperCase() === req.method && f.path === `/v1${req.path}`);
    if (!failure) return next();
    failure.times = (failure.times ?? 1) - 1;
    if (failure.times <= 0) failures.splice(failures.indexOf(failure), 1);
    if (failure.shouldRetry !== undefined) res.set('stripe-should-retry', String(failure.shouldRetry));
    next(new StripeFakeError(failure.status, failure.error));
  });
  app.use(checkoutRoutes(state, store, () => options.publicBaseUrl ?? baseUrl));
  app.use(paymentRoutes(state, store, refunds));
  app.use(eventRoutes(state, store));
  app.use(notFound, errorHandler);

  const server = createServer(app);
  server.keepAliveTimeout = 1_000;
  // Sessions expire on the fake's clock even when nobody asks about them.
  const sweep = setInterval(() => expireDue(state), 1_000);
  sweep.unref();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  baseUrl = `http://${host}:${port}`;
  return {
    baseUrl,
    port,
    controls,
    async stop() {
      clearInterval(sweep);
      webhooks.stop();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
