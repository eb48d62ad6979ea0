import {
  proposalAcceptance,
  proposalChangeRequest,
  proposalDecline,
  uuid,
  type ItemList,
  type PortalProposal,
  type PortalProposalSummary,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withClient } from '../http/guards';
import { parse } from '../http/validate';
import { getClientProposal, listClientProposals, loadClientVersion } from './client-proposals';
import { acceptProposal, answerProposal } from './decide-proposal';
import { proposalFilename } from './pdf/filename';
import { renderProposalPdf } from './pdf/render-proposal';
import { loadSignedCopy } from './signed-copy';

const idParam = z.strictObject({ id: uuid('proposal id') });

/** The client's side of proposals, mounted at /api/portal/proposals: read, PDF, accept, decline, ask. */
export function portalProposalRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const items = await withClient(ctx, req, (tx, client) => listClientProposals(tx, client, ctx.now()));
    res.json({ items } satisfies ItemList<PortalProposalSummary>);
  });

  router.get('/:id', async (req, res) => {
    res.json(
      (await withClient(ctx, req, (tx, client) =>
        getClientProposal(tx, client, parse(idParam, req.params).id, ctx.now()),
      )) satisfies PortalProposal,
    );
  });

  // Drawn from the stored snapshot after the transaction ends: a GET with no side effects.
  router.get('/:id/pdf', async (req, res) => {
    const { row, language } = await withClient(ctx, req, async (tx, client) => ({
      row: await loadClientVersion(tx, client, parse(idParam, req.params).id),
      language: client.language,
    }));
    const pdf = await renderProposalPdf(row.snapshot, { version: row.version, snapshotHash: row.snapshot_hash, language });
    res.set({
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${proposalFilename(row.snapshot.title, row.version)}"`,
      'x-content-type-options': 'nosniff',
      'content-length': String(pdf.length),
    });
    res.end(pdf);
  });

  // The signed copy: the same document with the acceptance record on its last page.
  router.get('/:id/signed-pdf', async (req, res) => {
    const { row, signature, language } = await withClient(ctx, req, async (tx, client) => ({
      ...(await loadSignedCopy(tx, client, parse(idParam, req.params).id)),
      language: client.language,
    }));
    const pdf = await renderProposalPdf(row.snapshot, { version: row.version, snapshotHash: row.snapshot_hash, signature, language });
    res.set({
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${proposalFilename(row.snapshot.title, row.version, true)}"`,
      'x-content-type-options': 'nosniff',
      'content-length': String(pdf.length),
    });
    res.end(pdf);
  });

  router.post('/:id/accept', async (req, res) => {
    const signing = { ip: req.ip ?? '', userAgent: req.get('user-agent') ?? '' };
    res.json(
      await withClient(ctx, req, (tx, client) =>
        acceptProposal(tx, ctx, client, parse(idParam, req.params).id, () => parse(proposalAcceptance, req.body), signing),
      ),
    );
  });

  router.post('/:id/decline', async (req, res) => {
    res.json(
      await withClient(ctx, req, (tx, client) =>
        answerProposal(tx, ctx, client, parse(idParam, req.params).id, 'declined', () => parse(proposalDecline, req.body ?? {})),
      ),
    );
  });

  router.post('/:id/request-changes', async (req, res) => {
    res.json(
      await withClient(ctx, req, (tx, client) =>
        answerProposal(tx, ctx, client, parse(idParam, req.params).id, 'changes_requested', () => parse(proposalChangeRequest, req.body)),
      ),
    );
  });

  return router;
}
