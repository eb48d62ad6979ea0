import { idParam, invitationCreate, memberRoleUpdate } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { Router } from 'express';
import type { AppContext } from '../context';
import { requireStaff } from '../http/guards';
import { parse } from '../http/validate';
import { changeMember, getTeam, invite, revokeInvitation } from './service';

export function teamRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    const staff = requireStaff(req, 'crew');
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => getTeam(tx, staff.id, ctx.now())));
  });

  router.post('/invitations', async (req, res) => {
    const staff = requireStaff(req, 'owner');
    const input = parse(invitationCreate, req.body);
    res.status(201).json(await withTenant(ctx.pool, staff.tenantId, (tx) => invite(ctx, tx, staff, input)));
  });

  router.delete('/invitations/:id', async (req, res) => {
    const staff = requireStaff(req, 'owner');
    const { id } = parse(idParam, req.params);
    await withTenant(ctx.pool, staff.tenantId, (tx) => revokeInvitation(ctx, tx, staff, id));
    res.status(204).end();
  });

  router.patch('/members/:id', async (req, res) => {
    const staff = requireStaff(req, 'owner');
    const { id } = parse(idParam, req.params);
    const { role } = parse(memberRoleUpdate, req.body);
    res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => changeMember(tx, staff, id, { role })));
  });

  for (const [action, status] of [['deactivate', 'deactivated'], ['reactivate', 'active']] as const) {
    router.post(`/members/:id/${action}`, async (req, res) => {
      const staff = requireStaff(req, 'owner');
      const { id } = parse(idParam, req.params);
      res.json(await withTenant(ctx.pool, staff.tenantId, (tx) => changeMember(tx, staff, id, { status })));
    });
  }

  return router;
}
