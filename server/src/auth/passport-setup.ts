import { signInRequest } from '@layerbook/contracts';
import type { Request, RequestHandler, Response } from 'express';
import type { Config } from '../config';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppContext } from '../context';
import { asError } from '../http/errors';
import type { Principal, SessionPrincipal } from '../http/principal';
import { ABSOLUTE_MS, sessionCookieName } from '../http/session';
import { parse } from '../http/validate';
import { signIn } from './staff-auth';

declare module 'express-session' {
  interface SessionData {
    signedInAt?: number;
  }
}

/** Passport with its middleware typed: `initialize`, `session` and `authenticate` answer request handlers. */
export type AppPassport = passport.Authenticator<RequestHandler, RequestHandler>;

/** One Passport instance per app (tests build several apps in one process). */
export function createPassport(ctx: AppContext): AppPassport {
  const instance = new passport.Passport() as AppPassport;
  instance.use(
    'staff-password',
    new LocalStrategy(
      { usernameField: 'email', passwordField: 'password', session: true, passReqToCallback: true },
      (req, email, password, done) => {
        signIn(ctx, parse(signInRequest, { email, password }), req.ip ?? '')
          .then((principal) => done(null, principal))
          .catch((error) => done(error));
      },
    ),
  );
  instance.serializeUser((user, done) => {
    const stored: SessionPrincipal = { kind: user.kind, id: user.id, tenantId: user.tenantId };
    done(null, stored);
  });
  // No query here: routes re-load the person inside their own firm transaction (http/guards.ts).
  instance.deserializeUser((stored: SessionPrincipal, done) => done(null, stored));
  return instance;
}

/**
 * Who is signed in, restored from the session on every request: what `passport.session()` does with
 * the identity `deserializeUser` above (the principal Passport stored at `session.passport.user` by
 * `logIn`, put on `req.user`), without building Passport's strategy machinery per request — that cost
 * the server's thread about 0.07 ms per API read in the invoice-list benchmark. Passport
 * still signs in and out (`logIn`, `logOut`); a stored value that is not a principal is ignored.
 */
export const restoreSignedIn: RequestHandler = (req, _res, next) => {
  const stored = (req.session as { passport?: { user?: unknown } } | undefined)?.passport?.user;
  if (isSessionPrincipal(stored)) req.user = stored;
  next();
};

function isSessionPrincipal(value: unknown): value is SessionPrincipal {
  if (typeof value !== 'object' || value === null) return false;
  const { kind, id, tenantId } = value as Record<string, unknown>;
  return (kind === 'staff' || kind === 'client') && typeof id === 'string' && typeof tenantId === 'string';
}

/** Signs the principal in on a fresh session id (Passport ≥ 0.6 regenerates it) and stamps the time. */
export function logIn(req: Request, principal: Principal, now: Date): Promise<void> {
  return new Promise((resolve, reject) => {
    req.logIn(principal, (err) => {
      if (err) return reject(asError(err));
      req.session.signedInAt = now.getTime();
      resolve();
    });
  });
}

export function logOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logOut((err) => (err ? reject(asError(err)) : resolve())));
}

/** After signing out: the session row is deleted and its cookie cleared; nothing is written in its place. */
export function endSession(config: Config, req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) =>
    req.session.destroy((err) => {
      if (err) return reject(asError(err));
      res.clearCookie(sessionCookieName(config), { path: '/' });
      resolve();
    }),
  );
}

/** Absolute session timeout: a week after sign-in the session ends however active it has been. */
export function absoluteTimeout(ctx: AppContext): RequestHandler {
  return (req, _res, next) => {
    const at = req.session?.signedInAt;
    if (req.user && at && ctx.now().getTime() - at > ABSOLUTE_MS) {
      logOut(req).then(() => next(), next);
      return;
    }
    next();
  };
}
