import {
  clientCreate,
  clientIdParam,
  clientListQuery,
  clientMerge,
  clientUpdate,
  contactCreate,
  siteCreate,
  siteIdParam,
  siteUpdate,
  type ClientDetail,
  type ClientMatch,
  type ClientSummary,
  type ContactView,
  type ItemList,
  type KeysetPage,
  type SiteView,
} from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { matchesOfClient, mergeClient } from './merge';
import { addContact, addSite, createClient, getClient, listClients, updateClient, updateSite } from './service';

export function clientRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const page = await withStaff(ctx, req, 'office', (tx) => listClients(tx, parse(clientListQuery, req.query)));
    res.json(page satisfies KeysetPage<ClientSummary>);
  });

  router.post('/', async (req, res) => {
    const created = await withStaff(ctx, req, 'office', (tx, staff) => createClient(tx, staffActor(staff), parse(clientCreate, req.body)));
    res.status(201).json(created satisfies ClientSummary);
  });

  router.get('/:id', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', (tx) => getClient(tx, parse(clientIdParam, req.params).id));
    res.json(detail satisfies ClientDetail);
  });

  router.patch('/:id', async (req, res) => {
    const updated = await withStaff(ctx, req, 'office', (tx) =>
      updateClient(tx, parse(clientIdParam, req.params).id, parseChanges(clientUpdate, req.body), ctx.now()),
    );
    res.json(updated satisfies ClientSummary);
  });

  router.get('/:id/matches', async (req, res) => {
    const items = await withStaff(ctx, req, 'office', (tx) => matchesOfClient(tx, parse(clientIdParam, req.params).id));
    res.json({ items } satisfies ItemList<ClientMatch>);
  });

  /** Merges this client into another (the one kept); this one is gone afterwards. */
  router.post('/:id/merge', async (req, res) => {
    const kept = await withStaff(ctx, req, 'office', (tx, staff) =>
      mergeClient(tx, staffActor(staff), parse(clientIdParam, req.params).id, parse(clientMerge, req.body).intoClientId, ctx.now()),
    );
    res.json(kept satisfies ClientDetail);
  });

  router.post('/:id/contacts', async (req, res) => {
    const contact = await withStaff(ctx, req, 'office', (tx) =>
      addContact(tx, parse(clientIdParam, req.params).id, parse(contactCreate, req.body)),
    );
    res.status(201).json(contact satisfies ContactView);
  });

  router.post('/:id/sites', async (req, res) => {
    const site = await withStaff(ctx, req, 'office', (tx) => addSite(tx, parse(clientIdParam, req.params).id, parse(siteCreate, req.body)));
    res.status(201).json(site satisfies SiteView);
  });

  return router;
}

/** Sites are edited on their own path: `/api/sites/:id`. */
export function siteRoutes(ctx: AppContext): Router {
  const router = Router();
  router.patch('/:id', async (req, res) => {
    const site = await withStaff(ctx, req, 'office', (tx) =>
      updateSite(tx, parse(siteIdParam, req.params).id, parseChanges(siteUpdate, req.body)),
    );
    res.json(site satisfies SiteView);
  });
  return router;
}
