import {
  finishSystemInput,
  finishSystemUpdate,
  productInput,
  productListQuery,
  productUpdate,
  systemListQuery,
  uuid,
  type FinishSystemSummary,
  type FinishSystemView,
  type ItemList,
  type ProductView,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { createProduct, getProduct, listProducts, setProductArchived, updateProduct } from './products';
import { createSystem, duplicateSystem, getSystem, listSystems, setSystemArchived, updateSystem } from './systems';

const productParam = z.strictObject({ id: uuid('product id') });
const systemParam = z.strictObject({ id: uuid('finish system id') });

/**
 * `/api/library`: crew read (layers, coverage, waits, hazards — without prices, see canSeeMoney);
 * owner and office write.
 */
export function libraryRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/products', async (req, res) => {
    const list = await withStaff(ctx, req, 'crew', (tx, staff) =>
      listProducts(tx, staffActor(staff), parse(productListQuery, req.query).archived),
    );
    res.json(list satisfies ItemList<ProductView>);
  });
  router.post('/products', async (req, res) => {
    const made = await withStaff(ctx, req, 'office', (tx, staff) => createProduct(tx, staffActor(staff), parse(productInput, req.body)));
    res.status(201).json(made satisfies ProductView);
  });
  router.get('/products/:id', async (req, res) => {
    const product = await withStaff(ctx, req, 'crew', (tx, staff) => getProduct(tx, staffActor(staff), parse(productParam, req.params).id));
    res.json(product satisfies ProductView);
  });
  router.patch('/products/:id', async (req, res) => {
    const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateProduct(tx, staffActor(staff), parse(productParam, req.params).id, parseChanges(productUpdate, req.body), ctx.now()),
    );
    res.json(saved satisfies ProductView);
  });
  for (const [action, isArchived] of [
    ['archive', true],
    ['unarchive', false],
  ] as const) {
    router.post(`/products/:id/${action}`, async (req, res) => {
      const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
        setProductArchived(tx, staffActor(staff), parse(productParam, req.params).id, isArchived, ctx.now()),
      );
      res.json(saved satisfies ProductView);
    });
  }

  router.get('/systems', async (req, res) => {
    const list = await withStaff(ctx, req, 'crew', (tx) => listSystems(tx, parse(systemListQuery, req.query).archived));
    res.json(list satisfies ItemList<FinishSystemSummary>);
  });
  router.post('/systems', async (req, res) => {
    const made = await withStaff(ctx, req, 'office', (tx, staff) =>
      createSystem(tx, staffActor(staff), parse(finishSystemInput, req.body)),
    );
    res.status(201).json(made satisfies FinishSystemView);
  });
  router.get('/systems/:id', async (req, res) => {
    const system = await withStaff(ctx, req, 'crew', (tx) => getSystem(tx, parse(systemParam, req.params).id));
    res.json(system satisfies FinishSystemView);
  });
  router.patch('/systems/:id', async (req, res) => {
    const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
      updateSystem(tx, staffActor(staff), parse(systemParam, req.params).id, parseChanges(finishSystemUpdate, req.body), ctx.now()),
    );
    res.json(saved satisfies FinishSystemView);
  });
  for (const [action, isArchived] of [
    ['archive', true],
    ['unarchive', false],
  ] as const) {
    router.post(`/systems/:id/${action}`, async (req, res) => {
      const saved = await withStaff(ctx, req, 'office', (tx, staff) =>
        setSystemArchived(tx, staffActor(staff), parse(systemParam, req.params).id, isArchived, ctx.now()),
      );
      res.json(saved satisfies FinishSystemView);
    });
  }
  router.post('/systems/:id/duplicate', async (req, res) => {
    const copy = await withStaff(ctx, req, 'office', (tx, staff) =>
      duplicateSystem(tx, staffActor(staff), parse(systemParam, req.params).id),
    );
    res.status(201).json(copy satisfies FinishSystemView);
  });

  return router;
}
