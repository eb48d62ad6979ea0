import {
  estimateCreate,
  estimateSave,
  estimateListQuery,
  uuid,
  type EstimateListItem,
  type EstimateView,
  type KeysetPage,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { createEstimate, getEstimate, listEstimates, saveEstimateInputs } from './estimates';

const idParam = z.strictObject({ id: uuid('estimate id') });

/** Estimates carry prices: owner and office only. */
export function estimateRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const page = await withStaff(ctx, req, 'office', (tx) => listEstimates(tx, parse(estimateListQuery, req.query)));
    res.json(page satisfies KeysetPage<EstimateListItem>);
  });

  router.post('/', async (req, res) => {
    const made = await withStaff(ctx, req, 'office', async (tx, staff) =>
      getEstimate(tx, await createEstimate(tx, staffActor(staff), parse(estimateCreate, req.body))),
    );
    res.status(201).json(made satisfies EstimateView);
  });

  router.get('/:id', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx) => getEstimate(tx, parse(idParam, req.params).id));
    res.json(view satisfies EstimateView);
  });

  router.put('/:id/inputs', async (req, res) => {
    const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
      saveEstimateInputs(tx, staffActor(staff), parse(idParam, req.params).id, parse(estimateSave, req.body), ctx.now()),
    );
    res.json(saved satisfies EstimateView);
  });

  return router;
}
