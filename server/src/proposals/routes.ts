import { estimateCreate, estimateInputs, uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { createEstimate, getEstimate, listEstimates, saveEstimateInputs } from './estimates';

const idParam = z.strictObject({ id: uuid('estimate id') });
const listQuery = z.strictObject({ siteId: uuid('site').optional() });

/** Estimates carry prices: owner and office only. */
export function estimateRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json({ items: await withStaff(ctx, req, 'office', (tx) => listEstimates(tx, parse(listQuery, req.query).siteId)) });
  });

  router.post('/', async (req, res) => {
    const made = await withStaff(ctx, req, 'office', async (tx, staff) => getEstimate(tx, await createEstimate(tx, staff.id, parse(estimateCreate, req.body))));
    res.status(201).json(made);
  });

  router.get('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => getEstimate(tx, parse(idParam, req.params).id)));
  });

  router.put('/:id/inputs', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => saveEstimateInputs(tx, staff.id, parse(idParam, req.params).id, parse(estimateInputs, req.body))));
  });

  return router;
}
