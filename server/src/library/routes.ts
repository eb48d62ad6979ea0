import { finishSystemInput, finishSystemUpdate, productInput, productListQuery, productUpdate, systemListQuery, uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import type { StaffPrincipal } from '../http/principal';
import { parse } from '../http/validate';
import { type Actor, createProduct, getProduct, listProducts, setProductArchived, updateProduct } from './products';
import { createSystem, duplicateSystem, getSystem, listSystems, setSystemArchived, updateSystem } from './systems';

const productParam = z.strictObject({ id: uuid('product id') });
const systemParam = z.strictObject({ id: uuid('finish system id') });

/** Crew read the library on site (layers, coverage, waits, hazards) but see no prices. */
const actorOf = (staff: StaffPrincipal): Actor => ({ userId: staff.id, canSeePrices: staff.role !== 'crew' });

/** `/api/library`: crew read; owner and office write. */
export function libraryRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/products', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx, staff) => listProducts(tx, actorOf(staff), parse(productListQuery, req.query).archived)));
  });
  router.post('/products', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx, staff) => createProduct(tx, actorOf(staff), parse(productInput, req.body))));
  });
  router.get('/products/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx, staff) => getProduct(tx, actorOf(staff), parse(productParam, req.params).id)));
  });
  router.patch('/products/:id', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'office', (tx, staff) => updateProduct(tx, actorOf(staff), parse(productParam, req.params).id, parse(productUpdate, req.body), ctx.now())),
    );
  });
  router.post('/products/:id/archive', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => setProductArchived(tx, actorOf(staff), parse(productParam, req.params).id, true, ctx.now())));
  });
  router.post('/products/:id/unarchive', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => setProductArchived(tx, actorOf(staff), parse(productParam, req.params).id, false, ctx.now())));
  });

  router.get('/systems', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => listSystems(tx, parse(systemListQuery, req.query).archived)));
  });
  router.post('/systems', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx, staff) => createSystem(tx, actorOf(staff), parse(finishSystemInput, req.body))));
  });
  router.get('/systems/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => getSystem(tx, parse(systemParam, req.params).id)));
  });
  router.patch('/systems/:id', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'office', (tx, staff) => updateSystem(tx, actorOf(staff), parse(systemParam, req.params).id, parse(finishSystemUpdate, req.body), ctx.now())),
    );
  });
  router.post('/systems/:id/archive', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => setSystemArchived(tx, actorOf(staff), parse(systemParam, req.params).id, true, ctx.now())));
  });
  router.post('/systems/:id/unarchive', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => setSystemArchived(tx, actorOf(staff), parse(systemParam, req.params).id, false, ctx.now())));
  });
  router.post('/systems/:id/duplicate', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx, staff) => duplicateSystem(tx, actorOf(staff), parse(systemParam, req.params).id)));
  });

  return router;
}
