import { jobStatusChange, uuid, type ItemList, type JobDetail, type JobSummary } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { getJob, listJobs } from './jobs';
import { changeJobStatus } from './job-status';
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

  // Finished, reopened or cancelled by the office (job-status.ts says from where to where).
  router.post('/:id/status', async (req, res) => {
    const job = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      await changeJobStatus(tx, staffActor(staff), id, parse(jobStatusChange, req.body), ctx.now());
      return getJob(tx, id);
    });
    res.json(job satisfies JobDetail);
  });

  return router;
}
