import { changeOrderDecision, uuid, type PortalChangeOrder } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { withClient } from '../../http/guards';
import { parse } from '../../http/validate';
import { decideChangeOrder, getClientChangeOrder } from './decide';

const idParam = z.strictObject({ id: uuid('change order id') });

/** The client's side of change orders, mounted at /api/portal/change-orders: read one, approve or decline it. */
export function portalChangeOrderRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id', async (req, res) => {
    res.json(
      (await withClient(ctx, req, (tx, client) =>
        getClientChangeOrder(tx, client, parse(idParam, req.params).id),
      )) satisfies PortalChangeOrder,
    );
  });

  router.post('/:id/decision', async (req, res) => {
    const decided = await withClient(ctx, req, (tx, client) =>
      decideChangeOrder(tx, ctx, client, parse(idParam, req.params).id, () => parse(changeOrderDecision, req.body)),
    );
    res.json(decided satisfies PortalChangeOrder);
  });

  return router;
}
