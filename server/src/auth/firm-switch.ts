import type { StaffSession } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { Request, Response } from 'express';
import type { AppContext } from '../context';
import { signedInStaff } from '../http/guards';
import { notFound, unauthorized } from '../http/problem';
import { csrfToken } from '../http/csrf';
import { beginHalfState } from './second-factor/half-state';
import { signInStepFor } from './second-factor/verify';
import { finishSignIn, staffSession } from './session-answer';
import { loadStaffPrincipal } from './staff-principal';

/**
 * Enters another firm the signed-in person belongs to, on a fresh session id, as signing in to it
 * would: a second factor proved earlier in this session counts (it is the person's, not the firm's);
 * an owner or office member who has not proved one here is asked for the code, or to set one up where
 * that firm requires it — the half state, which leaves the firm they came from. A firm they are not
 * an active member of answers 404, like any other firm's record.
 */
export async function switchFirm(ctx: AppContext, req: Request, res: Response, firmId: string): Promise<void> {
  const current = await signedInStaff(ctx, req);
  if (!current) throw unauthorized();
  if (firmId === current.tenantId) {
    res.json((await staffSession(ctx, req, res)) satisfies StaffSession);
    return;
  }
  const target = await loadStaffPrincipal(ctx.pool, current.id, firmId);
  if (!target) throw notFound('firm');
  const step = await withTenant(ctx.pool, target.tenantId, (tx) => signInStepFor(tx, target));
  const proved = req.session.secondFactorUsed ?? null;
  if (step === 'enrol' || (step === 'code' && !proved)) {
    const secondFactor = await beginHalfState(req, target, step, ctx.now());
    res.json({ user: null, csrfToken: csrfToken(ctx.config, req, res, true), secondFactor } satisfies StaffSession);
    return;
  }
  await finishSignIn(ctx, req, target, step === 'code' ? proved : null, 'firmSwitch');
  // Kept on the new session id even where this firm asked for none (crew): the next switch may need it.
  if (proved) req.session.secondFactorUsed = proved;
  res.json((await staffSession(ctx, req, res, true)) satisfies StaffSession);
}
