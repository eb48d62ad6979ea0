import {
  cashEmptyQuery,
  cashReceivableInvoicesQuery,
  cashReceivablesQuery,
  type CashReceivableInvoices,
  type CashForecast,
  type CashJobs,
  type CashReceivables,
  type CashReceived,
} from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { parse } from '../http/validate';
import { cashForecastView } from './forecast';
import { cashJobs } from './jobs';
import { readReport } from './read-only';
import { cashReceivableInvoices, cashReceivables } from './receivables';
import { cashReceived } from './received';

/**
 * The owner's cash, mounted at /api/cash: receivables by age (and the invoices behind a figure), cash by month, the 13-week forecast,
 * jobs. Owner and office (crew 403 before any parsing); margins for the owner only.
 * Each read runs in a read-only firm transaction in two round trips, on the read replica when there is one (read-only.ts).
 */
export function cashRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/receivables', async (req, res) => {
    const view = await readReport(ctx, req, 'office', (staff) => cashReceivables(staff, ctx.now(), parse(cashReceivablesQuery, req.query)));
    res.json(view satisfies CashReceivables);
  });

  router.get('/receivables/invoices', async (req, res) => {
    const view = await readReport(ctx, req, 'office', (staff) =>
      cashReceivableInvoices(staff, ctx.now(), parse(cashReceivableInvoicesQuery, req.query)),
    );
    res.json(view satisfies CashReceivableInvoices);
  });

  router.get('/received', async (req, res) => {
    const view = await readReport(ctx, req, 'office', (staff) => {
      parse(cashEmptyQuery, req.query);
      return cashReceived(staff, ctx.now());
    });
    res.json(view satisfies CashReceived);
  });

  router.get('/forecast', async (req, res) => {
    const view = await readReport(ctx, req, 'office', (staff) => {
      parse(cashEmptyQuery, req.query);
      return cashForecastView(staff, ctx.now());
    });
    res.json(view satisfies CashForecast);
  });

  router.get('/jobs', async (req, res) => {
    const view = await readReport(ctx, req, 'office', (staff) => {
      parse(cashEmptyQuery, req.query);
      return cashJobs(staff);
    });
    res.json(view satisfies CashJobs);
  });

  return router;
}
