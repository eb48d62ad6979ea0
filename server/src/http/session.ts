import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';
import { isProduction } from '../config';

const IDLE_MS = 8 * 60 * 60 * 1000; // idle timeout: a working day
export const ABSOLUTE_MS = 7 * 24 * 60 * 60 * 1000; // absolute timeout, checked in passport setup

/** Sessions live in PostgreSQL so any number of web processes can serve any request. */
export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  const PgStore = connectPgSimple(session);
  const production = isProduction(config);
  return session({
    store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: production ? 900 : false }),
    name: production ? '__Host-lb.sid' : 'lb.sid',
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: production, path: '/', maxAge: IDLE_MS },
  });
}
