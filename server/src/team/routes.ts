import { idParam, invitationCreate, memberRoleUpdate } from '@layerbook/contracts';
import { Router } from 'express';
import type { AppContext } from '../context';
import { withStaff } from '../http/guards';
import { parse } from '../http/validate';
import { changeMember, getTeam, invite, revokeInvitation } from './service';

export function teamRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await withStaff(ctx, req, 'crew', (tx, staff) => getTeam(tx, staff.id, ctx.now())));
  });

  router.post('/invitations', async (req, res) => {
    res.status(201).json(await withStaff(ctx, req, 'owner', (tx, staff) => invite(ctx, tx, staff, parse(invitationCreate, req.body))));
  });

  router.delete('/invitations/:id', async (req, res) => {
    await withStaff(ctx, req, 'owner', (tx, staff) => revokeInvitation(ctx, tx, staff, parse(idParam, req.params).id));
    res.status(204).end();
  });

  router.patch('/members/:id', async (req, res) => {
    res.json(
      await withStaff(ctx, req, 'owner', (tx, staff) => {
        const { id } = parse(idParam, req.params);
        return changeMember(tx, staff, id, { role: parse(memberRoleUpdate, req.body).role });
      }),
    );
  });

  for (const [action, status] of [['deactivate', 'deactivated'], ['reactivate', 'active']] as const) {
    router.post(`/members/:id/${action}`, async (req, res) => {
      res.json(await withStaff(ctx, req, 'owner', (tx, staff) => changeMember(tx, staff, parse(idParam, req.params).id, { status })));
    });
  }

  return router;
}
