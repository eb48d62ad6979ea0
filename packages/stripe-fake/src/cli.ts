import { startStripeFake } from './server';

/**
 * `node packages/stripe-fake/dist/cli.js --port 12111`: the stand-in as a process of its own, for
 * `npm start` and the e2e setup (started by PID, stopped with SIGTERM). Environment:
 * STRIPE_WEBHOOK_SECRET (required: the server's), STRIPE_FAKE_WEBHOOK_URL (comma-separated endpoints),
 * STRIPE_SECRET_KEY (optional: accept only this key), STRIPE_FAKE_PUBLIC_URL (optional: the payment
 * page's address when not http://127.0.0.1:<port>).
 */
async function run(): Promise<void> {
  const args = process.argv.slice(2);
  const at = args.indexOf('--port');
  const port = Number(at >= 0 ? args[at + 1] : (process.env['STRIPE_FAKE_PORT'] ?? 12111));
  const webhookSecret = process.env['STRIPE_WEBHOOK_SECRET'];
  if (!webhookSecret) throw new Error('STRIPE_WEBHOOK_SECRET is needed: the stand-in signs its webhooks with the server’s secret.');
  const webhookUrls = (process.env['STRIPE_FAKE_WEBHOOK_URL'] ?? '')
    .split(',')
    .map((u) => u.trim())
    .filter(Boolean);
  const fake = await startStripeFake({
    port,
    webhookSecret,
    webhookUrls,
    secretKey: process.env['STRIPE_SECRET_KEY'] || undefined,
    publicBaseUrl: process.env['STRIPE_FAKE_PUBLIC_URL'] || undefined,
    onDeliveryAttempt: (a) =>
      console.log(`${a.sentAt} webhook ${a.type} ${a.eventId} → ${a.url}: ${a.status ?? a.error ?? ''} (${a.kind}, try ${a.attempt})`),
  });
  console.log(`Stripe stand-in listening at ${fake.baseUrl}; webhooks to ${webhookUrls.join(', ') || '(none yet)'}`);
  const stop = () => void fake.stop().then(() => process.exit(0));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

run().catch((error) => {
  console.error(error);
  process.exit(1);
});
