import { languageChoice, portalLinkRequest, portalRedeemRequest, type Notice, type PortalSession } from '@layerbook/contracts';
import { Request, RequestHandler, Response, Router } from 'express';
import type { AppContext } from '../context';
import { csrfToken } from '../http/csrf';
import { signedInClient, withClient } from '../http/guards';
import { parse } from '../http/validate';
import { endSession, logIn, logOut } from './passport-setup';
import { setClientLanguage } from './language';
import { portalAccessOffAt, redeemPortalLink, requestPortalLink } from './portal-auth';
import { afterAnswer } from '../http/after-answer';

async function portalSession(ctx: AppContext, req: Request, res: Response, fresh = false): Promise<PortalSession> {
  const client = await signedInClient(ctx, req);
  // A client claim with no live client: tell the portal when it is because the firm turned access off.
  const claim = req.user;
  const accessOff = !client && claim?.kind === 'client' ? await portalAccessOffAt(ctx.pool, claim.id, claim.tenantId) : null;
  return {
    ...(accessOff ? { accessOff } : {}),
    client: client
      ? {
          id: client.id,
          name: client.name,
          email: client.email,
          firmId: client.tenantId,
          firmName: client.firmName,
          language: client.language,
          ownLanguage: client.ownLanguage,
          firmLanguage: client.firmLanguage,
          country: client.country,
        }
      : null,
    csrfToken: csrfToken(ctx.config, req, res, fresh),
  };
}

/** The client's sign-in, mounted at /api/portal: session, e-mailed one-time link, sign-out. */
export function portalAuthRoutes(ctx: AppContext, linkLimiter: RequestHandler): Router {
  const router = Router();

  router.get('/session', async (req, res) => {
    res.set('cache-control', 'no-store').json(await portalSession(ctx, req, res));
  });

  router.post('/auth/link', linkLimiter, (req, res) => {
    const { email, next } = parse(portalLinkRequest, req.body);
    afterAnswer(res, ctx.logger, 'portal link request', () => requestPortalLink(ctx, email, next));
    res.status(202).json({ detail: 'If that address belongs to a client, a sign-in link is on its way.' } satisfies Notice);
  });

  router.post('/auth/redeem', linkLimiter, async (req, res) => {
    const { token } = parse(portalRedeemRequest, req.body);
    const { principal, isSignedInAlready } = await redeemPortalLink(ctx, token, await signedInClient(ctx, req));
    if (isSignedInAlready) {
      res.json(await portalSession(ctx, req, res));
      return;
    }
    await logIn(req, principal, ctx.now());
    res.json(await portalSession(ctx, req, res, true));
  });

  // The client's language for the portal, e-mails and PDFs; the answer is the whole session, in it.
  router.patch('/me/language', async (req, res) => {
    await withClient(ctx, req, (tx, client) => setClientLanguage(tx, client, parse(languageChoice, req.body).language));
    res.json((await portalSession(ctx, req, res)) satisfies PortalSession);
  });

  router.post('/auth/signout', async (req, res) => {
    await logOut(req);
    await endSession(ctx.config, req, res);
    res.json(await portalSession(ctx, req, res, true));
  });

  return router;
}
