import type { RequestHandler } from 'express';
import { rateLimit, type ClientRateLimitInfo, type Store } from 'express-rate-limit';
import type { Pool } from 'pg';
import { RateLimiterPostgres, type RateLimiterRes } from 'rate-limiter-flexible';
import { HttpError } from './problem';

/** The table the counts live in (packages/db/src/schema/rate-limit.ts, made by a migration). */
export const RATE_LIMIT_TABLE = 'rate_limit_counts';

export interface SharedLimit {
  /** Names the count: the sign-in routes and the public form each count on their own. */
  readonly name: string;
  readonly limit: number;
  readonly windowMs: number;
}

/**
 * An express-rate-limit store whose counts live in PostgreSQL, so every web process adds to one count
 * per address and the limit holds however many processes serve behind the load balancer.
 * rate-limiter-flexible's RateLimiterPostgres does the counting (one atomic upsert per request, a
 * fixed window per key); express-rate-limit still decides, answers and writes the RateLimit headers.
 * A count that fails (the database unreachable) fails the request: nothing goes through unlimited,
 * and problemHandler answers it like any other database failure.
 *
 * The key carries the limit as well as the name: a process started with another limit (a test
 * server with a tight one, a rolling change of the setting) keeps a count of its own. The window
 * runs on the wall clock, as the library's does: a request rate is real time, not the app's clock.
 */
export class PostgresRateLimitStore implements Store {
  readonly localKeys = false;
  readonly prefix: string;
  private readonly counter: RateLimiterPostgres;

  constructor(pool: Pool, { name, limit, windowMs }: SharedLimit) {
    this.prefix = `${name}:${limit}`;
    this.counter = new RateLimiterPostgres({
      storeClient: pool,
      storeType: 'pool',
      tableName: RATE_LIMIT_TABLE,
      tableCreated: true,
      keyPrefix: this.prefix,
      points: limit,
      duration: Math.ceil(windowMs / 1000),
    });
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    // penalty() counts without refusing: the decision is express-rate-limit's.
    return info(await this.counter.penalty(key, 1));
  }

  async decrement(key: string): Promise<void> {
    await this.counter.reward(key, 1);
  }

  async resetKey(key: string): Promise<void> {
    await this.counter.delete(key);
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const res = await this.counter.get(key);
    return res ? info(res) : undefined;
  }
}

function info(res: RateLimiterRes): ClientRateLimitInfo {
  // The library's expiry is on the wall clock, so the reset time is too.
  return { totalHits: res.consumedPoints, resetTime: res.msBeforeNext >= 0 ? new Date(Date.now() + res.msBeforeNext) : undefined };
}

/** A per-address limit counted in PostgreSQL, answering 429 problem+json with the draft-8 RateLimit headers. */
export function sharedRateLimit(pool: Pool, limit: SharedLimit, refusal: HttpError): RequestHandler {
  return rateLimit({
    windowMs: limit.windowMs,
    limit: limit.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(pool, limit),
    handler: (_req, _res, next) => next(refusal),
  });
}

/**
 * Per-IP limit for sign-in and one-time-link routes (per e-mail throttling is in auth/throttle.ts),
 * counted in PostgreSQL so it holds across web processes.
 */
export function signInRateLimit(limit: number, pool: Pool): RequestHandler {
  return sharedRateLimit(
    pool,
    { name: 'sign-in', limit, windowMs: 15 * 60 * 1000 },
    new HttpError(429, 'Too many attempts', 'Too many attempts from this address. Wait a few minutes and try again.'),
  );
}
