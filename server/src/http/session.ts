import session from 'express-session';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';
import { isProduction } from '../config';

const IDLE_MS = 8 * 60 * 60 * 1000; // idle timeout: a working day
export const ABSOLUTE_MS = 7 * 24 * 60 * 60 * 1000; // absolute timeout, checked in passport setup

const TOUCH_EVERY_MS = 60_000;

type Done = (err?: unknown) => void;

/**
 * Sessions in PostgreSQL, reached only through security-definer functions by session id (the web
 * role may not list or read the session table: migrations/0018). Expired rows are deleted by the
 * `prune-expired` queue job. The idle timeout slides, but a row's expiry is rewritten at most once
 * a minute per session (per process) instead of on every request.
 */
export class PgFunctionStore extends session.Store {
  private readonly lastTouched = new Map<string, number>();

  constructor(private readonly pool: Pool) {
    super();
  }

  override get(sid: string, done: (err: unknown, sess?: session.SessionData | null) => void): void {
    this.pool.query<{ sess: session.SessionData | null }>('select auth_session_get($1) as sess', [sid]).then(
      (r) => done(null, r.rows[0]?.sess ?? null),
      (err) => done(err),
    );
  }

  override set(sid: string, sess: session.SessionData, done?: Done): void {
    this.pool.query('select auth_session_set($1, $2, $3)', [sid, JSON.stringify(sess), expiry(sess)]).then(
      () => done?.(),
      (err) => done?.(err),
    );
  }

  override destroy(sid: string, done?: Done): void {
    this.lastTouched.delete(sid);
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
 * no session row (their CSRF token is a signed double-submit cookie, http/csrf.ts).
 */
export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  const production = isProduction(config);
  return session({
    store: new PgFunctionStore(pool),
    name: sessionCookieName(config),
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: production, path: '/', maxAge: IDLE_MS },
  });
}

export const sessionCookieName = (config: Config) => (isProduction(config) ? '__Host-lb.sid' : 'lb.sid');
