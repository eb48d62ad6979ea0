import Stripe from 'stripe';
import type { Config } from '../config';

const clients = new WeakMap<Config, Stripe>();

/**
 * The payment processor's client, or null when online payments are not configured (no key).
 * Real Stripe by default; STRIPE_API_BASE points it at the local stand-in (packages/stripe-fake)
 * — configuration alone decides, the code is the same.
 */
export function processorFor(config: Config): Stripe | null {
  if (!config.STRIPE_SECRET_KEY) return null;
  const known = clients.get(config);
  if (known) return known;
  const base = config.STRIPE_API_BASE ? new URL(config.STRIPE_API_BASE) : null;
  const stripe = new Stripe(config.STRIPE_SECRET_KEY, {
    maxNetworkRetries: 2,
    timeout: 20_000,
    appInfo: { name: 'Layerbook' },
    ...(base
      ? {
          host: base.hostname,
          port: Number(base.port || (base.protocol === 'https:' ? 443 : 80)),
          protocol: base.protocol === 'https:' ? 'https' : 'http',
        }
      : {}),
  });
  clients.set(config, stripe);
  return stripe;
}
