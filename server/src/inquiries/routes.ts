import {
  activityCreate,
  inquiryConvert,
  inquiryCreate,
  inquiryIdParam,
  inquiryListQuery,
  inquiryUpdate,
  stageLikelihoodUpdate,
  stageMove,
  STAGES_THAT_FILE_A_CLIENT,
  type BoardColumn,
  type ClientMatch,
  type InquiryConversion,
  type InquiryDetail,
  type InquiryListQuery,
  type InquirySummary,
  type ItemList,
  type KeysetPage,
  type StageLikelihood,
  type TodayView,
} from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { readAsStaff, withStaff } from '../http/guards';
import type { StaffPrincipal } from '../http/principal';
import { parse, parseChanges } from '../http/validate';
import { clientMatchesOfInquiry } from './client-matches';
import { staffClock } from './clock';
import { convertInquiry } from './convert';
import { getInquiry } from './detail';
import { buildListQuery, getBoard, getToday, type InquiryListRow, inquiryPage } from './list';
import { addActivity, createInquiry, moveStage, updateInquiry } from './service';
import { listStageLikelihoods, saveStageLikelihoods } from './stage-settings';

/** Owner and office only: inquiries carry contact details and money figures (estimated value, pipeline). */
export function inquiryRoutes(ctx: AppContext): Router {
  const router = Router();
  const clock = (staff: StaffPrincipal) => staffClock(staff, ctx.now());
  const today = (staff: StaffPrincipal) => clock(staff).today;

  router.get('/', async (req, res) => {
    // The busiest read: the person's re-check and the page in one round trip.
    const { staff, input, rows } = await readAsStaff<InquiryListQuery, InquiryListRow>(
      ctx,
      req,
      'office',
      () => parse(inquiryListQuery, req.query),
      buildListQuery,
    );
    res.json(inquiryPage(rows, input, today(staff)) satisfies KeysetPage<InquirySummary>);
  });

  router.get('/board', async (req, res) => {
    const board = await withStaff(ctx, req, 'office', (tx, staff) => getBoard(tx, clock(staff)));
    res.json(board satisfies ItemList<BoardColumn>);
  });

  router.get('/today', async (req, res) => {
    const mine = req.query['mine'] === 'true';
    const view = await withStaff(ctx, req, 'office', (tx, staff) => getToday(tx, clock(staff), mine ? staff.id : undefined));
    res.json(view satisfies TodayView);
  });

  router.get('/stages', async (req, res) => {
    const stages = await withStaff(ctx, req, 'office', (tx) => listStageLikelihoods(tx));
    res.json(stages satisfies ItemList<StageLikelihood>);
  });

  router.put('/stages', async (req, res) => {
    const stages = await withStaff(ctx, req, 'owner', (tx, staff) =>
      saveStageLikelihoods(tx, staffActor(staff), parse(stageLikelihoodUpdate, req.body).likelihoods),
    );
    res.json(stages satisfies ItemList<StageLikelihood>);
  });

  router.post('/', async (req, res) => {
    const created = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const id = await createInquiry(tx, staffActor(staff), parse(inquiryCreate, req.body));
      return getInquiry(tx, id, today(staff));
    });
    res.status(201).json(created satisfies InquiryDetail);
  });

  router.get('/:id', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', (tx, staff) => getInquiry(tx, parse(inquiryIdParam, req.params).id, today(staff)));
    res.json(detail satisfies InquiryDetail);
  });

  router.patch('/:id', async (req, res) => {
    const updated = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(inquiryIdParam, req.params);
      await updateInquiry(tx, staffActor(staff), id, parseChanges(inquiryUpdate, req.body), ctx.now());
      return getInquiry(tx, id, today(staff));
    });
    res.json(updated satisfies InquiryDetail);
  });

  router.post('/:id/stage', async (req, res) => {
    const moved = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(inquiryIdParam, req.params);
      const move = parse(stageMove, req.body);
      const actor = staffActor(staff);
      await moveStage(tx, actor, id, move, ctx.now());
      // Booking the visit or winning the work files the prospect as a client with their site.
      if (STAGES_THAT_FILE_A_CLIENT.includes(move.stage) && !(await getInquiry(tx, id, today(staff))).clientId) {
        await convertInquiry(tx, actor, id, {}, ctx.now());
      }
      return getInquiry(tx, id, today(staff));
    });
    res.json(moved satisfies InquiryDetail);
  });

  router.post('/:id/activities', async (req, res) => {
    const logged = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(inquiryIdParam, req.params);
      await addActivity(tx, staffActor(staff), id, parse(activityCreate, req.body), ctx.now());
      return getInquiry(tx, id, today(staff));
    });
    res.status(201).json(logged satisfies InquiryDetail);
  });

  /** Clients that may already be this prospect (same e-mail, phone or name), offered before filing a new one. */
  router.get('/:id/client-matches', async (req, res) => {
    const items = await withStaff(ctx, req, 'office', (tx) => clientMatchesOfInquiry(tx, parse(inquiryIdParam, req.params).id));
    res.json({ items } satisfies ItemList<ClientMatch>);
  });

  router.post('/:id/convert', async (req, res) => {
    const conversion = await withStaff(ctx, req, 'office', (tx, staff) =>
      convertInquiry(tx, staffActor(staff), parse(inquiryIdParam, req.params).id, parse(inquiryConvert, req.body), ctx.now()),
    );
    res.json(conversion satisfies InquiryConversion);
  });

  return router;
}
