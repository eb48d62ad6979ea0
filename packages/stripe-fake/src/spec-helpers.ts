import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { startStripeFake, type StripeFake, type StripeFakeOptions } from './server';

export const SECRET_KEY = 'sk_test_layerbook_fake_spec';
export const WEBHOOK_SECRET = 'whsec_layerbook_fake_spec';

/** The real SDK pointed at the fake, as the server's processorFor builds it. */
export function sdkFor(fake: StripeFake, key = SECRET_KEY): Stripe {
  return new Stripe(key, { host: '127.0.0.1', port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
}

export interface Received {
  payload: string;
  signature: string;
  status: number;
}

/** A webhook endpoint that records what arrives and answers the status `answer` gives (200 by default). */
export interface Receiver {
  url: string;
  received: Received[];
  answer: (payload: string, index: number) => number;
  close(): Promise<void>;
}

export async function startReceiver(): Promise<Receiver> {
  const receiver: Receiver = { url: '', received: [], answer: () => 200, close: () => Promise.resolve() };
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const payload = Buffer.concat(chunks).toString('utf8');
      const status = receiver.answer(payload, receiver.received.length);
      receiver.received.push({ payload, signature: String(req.headers['stripe-signature'] ?? ''), status });
      res.statusCode = status;
      res.end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  receiver.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/webhook`;
  receiver.close = () =>
    new Promise<void>((resolve) => {
      server.closeAllConnections();
      server.close(() => resolve());
    });
  return receiver;
}

export interface Rig {
  fake: StripeFake;
  stripe: Stripe;
  receiver: Receiver;
  stop(): Promise<void>;
}

/** A fake posting to a recording endpoint, and the SDK pointed at it. */
export async function startRig(options: Partial<StripeFakeOptions> = {}): Promise<Rig> {
  const receiver = await startReceiver();
  const fake = await startStripeFake({
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrls: [receiver.url],
    retryDelaysMs: [20, 40, 80],
    ...options,
  });
  return {
    fake,
    stripe: sdkFor(fake),
    receiver,
    async stop() {
      await fake.stop();
      await receiver.close();
    },
  };
}

/** A Checkout Session as Layerbook creates one (one line, metadata on the session and its PaymentIntent). */
export function createSession(
  stripe: Stripe,
  overrides: Partial<Stripe.Checkout.SessionCreateParams> = {},
  options?: Stripe.RequestOptions,
) {
  const metadata = { tenant_id: 'tenant-1', invoice_id: 'invoice-7', checkout_id: 'checkout-3' };
  return stripe.checkout.sessions.create(
    {
      mode: 'payment',
      line_items: [
        {
          quantity: 1,
          price_data: { currency: 'usd', unit_amount: 125_000, product_data: { name: 'INV-0007 Deposit — Hall in lime plaster' } },
        },
      ],
      customer_email: 'hattie@brambleton.example',
      success_url: 'http://localhost:4300/portal/invoices/invoice-7/payment/checkout-3?session={CHECKOUT_SESSION_ID}',
      cancel_url: 'http://localhost:4300/portal/invoices/invoice-7?payment=cancelled',
      metadata,
      payment_intent_data: { metadata },
      ...overrides,
    },
    options,
  );
}
