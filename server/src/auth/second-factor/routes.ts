import {
  firmSecondFactor,
  idParam,
  roleAtLeast,
  secondFactorCheck,
  secondFactorConfirm,
  secondFactorEnrolmentStart,
  secondFactorTurnOff,
  type RecoveryCodes,
  type SecondFactorEnrolled,
  type SecondFactorEnrolment,
  type SecondFactorStatus,
  type SecondFactorTurnOff,
  type StaffSession,
} from '@layerbook/contracts';
import { withTenant, type TenantTx } from '@layerbook/db';
import { Router, type Request, type RequestHandler } from 'express';
import type { AppContext } from '../../context';
import { withStaff } from '../../http/guards';
import type { StaffPrincipal } from '../../http/principal';
import { badRequest, unauthorized } from '../../http/problem';
import { parse } from '../../http/validate';
import { passwordHashOf } from '../password-store';
import { verifyPassword } from '../passwords';
import { finishSignIn, staffSession } from '../session-answer';
import { loadStaffInTx } from '../staff-principal';
import {
  confirmEnrolment,
  renewRecoveryCodes,
  resetMemberFactor,
  secondFactorStatus,
  setFirmRequirement,
  startEnrolment,
  turnOff,
} from './enrolment';
import { requireHalfState, type HalfState } from './half-state';
import { throttledCheck, useCode, wrongPassword } from './verify';

/** The person in the half state, re-loaded in their firm: still active, still owner or office. */
async function halfStateStaff(tx: TenantTx, state: HalfState): Promise<StaffPrincipal> {
  const staff = await loadStaffInTx(tx, state.userId);
  if (!staff || !roleAtLeast(staff.role, 'office')) throw unauthorized('Your access to this firm has been turned off. Ask the owner.');
  return staff;
}

/** Setting up: a signed-in owner or office member, or someone their firm sends to set one up right after the password. */
function withEnrollingStaff<T>(ctx: AppContext, req: Request, fn: (tx: TenantTx, staff: StaffPrincipal, isHalf: boolean) => Promise<T>) {
  if (req.user) return withStaff(ctx, req, 'office', (tx, staff) => fn(tx, staff, false));
  const state = requireHalfState(req, ctx.now(), 'enrol');
  return withTenant(ctx.pool, state.tenantId, async (tx) => fn(tx, await halfStateStaff(tx, state), true));
}

/**
 * Proof that the person at the keyboard is the one signed in: a current code (or a recovery code) or
 * the password, each throttled like sign-in. A wrong password answers 400 on `password`.
 */
async function prove(ctx: AppContext, tx: TenantTx, staff: StaffPrincipal, address: string, proof: SecondFactorTurnOff): Promise<void> {
  if (proof.code !== undefined) {
    await throttledCheck(ctx, staff.id, address, () => useCode(ctx, tx, staff.id, proof.code ?? ''));
  } else {
    await throttledCheck(
      ctx,
      staff.id,
      address,
      async () => ((await verifyPassword((await passwordHashOf(tx.client, staff.id)) ?? '', proof.password ?? '')) ? true : null),
      wrongPassword,
    );
  }
}

export function secondFactorRoutes(ctx: AppContext, signInLimiter: RequestHandler): Router {
  const router = Router();
  const address = (req: Request) => req.ip ?? '';

  // The code after the password: from the app or a recovery code; signs in on a new session id.
  router.post('/', signInLimiter, async (req, res) => {
    const state = requireHalfState(req, ctx.now(), 'code');
    const { code } = parse(secondFactorCheck, req.body);
    const done = await throttledCheck(ctx, state.userId, address(req), () =>
      withTenant(ctx.pool, state.tenantId, async (tx) => {
        const used = await useCode(ctx, tx, state.userId, code);
        return used ? { used, staff: await halfStateStaff(tx, state) } : null;
      }),
    );
    await finishSignIn(ctx, req, done.staff, done.used);
    res.json((await staffSession(ctx, req, res, true)) satisfies StaffSession);
  });

  router.get('/', async (req, res) => {
    const status = await withStaff(ctx, req, 'office', (tx, staff) => secondFactorStatus(tx, staff));
    res.set('cache-control', 'no-store').json(status satisfies SecondFactorStatus);
  });

  // Signed in, the password first: whoever finds an open session must not put their own app on the
  // account (its owner then could neither sign in nor turn it off). Right after the password at
  // sign-in (the half state), the password has just been proved.
  router.post('/enrolment', signInLimiter, async (req, res) => {
    const enrolment = await withEnrollingStaff(ctx, req, async (tx, staff, isHalf) => {
      const { password } = parse(secondFactorEnrolmentStart, req.body);
      if (!isHalf) {
        if (password === undefined) throw badRequest([{ field: 'password', message: 'Enter your password.' }], 'Enter your password.');
        await prove(ctx, tx, staff, address(req), { password });
      }
      return startEnrolment(ctx, tx, staff);
    });
    res
      .set('cache-control', 'no-store')
      .status(201)
      .json(enrolment satisfies SecondFactorEnrolment);
  });

  // The first code turns it on; in the half state it also finishes the sign-in.
  router.post('/enrolment/confirm', signInLimiter, async (req, res) => {
    const half = !req.user;
    const { codes, staff } = await withEnrollingStaff(ctx, req, async (tx, staff) => {
      const { code } = parse(secondFactorConfirm, req.body);
      return { staff, codes: await throttledCheck(ctx, staff.id, address(req), () => confirmEnrolment(ctx, tx, staff, code)) };
    });
    if (half) await finishSignIn(ctx, req, staff, 'app');
    else req.session.secondFactorUsed = 'app';
    res.set('cache-control', 'no-store').json({ ...(await staffSession(ctx, req, res, half)), codes } satisfies SecondFactorEnrolled);
  });

  // New recovery codes (the old ones stop working) need the same proof as turning it off: a session alone is not enough.
  router.post('/recovery-codes', signInLimiter, async (req, res) => {
    const codes = await withStaff(ctx, req, 'office', async (tx, staff) => {
      await prove(ctx, tx, staff, address(req), parse(secondFactorTurnOff, req.body));
      return renewRecoveryCodes(ctx, tx, staff);
    });
    res.set('cache-control', 'no-store').json(codes satisfies RecoveryCodes);
  });

  // Turning it off needs a current code (or a recovery code) or the password.
  router.post('/turn-off', signInLimiter, async (req, res) => {
    const status = await withStaff(ctx, req, 'office', async (tx, staff) => {
      await prove(ctx, tx, staff, address(req), parse(secondFactorTurnOff, req.body));
      await turnOff(tx, staff);
      return secondFactorStatus(tx, staff);
    });
    res.json(status satisfies SecondFactorStatus);
  });

  // The owner's rule: owner and office must use a second factor.
  router.put('/firm', async (req, res) => {
    const status = await withStaff(ctx, req, 'owner', async (tx, staff) => {
      await setFirmRequirement(tx, staff, parse(firmSecondFactor, req.body).required);
      return secondFactorStatus(tx, staff);
    });
    res.json(status satisfies SecondFactorStatus);
  });

  // The owner clears a member's second factor (by membership id, as the team page lists them).
  router.post('/members/:id/reset', async (req, res) => {
    await withStaff(ctx, req, 'owner', (tx, staff) => resetMemberFactor(tx, staff, parse(idParam, req.params).id));
    res.status(204).end();
  });

  return router;
}
