import {
  changeOrderCreate,
  changeOrderUpdate,
  uuid,
  type ChangeOrderSummary,
  type ChangeOrderView,
  type ItemList,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { staffActor } from '../../http/actor';
import { withStaff } from '../../http/guards';
import { parse, parseChanges } from '../../http/validate';
import { createChangeOrder, getChangeOrder, sendChangeOrder, updateChangeOrder } from './change-orders';
import { listChangeOrders } from './read';

const jobParam = z.strictObject({ id: uuid('job id') });
const idParam = z.strictObject({ id: uuid('change order id') });

/** A job's change orders, mounted at /api/jobs/:id/change-orders (owner and office: they carry money). */
export function jobChangeOrderRoutes(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const list = await withStaff(ctx, req, 'office', (tx) => listChangeOrders(tx, parse(jobParam, req.params).id));
    res.json(list satisfies ItemList<ChangeOrderSummary>);
  });

  router.post('/', async (req, res) => {
    const made = await withStaff(ctx, req, 'office', (tx, staff) =>
      createChangeOrder(tx, staffActor(staff), parse(jobParam, req.params).id, () => parse(changeOrderCreate, req.body), ctx.now()),
    );
    res.status(201).json(made satisfies ChangeOrderView);
  });

  return router;
}

/** One change order, mounted at /api/change-orders: read, change a draft, send it to the client. */
export function changeOrderRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => getChangeOrder(tx, parse(idParam, req.params).id))) satisfies ChangeOrderView);
  });

  router.patch('/:id', async (req, res) => {
    const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateChangeOrder(tx, staffActor(staff), parse(idParam, req.params).id, () => parseChanges(changeOrderUpdate, req.body), ctx.now()),
    );
    res.json(saved satisfies ChangeOrderView);
  });

  router.post('/:id/send', async (req, res) => {
    const sent = await withStaff(ctx, req, 'office', (tx, staff) =>
      sendChangeOrder(tx, ctx, staffActor(staff), parse(idParam, req.params).id),
    );
    res.json(sent satisfies ChangeOrderView);
  });

  return router;
}
