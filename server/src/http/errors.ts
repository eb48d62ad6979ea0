import { PROBLEM_CONTENT_TYPE } from '@layerbook/contracts';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from './problem';

export const apiNotFound: RequestHandler = (_req, _res, next) => {
  next(new HttpError(404, 'Not found', 'No such API route.'));
};

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

/** The one error middleware: every failure answers application/problem+json, never a stack trace. */
export const problemHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let error: HttpError;
  const parserError = err as BodyParserError;
  if (err instanceof HttpError) {
    error = err;
  } else if (parserError?.type === 'entity.parse.failed') {
    error = new HttpError(400, 'The request body is not valid JSON', 'Send a JSON object.', [
      { field: '(body)', message: 'Not valid JSON.' },
    ]);
  } else if (parserError?.type === 'entity.too.large') {
    error = new HttpError(413, 'The request is too large', 'Send less data.');
  } else if (typeof parserError?.status === 'number' && parserError.status < 500 && parserError.expose) {
    error = new HttpError(parserError.status, 'The request was refused', (err as Error).message);
  } else if (isDatabaseUnavailable(err)) {
    // Expected while PostgreSQL restarts or fails over: one warning line, no stack; the client retries.
    req.log?.warn({ dbError: describe(err) }, 'database unavailable');
    error = databaseUnavailable();
    res.setHeader('Retry-After', String(DB_RETRY_AFTER_SECONDS));
  } else {
    req.log?.error({ err }, 'unhandled error');
    error = new HttpError(500, 'Something went wrong', 'The error was logged; please try again.');
  }
  if (error.status === 403 && (err as { code?: string }).code === 'EBADCSRFTOKEN') {
    error = new HttpError(403, 'Security check failed', 'Reload the page and try again.');
  }
  res
    .status(error.status)
    .type(PROBLEM_CONTENT_TYPE)
    .send(JSON.stringify(error.toProblem(typeof req.id === 'string' ? req.id : '')));
};

/** Seconds a client is asked to wait (Retry-After) when the database cannot be reached. */
export const DB_RETRY_AFTER_SECONDS = 5;

export const databaseUnavailable = () =>
  new HttpError(
    503,
    'The database is unavailable',
    'Layerbook cannot reach its database just now, so the request was not carried out. Try again in a few seconds.',
  );

/**
 * PostgreSQL's SQLSTATEs for a server going away or not taking connections (PostgreSQL 15 manual,
 * Appendix A): 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now, class 08
 * connection exceptions, 53300 too_many_connections.
 */
const DB_DOWN_SQLSTATES = new Set(['57P01', '57P02', '57P03', '08000', '08001', '08003', '08004', '08006', '53300']);
/** Socket errors of a connection refused, reset or timed out (Node's `net` codes). */
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENETUNREACH']);
/** node-postgres (pg 8, pg-pool 3) raises these as plain Errors, without a code. */
const PG_CONNECTION_MESSAGES = [
  'Connection terminated',
  'timeout exceeded when trying to connect',
  'Client has encountered a connection error and is not queryable',
  'Cannot use a pool after calling end on the pool',
  'Client was closed and is not queryable',
];

interface ErrorLike {
  code?: unknown;
  message?: unknown;
  cause?: unknown;
  errors?: unknown;
}

/**
 * Whether an error (or its cause: Drizzle wraps driver errors; Node raises an AggregateError when
 * every address refused) means the database could not be reached, rather than a bug or bad data.
 */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 4) return false;
  const e = error as ErrorLike;
  if (typeof e.code === 'string' && (DB_DOWN_SQLSTATES.has(e.code) || SOCKET_CODES.has(e.code))) return true;
  if (typeof e.message === 'string' && PG_CONNECTION_MESSAGES.some((m) => (e.message as string).startsWith(m))) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1))) return true;
  return isDatabaseUnavailable(e.cause, depth + 1);
}

function describe(error: unknown): string {
  const e = error as ErrorLike;
  return [typeof e?.code === 'string' ? e.code : '', typeof e?.message === 'string' ? e.message : ''].filter(Boolean).join(' ');
}

/** A callback's error as an Error (Node-style callbacks type it `any`), for rejecting a promise. */
export function asError(value: unknown): Error {
  return value instanceof Error ? value : new Error(String(value));
}
