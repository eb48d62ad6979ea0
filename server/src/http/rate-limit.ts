import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { HttpError } from './problem';

/**
 * Per-IP limit for sign-in and one-time-link routes (per e-mail throttling is in auth/throttle.ts).
 * The counter lives in this process; with several web processes each counts on its own.
 */
export function signInRateLimit(limit: number): RequestHandler {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'Too many attempts', 'Too many attempts from this address. Wait a few minutes and try again.')),
  });
}
