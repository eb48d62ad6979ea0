import { Router } from 'express';
import type { AppContext } from '../../context';

/** CSV exports for the accountant, mounted at /api/cash/exports. */
export function cashExportRoutes(ctx: AppContext): Router {
  const router = Router();
  void ctx;
  return router;
}
