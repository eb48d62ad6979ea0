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
import { clientReader } from '../i18n/reader';
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

  // Drawn from the stored snapshot after the transaction ends: a GET with no side effects. In the client's
  // language (theirs, else the firm's), as they get it — the office prints what the client reads, as for invoices.
  router.get('/:id/pdf', async (req, res) => {
    const { version, language } = await withStaff(ctx, req, 'office', async (tx) => {
      const found = await getVersion(tx, parse(idParam, req.params).id);
      const { rows } = await tx.client.query<{ client_id: string }>(`select client_id from estimates where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        found.estimateId,
      ]);
      return { version: found, language: (await clientReader(tx, rows[0].client_id)).language };
    });
    const pdf = await renderProposalPdf(version.snapshot, { version: version.version, snapshotHash: version.snapshotHash, language });
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
