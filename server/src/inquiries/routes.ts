import {
  activityCreate,
  inquiryConvert,
  inquiryCreate,
  inquiryListQuery,
  inquiryUpdate,
  stageLikelihoodUpdate,
  stageMove,
  uuid,
} from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { requireStaff } from '../http/guards';
import { parse } from '../http/validate';
import { convertInquiry } from './convert';
import { getBoard, getToday, listInquiries } from './list';
import { addActivity, createInquiry, firmClock, getInquiry, moveStage, updateInquiry } from './service';
import { saveStageLikelihoods, stageLikelihoods } from './stage-settings';

const idParam = z.strictObject({ id: uuid('inquiry id') });

/** Money figures (estimated value, pipeline) are for owner and office; crew follows their own jobs. */
export function inquiryRoutes(ctx: AppContext): Router {
  const router = Router();
  const staffTx = <T>(tenantId: string, fn: Parameters<typeof withTenant<T>>[2]) => withTenant<T>(ctx.pool, tenantId, fn);

  router.get('/', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const query = parse(inquiryListQuery, req.query);
    res.json(await staffTx(staff.tenantId, async (tx) => listInquiries(tx, query, (await firmClock(tx, ctx.now())).today)));
  });

  router.get('/board', async (req, res) => {
    const staff = requireStaff(req, 'office');
    res.json(await staffTx(staff.tenantId, async (tx) => getBoard(tx, await firmClock(tx, ctx.now()))));
  });

  router.get('/today', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const mine = req.query['mine'] === 'true';
    res.json(await staffTx(staff.tenantId, async (tx) => getToday(tx, await firmClock(tx, ctx.now()), mine ? staff.id : undefined)));
  });

  router.get('/stages', async (req, res) => {
    const staff = requireStaff(req, 'office');
    res.json({ likelihoods: await staffTx(staff.tenantId, stageLikelihoods) });
  });

  router.put('/stages', async (req, res) => {
    const staff = requireStaff(req, 'owner');
    const { likelihoods } = parse(stageLikelihoodUpdate, req.body);
    res.json({ likelihoods: await staffTx(staff.tenantId, (tx) => saveStageLikelihoods(tx, staff.id, likelihoods)) });
  });

  router.post('/', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const input = parse(inquiryCreate, req.body);
    res.status(201).json(
      await staffTx(staff.tenantId, async (tx) => {
        const id = await createInquiry(tx, { userId: staff.id, kind: 'staff' }, input);
        return getInquiry(tx, id, (await firmClock(tx, ctx.now())).today);
      }),
    );
  });

  router.get('/:id', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    res.json(await staffTx(staff.tenantId, async (tx) => getInquiry(tx, id, (await firmClock(tx, ctx.now())).today)));
  });

  router.patch('/:id', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const patch = parse(inquiryUpdate, req.body);
    res.json(
      await staffTx(staff.tenantId, async (tx) => {
        await updateInquiry(tx, { userId: staff.id, kind: 'staff' }, id, patch);
        return getInquiry(tx, id, (await firmClock(tx, ctx.now())).today);
      }),
    );
  });

  router.post('/:id/stage', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const move = parse(stageMove, req.body);
    res.json(
      await staffTx(staff.tenantId, async (tx) => {
        const actor = { userId: staff.id, kind: 'staff' as const };
        await moveStage(tx, actor, id, move);
        // Booking the visit or winning the work files the prospect as a client with their site.
        const now = await getInquiry(tx, id, (await firmClock(tx, ctx.now())).today);
        if ((move.stage === 'visit_booked' || move.stage === 'won') && !now.clientId) await convertInquiry(tx, actor, id, {});
        return getInquiry(tx, id, (await firmClock(tx, ctx.now())).today);
      }),
    );
  });

  router.post('/:id/activities', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const input = parse(activityCreate, req.body);
    res.status(201).json(
      await staffTx(staff.tenantId, async (tx) => {
        await addActivity(tx, { userId: staff.id, kind: 'staff' }, id, input);
        return getInquiry(tx, id, (await firmClock(tx, ctx.now())).today);
      }),
    );
  });

  router.post('/:id/convert', async (req, res) => {
    const staff = requireStaff(req, 'office');
    const { id } = parse(idParam, req.params);
    const input = parse(inquiryConvert, req.body);
    res.json(await staffTx(staff.tenantId, (tx) => convertInquiry(tx, { userId: staff.id, kind: 'staff' }, id, input)));
  });

  return router;
}
