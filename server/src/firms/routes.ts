import {
  estimatingSettings,
  FIRM_LOGO_FIELD,
  firmSettingsUpdate,
  type EstimatingSettingsView,
  type FirmSettings,
} from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse, parseChanges } from '../http/validate';
import { isKnownCurrency } from './currencies';
import { getEstimatingSettings, saveEstimatingSettings } from './estimating';
import { getFirm, updateFirm } from './service';
import { checkImage } from '../files/image';
import { discardObjects, storeImageThen } from '../files/stored-files';
import { receiveOneFile } from '../files/upload';
import { badRequest, unauthorized } from '../http/problem';
import { removeFirmLogo, setFirmLogo } from './logo';

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
      if (!isKnownCurrency(input.currency))
        throw badRequest([
          { field: 'currency', message: 'Choose a currency from the list (at most two decimals: KWD and the like are not kept yet).' },
        ]);
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

  // The logo: the role is checked before the body is read (a crew member hears 403, not a 400 about
  // the file); the image is decoded outside any transaction, stored, then the row written; the old
  // logo's objects go once the change has committed.
  router.post(
    '/logo',
    async (req, _res, next) => {
      await withStaff(ctx, req, 'owner', (tx) => getFirm(tx));
      next();
    },
    receiveOneFile(ctx.config, FIRM_LOGO_FIELD),
    async (req, res) => {
      const image = await checkImage(req.file, FIRM_LOGO_FIELD);
      const tenantId = req.user?.tenantId;
      if (!tenantId) throw unauthorized();
      const change = await storeImageThen(ctx.storage, ctx.logger, tenantId, image, (stored) =>
        withStaff(ctx, req, 'owner', (tx, staff) => setFirmLogo(tx, staffActor(staff), stored, ctx.now())),
      );
      await discardObjects(ctx.storage, ctx.logger, change.discarded);
      res.json(change.firm satisfies FirmSettings);
    },
  );

  router.delete('/logo', async (req, res) => {
    const change = await withStaff(ctx, req, 'owner', (tx, staff) => removeFirmLogo(tx, staffActor(staff), ctx.now()));
    await discardObjects(ctx.storage, ctx.logger, change.discarded);
    res.json(change.firm satisfies FirmSettings);
  });

  return router;
}
