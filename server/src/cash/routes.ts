import { Router } from 'express';
import type { AppContext } from '../context';

/** The owner's cash, mounted at /api/cash: receivables by age, cash by month, the 13-week forecast, jobs. */
export function cashRoutes(ctx: AppContext): Router {
  const router = Router();
  void ctx;
  return router;
}
