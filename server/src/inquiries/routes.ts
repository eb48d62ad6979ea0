import { activityCreate, inquiryConvert, inquiryCreate, inquiryListQuery, inquiryUpdate, stageLikelihoodUpdate, stageMove, uuid } from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { convertInquiry } from './convert';
import { getBoard, getToday, listInquiries } from './list';
import { addActivity, createInquiry, getInquiry, moveStage, staffClock, updateInquiry } from './service';
import { saveStageLikelihoods, stageLikelihoods } from './stage-settings';

const idParam = z.strictObject({ id: uuid('inquiry id') });

/** Owner and office only: inquiries carry contact details and money figures (estimated value, pipeline). */
export function inquiryRoutes(ctx: AppContext): Router {
  const router = Router();
  const today = (staff: { timeZone: string; currency: string }) => staffClock(staff, ctx.now()).today;

  router.get('/', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => listInquiries(tx, parse(inquiryListQuery, req.query), today(staff))));
  });

  router.get('/board', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => getBoard(tx, staffClock(staff, ctx.now()))));
  });

  router.get('/today', async (req, res) => {
    const mine = req.query['mine'] === 'true';
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => getToday(tx, staffClock(staff, ctx.now()), mine ? staff.id : undefined)));
  });

  router.get('/stages', async (req, res) => {
    res.json({ likelihoods: await withStaff(ctx, req, 'office', (tx) => stageLikelihoods(tx)) });
  });

  router.put('/stages', async (req, res) => {
    const likelihoods = await withStaff(ctx, req, 'owner', (tx, staff) => saveStageLikelihoods(tx, staff.id, parse(stageLikelihoodUpdate, req.body).likelihoods));
    res.json({ likelihoods });
  });

  router.post('/', async (req, res) => {
    const created = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const id = await createInquiry(tx, { userId: staff.id, kind: 'staff' }, parse(inquiryCreate, req.body));
      return getInquiry(tx, id, today(staff));
    });
    res.status(201).json(created);
  });

  router.get('/:id', async (req, res) => {
    res.json(await withStaff(ctx, req, 'office', (tx, staff) => getInquiry(tx, parse(idParam, req.params).id, today(staff))));
  });

  router.patch('/:id', async (req, res) => {
    const updated = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      await updateInquiry(tx, { userId: staff.id, kind: 'staff' }, id, parse(inquiryUpdate, req.body));
      return getInquiry(tx, id, today(staff));
    });
    res.json(updated);
  });

  router.post('/:id/stage', async (req, res) => {
    const moved = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      const move = parse(stageMove, req.body);
      const actor = { userId: staff.id, kind: 'staff' as const };
      await moveStage(tx, actor, id, move);
      // Booking the visit or winning the work files the prospect as a client with their site.
      if ((move.stage === 'visit_booked' || move.stage === 'won') && !(await getInquiry(tx, id, today(staff))).clientId) {
        await convertInquiry(tx, actor, id, {});
      }
      return getInquiry(tx, id, today(staff));
    });
    res.json(moved);
  });

  router.post('/:id/activities', async (req, res) => {
    const logged = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      await addActivity(tx, { userId: staff.id, kind: 'staff' }, id, parse(activityCreate, req.body));
      return getInquiry(tx, id, today(staff));
    });
    res.status(201).json(logged);
  });

  router.post('/:id/convert', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'office', (tx, staff) =>
        convertInquiry(tx, { userId: staff.id, kind: 'staff' }, parse(idParam, req.params).id, parse(inquiryConvert, req.body)),
      ),
    );
  });

  return router;
}
