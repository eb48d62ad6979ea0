import { uuid, type ItemList, type JobDetail, type JobSummary } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { getJob, listJobs } from './jobs';
import { sheetRoutes } from './sheet/routes';

const idParam = z.strictObject({ id: uuid('job id') });

/** Accepted work carries the contract sum: owner and office only (crew get their job sheet elsewhere). */
export function jobRoutes(ctx: AppContext): Router {
  const router = Router();
  // before '/:id', which would take 'sheets' for a job id
  router.use(sheetRoutes(ctx));

  router.get('/', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => listJobs(tx))) satisfies ItemList<JobSummary>);
  });

  router.get('/:id', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => getJob(tx, parse(idParam, req.params).id))) satisfies JobDetail);
  });

  return router;
}
