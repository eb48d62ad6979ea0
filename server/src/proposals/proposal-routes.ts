import {
  proposalCreate,
  proposalListQuery,
  proposalUpdate,
  uuid,
  type ItemList,
  type ProposalVersionSummary,
  type ProposalVersionView,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { proposalFilename } from './pdf/filename';
import { renderProposalPdf } from './pdf/render-proposal';
import { createVersion, getVersion, listVersions, updateDraft } from './proposal-versions';
import { sendVersion } from './send-proposal';

const idParam = z.strictObject({ id: uuid('proposal id') });

/** Proposal versions carry prices: owner and office only. Every route authorises, then parses. */
export function proposalRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(
      (await withStaff(ctx, req, 'office', (tx) =>
        listVersions(tx, parse(proposalListQuery, req.query).estimateId),
      )) satisfies ItemList<ProposalVersionSummary>,
    );
  });

  router.post('/', async (req, res) => {
    res
      .status(201)
      .json(
        (await withStaff(ctx, req, 'office', (tx, staff) =>
          createVersion(tx, staff.id, parse(proposalCreate, req.body), ctx.now()),
        )) satisfies ProposalVersionView,
      );
  });

  router.get('/:id', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => getVersion(tx, parse(idParam, req.params).id))) satisfies ProposalVersionView);
  });

  router.patch('/:id', async (req, res) => {
    res.json(
      (await withStaff(ctx, req, 'office', (tx, staff) =>
        updateDraft(tx, staff.id, parse(idParam, req.params).id, parseChanges(proposalUpdate, req.body), ctx.now()),
      )) satisfies ProposalVersionView,
    );
  });

  router.post('/:id/send', async (req, res) => {
    res.json(
      (await withStaff(ctx, req, 'office', (tx, staff) =>
        sendVersion(tx, ctx, staff.id, parse(idParam, req.params).id),
      )) satisfies ProposalVersionView,
    );
  });

  // Drawn from the stored snapshot after the transaction ends: a GET with no side effects.
  router.get('/:id/pdf', async (req, res) => {
    const version = await withStaff(ctx, req, 'office', (tx) => getVersion(tx, parse(idParam, req.params).id));
    const pdf = await renderProposalPdf(version.snapshot, { version: version.version, snapshotHash: version.snapshotHash });
    res.set({
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${proposalFilename(version.title, version.version)}"`,
      'x-content-type-options': 'nosniff',
      'content-length': String(pdf.length),
    });
    res.end(pdf);
  });

  return router;
}
