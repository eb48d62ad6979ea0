import { clientCreate, clientListQuery, clientUpdate, contactCreate, siteCreate, siteUpdate, uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { addContact, addSite, createClient, getClient, listClients, updateClient, updateSite } from './service';

const idParam = z.strictObject({ id: uuid('client id') });
const siteParam = z.strictObject({ id: uuid('site id') });

export function clientRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => listClients(tx, parse(clientListQuery, req.query))));
  });

  router.post('/', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx, staff) => createClient(tx, staff.id, parse(clientCreate, req.body))));
  });

  router.get('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => getClient(tx, parse(idParam, req.params).id)));
  });

  router.patch('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => updateClient(tx, parse(idParam, req.params).id, parse(clientUpdate, req.body))));
  });

  router.post('/:id/contacts', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx) => addContact(tx, parse(idParam, req.params).id, parse(contactCreate, req.body))));
  });

  router.post('/:id/sites', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'office', (tx) => addSite(tx, parse(idParam, req.params).id, parse(siteCreate, req.body))));
  });

  return router;
}

/** Sites are edited on their own path: `/api/sites/:id`. */
export function siteRoutes(ctx: AppContext): Router {
  const router = Router();
  router.patch('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => updateSite(tx, parse(siteParam, req.params).id, parse(siteUpdate, req.body))));
  });
  return router;
}
