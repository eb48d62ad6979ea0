import session from 'express-session';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';
import { isProduction } from '../config';

const IDLE_MS = 8 * 60 * 60 * 1000; // idle timeout: a working day
export const ABSOLUTE_MS = 7 * 24 * 60 * 60 * 1000; // absolute timeout, checked in passport setup

const TOUCH_EVERY_MS = 60_000;

type Done = (err?: unknown) => void;

/** How long a process may answer a safe request from its own copy of a session (see PgFunctionStore). */
const CACHE_MS = 60_000;
const CACHE_MAX = 10_000;

/**
 * Recently read or written sessions of this process, as JSON text (express-session mutates what a
 * store hands it, so every hit is parsed afresh). Shared by every store of the process: ids are random.
 */
const recent = new Map<string, { json: string; at: number }>();

function remember(sid: string, sess: session.SessionData): void {
  if (recent.size >= CACHE_MAX) recent.clear();
  recent.set(sid, { json: JSON.stringify(sess), at: Date.now() });
}

/** Drops this process's copy of a session (its request found it ended in the database). */
export function forgetSession(sid: string): void {
  recent.delete(sid);
}

/**
 * Sessions in PostgreSQL, reached only through security-definer functions by session id (the web
 * role may not list or read the session table: migrations/0018). Expired rows are deleted by the
 * `prune-expired` queue job. The idle timeout slides, but a row's expiry is rewritten at most once
 * a minute per session (per process) instead of on every request.
 *
 * With `cachedReads`, a session this process read or wrote less than a minute ago is answered from
 * its copy, saving a round trip. Only safe requests (GET, HEAD) use such a store, and every
 * signed-in route re-checks in its own transaction's first round trip that the session is still
 * live in the database (auth_session_live, http/guards.ts), so a sign-out or expiry anywhere
 * takes effect at once.
 */
export class PgFunctionStore extends session.Store {
  private readonly lastTouched = new Map<string, number>();

  constructor(
    private readonly pool: Pool,
    private readonly cachedReads = false,
  ) {
    super();
  }

  override get(sid: string, done: (err: unknown, sess?: session.SessionData | null) => void): void {
    const copy = this.cachedReads ? recent.get(sid) : undefined;
    if (copy && Date.now() - copy.at < CACHE_MS) return done(null, JSON.parse(copy.json) as session.SessionData);
    this.pool.query<{ sess: session.SessionData | null }>('select auth_session_get($1) as sess', [sid]).then(
      (r) => {
        const sess = r.rows[0]?.sess ?? null;
        if (sess) remember(sid, sess);
        else recent.delete(sid);
        done(null, sess);
      },
      (err) => done(err),
    );
  }

  override set(sid: string, sess: session.SessionData, done?: Done): void {
    recent.delete(sid);
    this.pool.query('select auth_session_set($1, $2, $3)', [sid, JSON.stringify(sess), expiry(sess)]).then(
      () => {
        remember(sid, sess);
        done?.();
      },
      (err) => done?.(err),
    );
  }

  override destroy(sid: string, done?: Done): void {
    this.lastTouched.delete(sid);
    recent.delete(sid);
    this.pool.query('select auth_session_destroy($1)', [sid]).then(
      () => done?.(),
      (err) => done?.(err),
    );
  }

  override touch(sid: string, sess: session.SessionData, done?: () => void): void {
    const now = Date.now();
    if (now - (this.lastTouched.get(sid) ?? 0) < TOUCH_EVERY_MS) return done?.();
    if (this.lastTouched.size > 10_000) this.lastTouched.clear();
    this.lastTouched.set(sid, now);
    this.pool.query('select auth_session_touch($1, $2)', [sid, expiry(sess)]).then(
      () => done?.(),
      () => done?.(),
    );
  }
}

function expiry(sess: session.SessionData): string {
  const expires = sess.cookie?.expires;
  return (expires ? new Date(expires) : new Date(Date.now() + IDLE_MS)).toISOString();
}

/**
 * Cookie sessions, saved only once there is something to keep (a sign-in): anonymous visitors get
 * no session row (their CSRF token is a signed double-submit cookie, http/csrf.ts). Safe requests
 * may read the session from the process's recent copy (PgFunctionStore); others always read it.
 */
export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  const production = isProduction(config);
  const options = (cachedReads: boolean): session.SessionOptions => ({
    store: new PgFunctionStore(pool, cachedReads),
    name: sessionCookieName(config),
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: production, path: '/', maxAge: IDLE_MS },
  });
  const safe = session(options(true));
  const unsafe = session(options(false));
  return (req, res, next) => (req.method === 'GET' || req.method === 'HEAD' ? safe : unsafe)(req, res, next);
}

/** A session id as express-session makes them (uid-safe: base64url), safe to inline in SQL. */
export const isSessionId = (sid: unknown): sid is string => typeof sid === 'string' && /^[A-Za-z0-9_-]{16,128}$/.test(sid);

export const sessionCookieName = (config: Config) => (isProduction(config) ? '__Host-lb.sid' : 'lb.sid');
