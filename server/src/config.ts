import path from 'node:path';
import { z } from 'zod';

const flag = z.enum(['true', 'false']).transform((v) => v === 'true');

const schema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(4300),
    // Links are built as `${PUBLIC_URL}/path`: a trailing slash given here would make them `//path`.
    PUBLIC_URL: z
      .url()
      .default('http://localhost:4300')
      .transform((url) => url.replace(/\/+$/, '')),
    DATABASE_URL: z.string().min(1),
    DATABASE_OWNER_URL: z.string().min(1),
    DATABASE_JOBS_URL: z.string().min(1),
    /**
     * A read replica (a streaming standby) for reports that only read: the cash figures and exports.
     * Same app role as DATABASE_URL; unset, they read the primary.
     */
    DATABASE_READ_URL: z.preprocess((v) => (v === '' ? undefined : v), z.string().min(1).optional()),
    SESSION_SECRET: z.string().min(32, { error: 'SESSION_SECRET must have at least 32 characters' }),
    /** Seals second-factor secrets (an AES-256-GCM key derived from it); unset: derived from SESSION_SECRET. */
    SECOND_FACTOR_KEY: z.string().min(32, { error: 'SECOND_FACTOR_KEY must have at least 32 characters' }).optional(),
    SMTP_HOST: z.string().default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().default(1025),
    MAIL_FROM: z.string().default('Layerbook <no-reply@layerbook.local>'),
    ROOT_DIR: z.string().default(path.resolve(__dirname, '../..')),
    RUN_WORKERS: flag.default(true),
    RUN_MIGRATIONS: flag.default(true),
    SIGN_IN_RATE_LIMIT: z.coerce.number().int().min(1).default(30),
    PUBLIC_FORM_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
    /** A public form sent sooner than this after it was shown is taken for a bot (0 in browser tests). */
    PUBLIC_FORM_MIN_FILL_MS: z.coerce.number().int().min(0).default(3000),
    /**
     * How long an anonymous visitor's sign-in page or public form is kept for the next one (0: never;
     * server/src/ssr/page-cache.ts). A firm's change to its public details shows after at most this.
     */
    ANONYMOUS_PAGE_CACHE_MS: z.coerce.number().int().min(0).max(60_000).default(5000),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
    DB_POOL_MAX: z.coerce.number().int().min(1).default(10),
    // Object storage: any S3-compatible service; the defaults point at the local fake (ops/start.sh).
    S3_ENDPOINT: z.url().default('http://127.0.0.1:4569'),
    S3_BUCKET: z.string().min(3).default('layerbook'),
    S3_REGION: z.string().default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
    S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
    /** Path-style URLs (`endpoint/bucket/key`): what local fakes and most S3-compatible services expect. */
    S3_FORCE_PATH_STYLE: flag.default(true),
    // Card payments through Stripe (or the local stand-in, packages/stripe-fake): no key, no online payments.
    STRIPE_SECRET_KEY: z.string().startsWith('sk_', { error: 'STRIPE_SECRET_KEY starts with sk_' }).optional(),
    /** The webhook endpoint's signing secret (whsec_…); required with a key. */
    STRIPE_WEBHOOK_SECRET: z.string().min(1).optional(),
    /** Where the Stripe API is: unset for Stripe itself, http://127.0.0.1:12111 for the local stand-in. */
    STRIPE_API_BASE: z.url().optional(),
    /** How often the reconciliation job lists the processor's events (cron, UTC). */
    PAYMENTS_RECONCILE_CRON: z.string().default('*/10 * * * *'),
    /** Largest upload accepted, per file; a phone photo is 3–12 MB. */
    FILE_MAX_BYTES: z.coerce
      .number()
      .int()
      .min(1)
      .default(15 * 1024 * 1024),
    /** Prometheus metrics on a listener of their own (server/src/health): unset or 0, none. Never the public port. */
    METRICS_PORT: z.coerce.number().int().min(0).max(65535).default(0),
    /** Where the metrics listener binds: loopback unless a private interface is named (never a public one). */
    METRICS_HOST: z.string().default('127.0.0.1'),
  })
  .refine((c) => !c.STRIPE_SECRET_KEY || c.STRIPE_WEBHOOK_SECRET, {
    path: ['STRIPE_WEBHOOK_SECRET'],
    error: 'STRIPE_WEBHOOK_SECRET is needed with STRIPE_SECRET_KEY',
  });

export type Config = z.infer<typeof schema>;

/** Parses the environment once at start-up; a bad value stops the process with a clear message. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n');
    throw new Error(`Configuration is not valid:\n${lines}`);
  }
  return parsed.data;
}

export const isProduction = (config: Config) => config.NODE_ENV === 'production';
