import { estimatingSettings, firmSettingsUpdate } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { badRequest } from '../http/problem';
import { parse } from '../http/validate';
import { isKnownCurrency } from './currencies';
import { getEstimatingSettings, saveEstimatingSettings } from './estimating';
import { getFirm, updateFirm } from './service';

/** Every route authorises first (inside its firm transaction), then parses, so a wrong role never learns the schema. */
export function firmRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx) => getFirm(tx)));
  });

  router.patch('/', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'owner', (tx, staff) => {
        const input = parse(firmSettingsUpdate, req.body);
        if (!isKnownCurrency(input.currency)) throw badRequest([{ field: 'currency', message: 'Choose a currency from the list.' }]);
        return updateFirm(tx, staff.id, input);
      }),
    );
  });

  // Rates and margins are money figures: office reads them, the owner sets them, crew never sees them.
  router.get('/estimating', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx) => getEstimatingSettings(tx)));
  });

  router.put('/estimating', async (req, res) => {
    res.json(await withStaff(ctx, req, 'owner', (tx, staff) => saveEstimatingSettings(tx, staff.id, parse(estimatingSettings, req.body))));
  });

  return router;
}
