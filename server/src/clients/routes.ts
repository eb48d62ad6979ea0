import { clientCreate, clientListQuery, clientUpdate, contactCreate, siteCreate, siteUpdate, uuid } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { requireStaff } from '../http/guards';
import { parse } from '../http/validate';
import { addContact, addSite, createClient, getClient, listClients, updateClient, updateSite } from './service';

const idParam = z.strictObject({ id: uuid('client id') });
const siteParam = z.strictObject({ id: uuid('site id') });

export function clientRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const q = parse(clientListQuery, req.query);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => listClients(tx, q)));
  });

  router.post('/', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const input = parse(clientCreate, req.body);
    res.status(201).json(await withTenant(ctx.pool, staff.tenantId, (tx) => createClient(tx, staff.id, input)));
  });

  router.get('/:id', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => getClient(tx, id)));
  });

  router.patch('/:id', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const patch = parse(clientUpdate, req.body);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => updateClient(tx, id, patch)));
  });

  router.post('/:id/contacts', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const input = parse(contactCreate, req.body);
    res.status(201).json(await withTenant(ctx.pool, staff.tenantId, (tx) => addContact(tx, id, input)));
  });

  router.post('/:id/sites', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const input = parse(siteCreate, req.body);
    res.status(201).json(await withTenant(ctx.pool, staff.tenantId, (tx) => addSite(tx, id, input)));
  });

  return router;
}

/** Sites are edited on their own path: `/api/sites/:id`. */
export function siteRoutes(ctx: AppContext): Router {
  const router = Router();
  router.patch('/:id', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(siteParam, req.params);
    const patch = parse(siteUpdate, req.body);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => updateSite(tx, id, patch)));
  });
  return router;
}
