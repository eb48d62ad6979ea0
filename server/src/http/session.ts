import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';
import { isProduction } from '../config';

const IDLE_MS = 8 * 60 * 60 * 1000; // idle timeout: a working day
export const ABSOLUTE_MS = 7 * 24 * 60 * 60 * 1000; // absolute timeout, checked in passport setup

const TOUCH_EVERY_MS = 60_000;

/**
 * Sessions live in PostgreSQL so any number of web processes can serve any request. The idle
 * timeout slides, but the row's expiry is rewritten at most once a minute per session (per
 * process) instead of on every request, which would double the writes of a busy list page.
 */
export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  const PgStore = connectPgSimple(session);
  const production = isProduction(config);
  const store = new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: production ? 900 : false });
  const touch = store.touch.bind(store);
  const lastTouched = new Map<string, number>();
  store.touch = (sid, sess, done) => {
    const now = Date.now();
    if (now - (lastTouched.get(sid) ?? 0) < TOUCH_EVERY_MS) return done?.();
    if (lastTouched.size > 10_000) lastTouched.clear();
    lastTouched.set(sid, now);
    touch(sid, sess, done);
  };
  return session({
    store,
    name: production ? '__Host-lb.sid' : 'lb.sid',
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: production, path: '/', maxAge: IDLE_MS },
  });
}
