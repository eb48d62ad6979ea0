import type { SecondFactorPending, SecondFactorStep } from '@layerbook/contracts';
import type { Request } from 'express';
import { asError } from '../../http/errors';
import type { StaffPrincipal } from '../../http/principal';
import { unauthorized } from '../../http/problem';

/**
 * Between the password and the second factor the session holds only this: who gave the right
 * password, for which firm, what is asked of them next and until when. No Passport user is set,
 * so every firm route answers 401 meanwhile (withStaff needs one); finishing signs in on a new
 * session id (Passport regenerates it), which drops this state.
 */
export interface HalfState {
  readonly userId: string;
  readonly tenantId: string;
  readonly step: SecondFactorStep;
  /** epoch ms */
  readonly until: number;
}

declare module 'express-session' {
  interface SessionData {
    secondFactor?: HalfState;
  }
}

export const HALF_STATE_MINUTES = 5;

/** Starts the half state on a fresh session id (nothing from before the password carries over). */
export function beginHalfState(req: Request, staff: StaffPrincipal, step: SecondFactorStep, now: Date): Promise<SecondFactorPending> {
  const until = now.getTime() + HALF_STATE_MINUTES * 60_000;
  return new Promise((resolve, reject) =>
    req.session.regenerate((err) => {
      if (err) return reject(asError(err));
      req.session.secondFactor = { userId: staff.id, tenantId: staff.tenantId, step, until };
      resolve({ step, expiresAt: new Date(until).toISOString() });
    }),
  );
}

/** The live half state of this request, if any (none once someone is signed in or it has expired). */
export function halfStateOf(req: Request, now: Date): HalfState | null {
  const state = req.session?.secondFactor;
  if (!state || req.user || state.until <= now.getTime()) return null;
  return state;
}

/** What the session answer says about it. */
export function pendingAnswer(req: Request, now: Date): SecondFactorPending | null {
  const state = halfStateOf(req, now);
  return state ? { step: state.step, expiresAt: new Date(state.until).toISOString() } : null;
}

/** The half state for a step, or 401 (sign in with the password again). */
export function requireHalfState(req: Request, now: Date, step?: SecondFactorStep): HalfState {
  const state = halfStateOf(req, now);
  if (!state || (step && state.step !== step)) throw unauthorized('Sign in with your e-mail and password again.');
  return state;
}
