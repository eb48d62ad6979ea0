import { auditListQuery, type AuditPage } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { listAudit } from './list';

/**
 * The owner's view of the firm's audit log, mounted at /api/audit: who signed in, who changed prices,
 * issued, voided or refunded what. Owner only (office and crew 403 before any parsing).
 */
export function auditRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const page = await withStaff(ctx, req, 'owner', (tx) => listAudit(tx, parse(auditListQuery, req.query)));
    res.json(page satisfies AuditPage);
  });

  return router;
}
