import { firmSettingsUpdate } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { Router } from 'express';
import type { AppContext } from '../context';
import { requireStaff } from '../http/guards';
import { badRequest } from '../http/problem';
import { parse } from '../http/validate';
import { isKnownCurrency } from './currencies';
import { getFirm, updateFirm } from './service';

export function firmRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const staff = requireStaff(req, 'crew');
    res.json(await withTenant(ctx.pool, staff.tenantId, getFirm));
  });

  router.patch('/', async (req, res) => {
    const staff = requireStaff(req, 'owner');
    const input = parse(firmSettingsUpdate, req.body);
    if (!isKnownCurrency(input.currency)) throw badRequest([{ field: 'currency', message: 'Choose a currency from the list.' }]);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => updateFirm(tx, staff.id, input)));
  });

  return router;
}
