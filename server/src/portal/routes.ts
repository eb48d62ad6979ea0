import { PortalSession, portalLinkRequest, portalRedeemRequest, proposalAcceptance, proposalChangeRequest, proposalDecline, uuid } from '@layerbook/contracts';
import { Request, RequestHandler, Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { loadClientPrincipal, redeemPortalLink, requestPortalLink } from '../auth/portal-auth';
import { logIn, logOut } from '../auth/passport-setup';
import { csrf } from '../http/csrf';
import { withClient } from '../http/guards';
import { parse } from '../http/validate';
import { proposalFilename } from '../proposals/pdf/filename';
import { renderProposalPdf } from '../proposals/pdf/render-proposal';
import { getClientProposal, listClientProjects, loadClientVersion } from './client-proposals';
import { acceptProposal, answerProposal } from './decide-proposal';

const idParam = z.strictObject({ id: uuid('proposal id') });

async function portalSession(ctx: AppContext, req: Request, fresh = false): Promise<PortalSession> {
  const claim = req.user?.kind === 'client' ? req.user : null;
  const client = claim ? await loadClientPrincipal(ctx.pool, claim.id, claim.tenantId) : null;
  return {
    client: client ? { id: client.id, name: client.name, email: client.email, firmId: client.tenantId, firmName: client.firmName } : null,
    csrfToken: csrf.generateToken(req, fresh),
  };
}

/** The client-facing API: sign-in by e-mailed link, then their own projects and proposals only. */
export function portalRoutes(ctx: AppContext, linkLimiter: RequestHandler): Router {
  const router = Router();

  router.get('/session', async (req, res) => {
    res.set('cache-control', 'no-store').json(await portalSession(ctx, req));
  });

  router.post('/auth/link', linkLimiter, async (req, res) => {
    await requestPortalLink(ctx, parse(portalLinkRequest, req.body).email);
    res.status(202).json({ detail: 'If that address belongs to a client, a sign-in link is on its way.' });
  });

  router.post('/auth/redeem', linkLimiter, async (req, res) => {
    const { token } = parse(portalRedeemRequest, req.body);
    const principal = await redeemPortalLink(ctx, token);
    await logIn(req, principal, ctx.now());
    res.json(await portalSession(ctx, req, true));
  });

  router.post('/auth/signout', async (req, res) => {
    await logOut(req);
    await new Promise<void>((resolve, reject) => req.session.regenerate((err) => (err ? reject(err) : resolve())));
    res.json(await portalSession(ctx, req, true));
  });

  router.get('/projects', async (req, res) => {
    res.json(await withClient(ctx, req, async (tx, client) => ({ projects: await listClientProjects(tx, client) })));
  });

  router.get('/proposals/:id', async (req, res) => {
    res.json(await withClient(ctx, req, (tx, client) => getClientProposal(tx, client, parse(idParam, req.params).id, ctx.now())));
  });

  // Drawn from the stored snapshot after the transaction ends: a GET with no side effects.
  router.get('/proposals/:id/pdf', async (req, res) => {
    const row = await withClient(ctx, req, (tx, client) => loadClientVersion(tx, client, parse(idParam, req.params).id));
    const pdf = await renderProposalPdf(row.snapshot, { version: row.version, snapshotHash: row.snapshot_hash });
    res.set({
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${proposalFilename(row.snapshot.title, row.version)}"`,
      'x-content-type-options': 'nosniff',
      'content-length': String(pdf.length),
    });
    res.end(pdf);
  });

  router.post('/proposals/:id/accept', async (req, res) => {
    const signing = { ip: req.ip ?? '', userAgent: req.get('user-agent') ?? '' };
    res.json(
      await withClient(ctx, req, (tx, client) =>
        acceptProposal(tx, ctx, client, parse(idParam, req.params).id, () => parse(proposalAcceptance, req.body), signing),
      ),
    );
  });

  router.post('/proposals/:id/decline', async (req, res) => {
    res.json(await withClient(ctx, req, (tx, client) => answerProposal(tx, ctx, client, parse(idParam, req.params).id, 'declined', () => parse(proposalDecline, req.body ?? {}))));
  });

  router.post('/proposals/:id/request-changes', async (req, res) => {
    res.json(await withClient(ctx, req, (tx, client) => answerProposal(tx, ctx, client, parse(idParam, req.params).id, 'changes_requested', () => parse(proposalChangeRequest, req.body))));
  });

  return router;
}
