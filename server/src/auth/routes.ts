import {
  firmSwitch,
  invitationAccept,
  languageChoice,
  passwordResetComplete,
  passwordResetRequest,
  signInRequest,
  signUpConfirm,
  signUpRequest,
  SIGN_UP_SENT_DETAIL,
  token as tokenField,
  type InvitationPreview,
  type Notice,
  type StaffSession,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { asError } from '../http/errors';
import type { StaffPrincipal } from '../http/principal';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { switchFirm } from './firm-switch';
import { acceptInvitation, previewInvitation } from './invitations';
import { setOwnLanguage } from './language';
import { endSession, logOut, type AppPassport } from './passport-setup';
import { secondFactorRoutes } from './second-factor/routes';
import { answerPasswordStep, staffSession } from './session-answer';
import { completePasswordReset, requestPasswordReset } from './password-reset';
import { afterAnswer } from '../http/after-answer';
import { confirmSignUp, requestSignUp } from './staff-auth';

export function authRoutes(ctx: AppContext, pass: AppPassport, signInLimiter: import('express').RequestHandler): Router {
  const router = Router();

  router.get('/session', async (req, res) => {
    res.set('cache-control', 'no-store').json((await staffSession(ctx, req, res)) satisfies StaffSession);
  });

  // The same 202 and words for a new and a known e-mail; the e-mail says which (staff-auth.ts).
  router.post('/signup', signInLimiter, async (req, res) => {
    await requestSignUp(ctx, parse(signUpRequest, req.body));
    res.status(202).json({ detail: SIGN_UP_SENT_DETAIL } satisfies Notice);
  });

  router.post('/signup/confirm', signInLimiter, async (req, res) => {
    const principal = await confirmSignUp(ctx, parse(signUpConfirm, req.body).token);
    await answerPasswordStep(ctx, req, res, principal, 201);
  });

  router.post('/signin', signInLimiter, async (req, res) => {
    parse(signInRequest, req.body);
    const principal = await new Promise<StaffPrincipal>((resolve, reject) => {
      pass.authenticate('staff-password', { session: false }, (err: unknown, user: StaffPrincipal | false) => {
        if (err) return reject(asError(err));
        if (!user) return reject(new Error('sign-in produced no user'));
        resolve(user);
      })(req, res, reject);
    });
    await answerPasswordStep(ctx, req, res, principal);
  });

  // Anyone signed in chooses the language they read in; the answer is the whole session, in it.
  router.patch('/me/language', async (req, res) => {
    await withStaff(ctx, req, 'crew', (tx, staff) => setOwnLanguage(tx, staff, parse(languageChoice, req.body).language));
    res.json((await staffSession(ctx, req, res)) satisfies StaffSession);
  });

  // Someone in several firms enters another of theirs (firm-switch.ts).
  router.post('/firm', async (req, res) => {
    await switchFirm(ctx, req, res, parse(firmSwitch, req.body).firmId);
  });

  // Owner and office: the code after the password, setting one up, turning it off, the firm's rule.
  router.use('/second-factor', secondFactorRoutes(ctx, signInLimiter));

  router.post('/signout', async (req, res) => {
    await logOut(req);
    await endSession(ctx.config, req, res);
    res.json(await staffSession(ctx, req, res, true));
  });

  router.post('/password-reset', signInLimiter, (req, res) => {
    const { email } = parse(passwordResetRequest, req.body);
    afterAnswer(res, ctx.logger, 'password reset request', () => requestPasswordReset(ctx, email));
    res.status(202).json({ detail: 'If that e-mail has an account, a reset link is on its way.' } satisfies Notice);
  });

  router.post('/password-reset/complete', signInLimiter, async (req, res) => {
    const input = parse(passwordResetComplete, req.body);
    await answerPasswordStep(ctx, req, res, await completePasswordReset(ctx, input.token, input.password));
  });

  router.get('/invitations/:token', async (req, res) => {
    const { token } = parse(z.strictObject({ token: tokenField }), req.params);
    res.set('cache-control', 'no-store').json((await previewInvitation(ctx, token)) satisfies InvitationPreview);
  });

  router.post('/invitations/accept', signInLimiter, async (req, res) => {
    await answerPasswordStep(ctx, req, res, await acceptInvitation(ctx, parse(invitationAccept, req.body), req.ip ?? ''));
  });

  return router;
}
