import {
  billingScheduleUpdate,
  invoiceDraftCreate,
  uuid,
  valueLinesUpdate,
  type InvoiceDetail,
  type JobBillingView,
} from '@layerbook/contracts';
import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { staffActor } from '../http/actor';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { createDraft } from './draft-edits';
import { getInvoice } from './invoice-read';
import { getJobBilling } from './job-billing';
import { startBilling, updateBillingSchedule, updateValueLines } from './schedule';

const idParam = z.strictObject({ id: uuid('job id') });

/** /api/jobs/:id/billing… and /api/jobs/:id/invoices: money, so owner and office only (crew 403 before any parsing). */
export function jobBillingRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id/billing', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx) => getJobBilling(tx, parse(idParam, req.params).id, ctx.now()));
    res.json(view satisfies JobBillingView);
  });

  router.put('/:id/billing/schedule', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx, staff) => {
      const { id } = parse(idParam, req.params);
      return updateBillingSchedule(tx, ctx.queue, staffActor(staff), id, parse(billingScheduleUpdate, req.body), ctx.now());
    });
    res.json(view satisfies JobBillingView);
  });

  router.post('/:id/billing/start', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx, staff) =>
      startBilling(tx, ctx.queue, staffActor(staff), parse(idParam, req.params).id, ctx.now()),
    );
    res.json(view satisfies JobBillingView);
  });

  router.put('/:id/billing/value-lines', async (req, res) => {
    const view = await withStaff(ctx, req, 'office', (tx, staff) => {
      const { id } = parse(idParam, req.params);
      return updateValueLines(tx, ctx.queue, staffActor(staff), id, parse(valueLinesUpdate, req.body), ctx.now());
    });
    res.json(view satisfies JobBillingView);
  });

  router.post('/:id/invoices', async (req, res) => {
    const detail = await withStaff(ctx, req, 'office', async (tx, staff) => {
      const { id } = parse(idParam, req.params);
      const invoiceId = await createDraft(tx, staffActor(staff), id, parse(invoiceDraftCreate, req.body), ctx.now());
      return getInvoice(tx, invoiceId, ctx.now());
    });
    res.status(201).json(detail satisfies InvoiceDetail);
  });

  return router;
}
