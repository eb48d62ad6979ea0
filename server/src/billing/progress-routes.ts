import { progressMark, uuid, type JobHistory, type JobProgressView } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { jobHistory } from './history';
import { loadProgress, recordProgress, wordsOf } from './progress';

const idParam = z.strictObject({ id: uuid('job id') });

/**
 * `/api/jobs/:id/progress` (crew, office, owner: marks from the work, answers without money) and
 * `/api/jobs/:id/history` (office and owner).
 */
export function progressRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id/progress', async (req, res) => {
    const view = await withStaff(ctx, req, 'crew', (tx) => loadProgress(tx, parse(idParam, req.params).id, ctx.now()));
    res.json(view satisfies JobProgressView);
  });

  router.post('/:id/progress', async (req, res) => {
    const view = await withStaff(ctx, req, 'crew', (tx, staff) => {
      const { id } = parse(idParam, req.params);
      return recordProgress(tx, ctx.queue, staffActor(staff), id, parse(progressMark, req.body), ctx.now(), wordsOf(staff));
    });
    res.status(201).json(view satisfies JobProgressView);
  });

  router.get('/:id/history', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => jobHistory(tx, parse(idParam, req.params).id))) satisfies JobHistory);
  });

  return router;
}
