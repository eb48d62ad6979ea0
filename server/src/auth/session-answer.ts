import type { StaffSession } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { Request, Response } from 'express';
import type { AppContext } from '../context';
import { csrfToken } from '../http/csrf';
import { signedInStaff } from '../http/guards';
import type { StaffPrincipal } from '../http/principal';
import { otherFirmsOf } from './firm-choices';
import { logIn } from './passport-setup';
import { beginHalfState, pendingAnswer } from './second-factor/half-state';
import { recordSignIn, signInStepFor, type SecondFactorUsed } from './second-factor/verify';

/** The admin app's session answer: who is signed in, the CSRF token, and a second-factor step under way. */
export async function staffSession(ctx: AppContext, req: Request, res: Response, fresh = false): Promise<StaffSession> {
  const user = await signedInStaff(ctx, req);
  return {
    user: user
      ? {
          id: user.id,
          name: user.name,
          email: user.email,
          role: user.role,
          firmId: user.tenantId,
          firmName: user.firmName,
          language: user.language,
          ownLanguage: user.ownLanguage,
          units: user.units,
          country: user.country,
          timeZone: user.timeZone,
          otherFirms: await otherFirmsOf(ctx, user.id, user.tenantId),
        }
      : null,
    csrfToken: csrfToken(ctx.config, req, res, fresh),
    secondFactor: user ? null : pendingAnswer(req, ctx.now()),
  };
}

declare module 'express-session' {
  interface SessionData {
    /** how this session's person proved a second factor, when they did: a firm switch does not ask again */
    secondFactorUsed?: SecondFactorUsed;
  }
}

/** Signs in fully on a fresh session id and records it in the firm's audit log. */
export async function finishSignIn(
  ctx: AppContext,
  req: Request,
  staff: StaffPrincipal,
  used: SecondFactorUsed | null,
  how?: 'firmSwitch',
): Promise<void> {
  await logIn(req, staff, ctx.now());
  if (used) req.session.secondFactorUsed = used;
  await withTenant(ctx.pool, staff.tenantId, (tx) => recordSignIn(tx, staff, used, how));
}

/**
 * After a right password (or a sign-up link, reset or invitation): signs in, or — for owner and office
 * with a second factor, or whose firm requires one — starts the half state and answers which step is next.
 */
export async function answerPasswordStep(ctx: AppContext, req: Request, res: Response, staff: StaffPrincipal, status = 200): Promise<void> {
  const step = await withTenant(ctx.pool, staff.tenantId, (tx) => signInStepFor(tx, staff));
  if (step) {
    const secondFactor = await beginHalfState(req, staff, step, ctx.now());
    res.status(status).json({ user: null, csrfToken: csrfToken(ctx.config, req, res, true), secondFactor } satisfies StaffSession);
    return;
  }
  await finishSignIn(ctx, req, staff, null);
  res.status(status).json(await staffSession(ctx, req, res, true));
}
