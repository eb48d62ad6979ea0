import { mkdtempSync, rmSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { PortalSession, StaffSession } from '@layerbook/contracts';
import { startStripeFake, type StripeFake } from '@layerbook/stripe-fake';
import type { Express } from 'express';
import { Pool } from 'pg';
import request from 'supertest';
import { createApp } from '../app';
import { Config, loadConfig } from '../config';
import type { AppContext } from '../context';
import { openObjectStore } from '../files/object-store';
import { startS3Fake } from '../files/s3-fake';
import { createLogger } from '../http/logger';
import { startQueue, StartedQueue } from '../queue/job-queue';
import { startWorkers, Workers } from '../queue/workers';
import type { ParsedMail } from 'mailparser';
import { Inbox, linkIn, startInbox } from './inbox';
import { testDatabaseUrls } from './test-env';

export interface TestServer {
  readonly app: Express;
  readonly ctx: AppContext;
  readonly inbox: Inbox;
  readonly queue: StartedQueue;
  /**
   * This server's own Stripe stand-in (packages/stripe-fake), posting its signed webhooks to this
   * server's /api/payments/webhook, on the server's clock; the server's processor with
   * `{ onlinePayments: true }`. `stripe.controls` pays sessions and replays, delays or spoils
   * deliveries (see the package's README).
   */
  readonly stripe: StripeFake;
  /** Where this server listens (loopback, a free port): the stand-in's webhooks arrive here. */
  readonly baseUrl: string;
  /** Moves the injected clock; every service reads time through ctx.now. */
  setNow(date: Date | null): void;
  stop(): Promise<void>;
}

/**
 * The inboxes of the test servers running in this file, by app, so signUpFirm(app) can follow the
 * sign-up's e-mailed link. Servers share one queue, so any server's worker may send the mail.
 */
const inboxes = new Map<Express, Inbox>();

/** The stand-in's key and webhook secret in API tests (any sk_test_ key would do). */
export const TEST_STRIPE = { secretKey: 'sk_test_layerbook_api_tests', webhookSecret: 'whsec_layerbook_api_tests' } as const;

export interface TestServerOptions {
  /**
   * Card payments through this server's own stand-in (`server.stripe`): STRIPE_SECRET_KEY,
   * STRIPE_WEBHOOK_SECRET and STRIPE_API_BASE point at it. Off by default (no key: no online payments).
   */
  onlinePayments?: boolean;
}

/** A server on a real database with its own inbox, S3 fake and Stripe stand-in (used when `onlinePayments`). */
export async function startTestServer(
  overrides: Partial<Record<keyof Config, string>> = {},
  options: TestServerOptions = {},
): Promise<TestServer> {
  const inbox = await startInbox();
  // Each test server gets its own S3 fake on a free port with a throwaway folder.
  const s3Dir = mkdtempSync(path.join(os.tmpdir(), 'layerbook-s3-'));
  const s3 = await startS3Fake({ directory: s3Dir, port: 0 });
  let fixedNow: Date | null = null;
  // Retries within a test's time (the real schedule waits up to a minute); timestamps on the server's clock.
  const stripe = await startStripeFake({
    port: 0,
    secretKey: TEST_STRIPE.secretKey,
    webhookSecret: TEST_STRIPE.webhookSecret,
    retryDelaysMs: [100, 200, 400, 800],
    now: () => fixedNow ?? new Date(),
  });
  const config = loadConfig({
    NODE_ENV: 'test',
    ...testDatabaseUrls(),
    SESSION_SECRET: 'test-session-secret-that-is-long-enough-123',
    SMTP_PORT: String(inbox.port),
    PUBLIC_URL: 'http://localhost:4300',
    ROOT_DIR: path.resolve(__dirname, '../../..'),
    // Quiet unless asked for (LB_TEST_LOG=debug); the same logger, with its redaction, as the server.
    LOG_LEVEL: process.env['LB_TEST_LOG'] ?? 'silent',
    // Counted in PostgreSQL and shared by every test server on the database, so a whole run's budget.
    SIGN_IN_RATE_LIMIT: '100000',
    PUBLIC_FORM_RATE_LIMIT: '100000',
    S3_ENDPOINT: s3.endpoint,
    ...(options.onlinePayments
      ? { STRIPE_SECRET_KEY: TEST_STRIPE.secretKey, STRIPE_WEBHOOK_SECRET: TEST_STRIPE.webhookSecret, STRIPE_API_BASE: stripe.baseUrl }
      : {}),
    ...overrides,
  });
  const logger = createLogger(config);
  const pool = new Pool({ connectionString: config.DATABASE_URL, max: 5 });
  const queue = await startQueue(config, logger);
  const workers: Workers = await startWorkers(config, queue, logger, () => fixedNow ?? new Date());
  const storage = await openObjectStore(config);
  const ctx: AppContext = { config, pool, queue, logger, storage, now: () => fixedNow ?? new Date() };
  const app = createApp(ctx);
  inboxes.set(app, inbox);
  // Listening for real: the stand-in posts its webhooks over HTTP, as Stripe does.
  const listener = await new Promise<Server>((resolve, reject) => {
    const server = app.listen(0, '127.0.0.1', () => resolve(server)).once('error', reject);
  });
  const baseUrl = `http://127.0.0.1:${(listener.address() as AddressInfo).port}`;
  stripe.controls.setWebhookUrls([`${baseUrl}/api/payments/webhook`]);
  return {
    app,
    ctx,
    inbox,
    queue,
    stripe,
    baseUrl,
    setNow: (d) => (fixedNow = d),
    async stop() {
      listener.closeAllConnections();
      await new Promise<void>((resolve) => listener.close(() => resolve()));
      await queue.stop();
      await workers.stop();
      // The stand-in goes after the queue: a job still talking to it (a refund, a session read) finishes
      // instead of retrying against a closed port while pg-boss waits for it.
      await stripe.stop();
      await pool.end();
      inboxes.delete(app);
      await inbox.close();
      storage.close();
      await s3.stop();
      rmSync(s3Dir, { recursive: true, force: true });
    },
  };
}

export type Agent = ReturnType<typeof request.agent>;

/** A browser-like client: keeps the cookie and sends the CSRF token the session hands out. */
export async function newAgent(
  app: Express,
  area: 'auth' | 'portal' = 'auth',
): Promise<{ agent: Agent; csrf: () => string; refresh: () => Promise<void> }> {
  const agent = request.agent(app);
  let token = '';
  const refresh = async () => {
    const res = await agent.get(area === 'auth' ? '/api/auth/session' : '/api/portal/session');
    token = (res.body as StaffSession | PortalSession).csrfToken;
  };
  await refresh();
  return { agent, csrf: () => token, refresh };
}

let counter = 0;
export const uniqueEmail = (prefix = 'person') => `${prefix}.${Date.now().toString(36)}.${++counter}@example.test`;

/** Signs up a new firm through the API (sign-up, then the e-mailed confirmation link) and returns a signed-in owner agent. */
export async function signUpFirm(app: Express, firmName = 'Test Plaster Studio') {
  const { agent, csrf, refresh } = await newAgent(app);
  const email = uniqueEmail('owner');
  // No word of four letters or more, so no firm name a spec picks can make it a context word.
  const password = 'qz7-xRv4-mn2W-p9k';
  const res = await agent.post('/api/auth/signup').set('x-csrf-token', csrf()).send({ firmName, name: 'Olive Owner', email, password });
  if (res.status !== 202) throw new Error(`signup failed: ${res.status} ${JSON.stringify(res.body)}`);
  const token = await signUpTokenFor(app, email);
  const confirmed = await agent.post('/api/auth/signup/confirm').set('x-csrf-token', csrf()).send({ token });
  if (confirmed.status !== 201) throw new Error(`signup confirm failed: ${confirmed.status} ${JSON.stringify(confirmed.body)}`);
  const { user } = confirmed.body as StaffSession;
  if (!user) throw new Error('signup answered without a signed-in user');
  await refresh();
  return { agent, csrf, email, password, firmId: user.firmId, userId: user.id };
}

/** The token of the sign-up confirmation link e-mailed to `email` (read from the test server's inbox). */
export async function signUpTokenFor(app: Express, email: string): Promise<string> {
  if (!inboxes.has(app)) throw new Error('signUpFirm needs an app from startTestServer (the inboxes hold the link)');
  const match = (m: ParsedMail) => JSON.stringify(m.to ?? '').includes(email) && linkInOrEmpty(m).includes('/sign-up/confirm?');
  // Looks in every inbox (no waiter is left behind on the ones the mail does not reach).
  for (const deadline = Date.now() + 15_000; Date.now() < deadline; await new Promise((r) => setTimeout(r, 50))) {
    const mail = [...inboxes.values()].flatMap((inbox) => inbox.messages).find(match);
    if (mail) return new URL(linkIn(mail)).searchParams.get('token')!;
  }
  throw new Error(`no sign-up link arrived for ${email}`);
}

const linkInOrEmpty = (m: ParsedMail) => m.text?.match(/https?:\/\/\S+/)?.[0] ?? '';
