import { estimatingSettings, firmSettingsUpdate, type EstimatingSettingsView, type FirmSettings } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { badRequest } from '../http/problem';
import { parse, parseChanges } from '../http/validate';
import { isKnownCurrency } from './currencies';
import { getEstimatingSettings, saveEstimatingSettings } from './estimating';
import { getFirm, updateFirm } from './service';

/** Every route authorises first (inside its firm transaction), then parses, so a wrong role never learns the schema. */
export function firmRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const firm = await withStaff(ctx, req, 'crew', (tx) => getFirm(tx));
    res.json(firm satisfies FirmSettings);
  });

  router.patch('/', async (req, res) => {
    const firm = await withStaff(ctx, req, 'owner', (tx, staff) => {
      const input = parseChanges(firmSettingsUpdate, req.body);
      if (!isKnownCurrency(input.currency)) throw badRequest([{ field: 'currency', message: 'Choose a currency from the list.' }]);
      return updateFirm(tx, staffActor(staff), input, ctx.now());
    });
    res.json(firm satisfies FirmSettings);
  });

  // Rates and margins are money figures: office reads them, the owner sets them, crew never sees them.
  router.get('/estimating', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx) => getEstimatingSettings(tx));
    res.json(view satisfies EstimatingSettingsView);
  });

  router.put('/estimating', async (req, res) => {
    const view = await withStaff(ctx, req, 'owner', (tx, staff) =>
      saveEstimatingSettings(tx, staffActor(staff), parse(estimatingSettings, req.body), ctx.now()),
    );
    res.json(view satisfies EstimatingSettingsView);
  });

  return router;
}
