import { billingSettings, type BillingSettingsView } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { getBillingSettings, saveBillingSettings } from './settings';

/** /api/firm/billing: money rules — office reads, the owner sets, crew never sees them. */
export function billingSettingsRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json((await withStaff(ctx, req, 'office', (tx) => getBillingSettings(tx))) satisfies BillingSettingsView);
  });

  router.put('/', async (req, res) => {
    const view = await withStaff(ctx, req, 'owner', (tx, staff) =>
      saveBillingSettings(tx, staffActor(staff), parse(billingSettings, req.body), ctx.now()),
    );
    res.json(view satisfies BillingSettingsView);
  });

  return router;
}
