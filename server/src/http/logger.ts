import { randomUUID } from 'node:crypto';
import type { IncomingHttpHeaders, OutgoingHttpHeaders } from 'node:http';
import type { Request, RequestHandler } from 'express';
import pino, { type DestinationStream, type Logger } from 'pino';
import type { Config } from '../config';

const REDACTED = '[redacted]';
const ABORTED = 'request aborted';

/** Headers that carry the session or the CSRF token: never in a log line. */
const SECRET_HEADERS = new Set(['cookie', 'set-cookie', 'authorization', 'proxy-authorization', 'x-csrf-token']);
/** Body and query fields that hold passwords or one-time tokens, at whatever depth they are logged. */
const SECRET_FIELDS = [
  'password',
  'newPassword',
  'currentPassword',
  'token',
  'csrfToken',
  'secret',
  'codes',
  'secretGroups',
  'otpauthUri',
  'qrDataUrl',
];
const SECRET_QUERY_NAME = /token|password|secret/i;
/** Paths that carry a one-time token as a segment (an invitation preview; `accept` is a route). */
const TOKEN_IN_PATH = /^(\/api\/auth\/invitations\/)(?!accept(?:$|[/?#]))[^/?#]+/;

/**
 * pino `redact`: a second line of defence for objects logged by hand (`logger.warn({ body })`),
 * on top of the request and response serializers below, which never copy those values at all.
 */
const REDACT_PATHS = [
  ...['req', 'res', 'err', 'request', 'response'].flatMap((at) => [
    `${at}.headers.cookie`,
    `${at}.headers["set-cookie"]`,
    `${at}.headers.authorization`,
    `${at}.headers["x-csrf-token"]`,
  ]),
  'headers.cookie',
  'headers["set-cookie"]',
  'headers["x-csrf-token"]',
  'headers.referer',
  // A body the JSON parser refused keeps its raw text on the error.
  'err.body',
  ...SECRET_FIELDS.flatMap((field) => [field, `*.${field}`, `*.*.${field}`, `*.*.*.${field}`]),
];

export type LoggerSettings = Pick<Config, 'NODE_ENV' | 'LOG_LEVEL'>;

/**
 * The process logger. Development (`npm start`): readable one-line output through pino-pretty.
 * Test and production: plain JSON lines, for log collectors. `destination` is for specs.
 */
export function createLogger(settings: LoggerSettings, destination?: DestinationStream): Logger {
  const options = { level: settings.LOG_LEVEL, redact: { paths: REDACT_PATHS, censor: REDACTED } };
  if (settings.NODE_ENV !== 'development') {
    return destination ? pino(options, destination) : pino(options);
  }
  return pino(options, prettyStream(destination));
}

/** pino-pretty is a development tool (a devDependency), so it is loaded only when asked for. */
function prettyStream(destination?: DestinationStream): DestinationStream {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const pretty = require('pino-pretty') as typeof import('pino-pretty');
  return pretty.build({
    singleLine: true,
    colorize: destination ? false : process.stdout.isTTY === true,
    translateTime: 'SYS:HH:MM:ss.l',
    // A finished request reads `GET /api/jobs 200 12ms`; its id stays in the fields after it.
    ignore: 'pid,hostname,req,res,responseTime',
    messageFormat: (log, messageKey) => requestSummary(log) ?? text(log[messageKey]),
    ...(destination ? { destination } : {}),
  });
}

function requestSummary(log: Record<string, unknown>): string | undefined {
  const req = log['req'] as SerializedRequest | undefined;
  const res = log['res'] as SerializedResponse | undefined;
  if (!req || !res) {
    return undefined;
  }
  // An aborted request was never answered: its status is only what the route had set so far.
  const outcome = log['msg'] === ABORTED ? 'aborted after' : String(res.statusCode ?? '');
  return `${req.method ?? ''} ${req.url ?? ''} ${outcome} ${text(log['responseTime'])}ms`;
}

function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

declare module 'http' {
  interface IncomingMessage {
    /** The request's id: the caller's X-Request-Id (first 64 characters) or a fresh UUID; answered back in the same header. */
    id: string;
    /** The process logger with this request's id bound (`reqId`), made on first use. */
    log: Logger;
  }
}

/**
 * One line per API request when it is answered (id, method, URL without secrets, headers without
 * secrets, status, time), `info` below 500, `error` from 500 and `warn` when the caller hung up first;
 * pages are not logged. The line is
 * built only then, and only when the logger's level keeps it: a request that logs nothing by hand
 * costs an id and a listener (pino-http serialised every request into a child logger up front, about
 * 0.07 ms of the server's thread per API read in the invoice-list benchmark).
 */
export function requestLogging(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const id = (req.headers['x-request-id'] as string | undefined)?.slice(0, 64) || randomUUID();
    req.id = id;
    res.setHeader('x-request-id', id);
    let bound: Logger | undefined;
    Object.defineProperty(req, 'log', { configurable: true, enumerable: false, get: () => (bound ??= logger.child({ reqId: id })) });
    if (req.url.startsWith('/api')) {
      const started = Date.now();
      const line = () => ({
        req: requestLine(req),
        res: { statusCode: res.statusCode, headers: safeHeaders(res.getHeaders()) },
        responseTime: Date.now() - started,
      });
      res.once('finish', () => {
        const failed = res.statusCode >= 500;
        if (!logger.isLevelEnabled(failed ? 'error' : 'info')) return;
        if (failed) req.log.error(line(), 'request errored');
        else req.log.info(line(), 'request completed');
      });
      // The caller hung up before the answer was written: say so, with how long it had waited.
      res.once('close', () => {
        if (!res.writableFinished && logger.isLevelEnabled('warn')) req.log.warn(line(), ABORTED);
      });
    }
    next();
  };
}

function requestLine(req: Request): SerializedRequest {
  return {
    id: req.id,
    method: req.method,
    url: safeUrl(req.originalUrl),
    headers: safeHeaders(req.headers),
    remoteAddress: req.socket?.remoteAddress,
  };
}

interface SerializedRequest {
  id?: unknown;
  method?: string;
  url?: string;
  headers?: IncomingHttpHeaders;
  remoteAddress?: string;
}

interface SerializedResponse {
  statusCode?: number;
  headers?: OutgoingHttpHeaders;
}

/** A URL as it may be logged: one-time tokens in the path or the query are replaced. */
export function safeUrl(url: string): string {
  const queryAt = url.indexOf('?');
  const path = (queryAt < 0 ? url : url.slice(0, queryAt)).replace(TOKEN_IN_PATH, `$1${REDACTED}`);
  if (queryAt < 0) {
    return path;
  }
  const query = url
    .slice(queryAt + 1)
    .split('&')
    .map((pair) => {
      const name = pair.split('=', 1)[0] ?? '';
      return SECRET_QUERY_NAME.test(safeDecode(name)) ? `${name}=${REDACTED}` : pair;
    })
    .join('&');
  return `${path}?${query}`;
}

function safeDecode(text: string): string {
  try {
    return decodeURIComponent(text);
  } catch {
    return text;
  }
}

function safeHeaders<T extends IncomingHttpHeaders | OutgoingHttpHeaders>(headers: T | undefined): Partial<T> {
  const kept: Partial<T> = {};
  for (const [name, value] of Object.entries(headers ?? {})) {
    if (SECRET_HEADERS.has(name.toLowerCase())) {
      continue;
    }
    (kept as Record<string, unknown>)[name] = name.toLowerCase() === 'referer' && typeof value === 'string' ? safeUrl(value) : value;
  }
  return kept;
}
